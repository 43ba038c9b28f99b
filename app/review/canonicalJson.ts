/**
 * Canonical JSON for hashing: object keys sorted by UTF-16 code unit (as Array.prototype.sort
 * does), no whitespace, numbers and strings as JSON.stringify writes them (ECMAScript's
 * shortest round-trip form, so the same value gives the same text in Node and the renderer).
 * Keys whose value is `undefined` are left out, as in JSON.stringify, so a parsed review and the
 * same review read back from its file give the same text.
 *
 * A non-finite number (NaN, ±Infinity), a bigint, a function or a symbol throws: JSON would
 * silently turn them into `null`, and a fingerprint must not hide a NaN.
 */
export function canonicalJson(value: unknown): string {
  return write(value, '$');
}

function write(value: unknown, path: string): string {
  if (value === null) return 'null';
  switch (typeof value) {
    case 'boolean':
      return value ? 'true' : 'false';
    case 'string':
      return JSON.stringify(value);
    case 'number':
      if (!Number.isFinite(value)) throw new TypeError(`canonicalJson: ${path} is ${String(value)}, not a finite number`);
      return JSON.stringify(value);
    case 'object': {
      if (Array.isArray(value)) {
        return `[${value.map((v, i) => (v === undefined ? 'null' : write(v, `${path}[${i}]`))).join(',')}]`;
      }
      const obj = value as Record<string, unknown>;
      const keys = Object.keys(obj)
        .filter((k) => obj[k] !== undefined)
        .sort();
      return `{${keys.map((k) => `${JSON.stringify(k)}:${write(obj[k], `${path}.${k}`)}`).join(',')}}`;
    }
    default:
      throw new TypeError(`canonicalJson: ${path} is a ${typeof value}, which JSON cannot hold`);
  }
}

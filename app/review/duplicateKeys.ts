import { formatPath } from './fieldPath';

/**
 * The path of the first key that appears twice in one object of a JSON text (JSON.parse would
 * silently keep the last), or null. `"a"` and `"\u0061"` are the same key. Iterative, so a
 * deeply nested text cannot overflow the stack; call it on text JSON.parse accepted.
 */
export function firstDuplicateKey(text: string): string | null {
  type Frame = { obj: true; keys: Set<string>; key: string | null; expectKey: boolean } | { obj: false; index: number };
  const stack: Frame[] = [];
  const pathTo = (last: string): Array<string | number> => [...stack.slice(0, -1).map((f) => (f.obj ? (f.key ?? '') : f.index)), last];
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if (c === 0x22) {
      let j = i + 1;
      while (j < text.length && text.charCodeAt(j) !== 0x22) j += text.charCodeAt(j) === 0x5c ? 2 : 1;
      const top = stack[stack.length - 1];
      if (top?.obj && top.expectKey) {
        const key = JSON.parse(text.slice(i, j + 1)) as string;
        if (top.keys.has(key)) return formatPath(pathTo(key));
        top.keys.add(key);
        top.key = key;
        top.expectKey = false;
      }
      i = j;
    } else if (c === 0x7b) stack.push({ obj: true, keys: new Set(), key: null, expectKey: true });
    else if (c === 0x5b) stack.push({ obj: false, index: 0 });
    else if (c === 0x7d || c === 0x5d) stack.pop();
    else if (c === 0x2c) {
      const top = stack[stack.length - 1];
      if (top?.obj) top.expectKey = true;
      else if (top) top.index++;
    }
  }
  return null;
}

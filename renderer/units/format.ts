/**
 * Number formatting for the screen. Inputs keep up to ten significant digits so that a value
 * converted to the other unit system and back is what was typed; results use fewer.
 */

/** An input value for a text box: up to 10 significant digits, no trailing zeros, no exponent for usual sizes. */
export function formatInput(value: number | undefined): string {
  if (value === undefined || !Number.isFinite(value)) return '';
  if (value === 0) return '0';
  const abs = Math.abs(value);
  if (abs >= 1e-6 && abs < 1e15) {
    const digits = Math.max(0, 9 - Math.floor(Math.log10(abs)));
    return trimZeros(value.toFixed(Math.min(digits, 20)));
  }
  return String(Number(value.toPrecision(10)));
}

function trimZeros(s: string): string {
  return s.includes('.') ? s.replace(/\.?0+$/, '') : s;
}

/** Parse what was typed: a plain decimal (comma accepted as the decimal mark); NaN if it is not a number. */
export function parseInput(text: string): number {
  const t = text.trim().replace(/\s+/g, '').replace(',', '.').replace('−', '-');
  if (t === '' || !/^[-+]?(\d+\.?\d*|\.\d+)([eE][-+]?\d+)?$/.test(t)) return Number.NaN;
  return Number(t);
}

/** A result for display, with `sig` significant digits (at least as many decimals as make sense). */
export function formatResult(value: number | null | undefined, sig = 3): string {
  if (value === null || value === undefined) return '—';
  if (!Number.isFinite(value)) return '—';
  if (value === 0) return '0';
  const abs = Math.abs(value);
  const magnitude = Math.floor(Math.log10(abs));
  const decimals = Math.max(0, sig - 1 - magnitude);
  return value.toFixed(Math.min(decimals, 12)).replace('-', '−');
}

/** A fraction 0…1 as a percentage. */
export function formatPercent(fraction: number | null | undefined): string {
  if (fraction === null || fraction === undefined || !Number.isFinite(fraction)) return '—';
  return `${(fraction * 100).toFixed(fraction < 0.01 ? 2 : 0)} %`;
}

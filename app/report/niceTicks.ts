/**
 * Axis ticks at "nice" numbers: steps of 1, 2 or 5 × 10ⁿ (2.5 is left out so that tick labels
 * keep few digits), after P. S. Heckbert, "Nice numbers for graph labels", Graphics Gems (1990).
 * The axis is widened to whole steps so that every datum lies inside it.
 */
export interface Ticks {
  readonly min: number;
  readonly max: number;
  readonly step: number;
  readonly values: readonly number[];
}

/** The nice number near `x` (> 0): the next one up, or the nearest when `round`. */
export function niceNumber(x: number, round: boolean): number {
  const exp = Math.floor(Math.log10(x));
  const f = x / 10 ** exp;
  let nf: number;
  if (round) nf = f < 1.5 ? 1 : f < 3 ? 2 : f < 7 ? 5 : 10;
  else nf = f <= 1 ? 1 : f <= 2 ? 2 : f <= 5 ? 5 : 10;
  return nf * 10 ** exp;
}

/**
 * Ticks covering [lo, hi] with about `target` intervals (at most target + 2 ticks). A zero-width
 * or reversed range is widened around its value; non-finite bounds give the axis 0…1.
 */
export function niceTicks(lo: number, hi: number, target = 5): Ticks {
  if (!Number.isFinite(lo) || !Number.isFinite(hi)) return niceTicks(0, 1, target);
  if (hi < lo) [lo, hi] = [hi, lo];
  if (hi === lo) {
    const pad = lo === 0 ? 1 : Math.abs(lo) * 0.1;
    lo -= pad;
    hi += pad;
  }
  const span = niceNumber(hi - lo, false);
  const step = niceNumber(span / Math.max(1, target), true);
  const min = Math.floor(lo / step + 1e-9) * step;
  const max = Math.ceil(hi / step - 1e-9) * step;
  const n = Math.round((max - min) / step);
  const decimals = Math.max(0, -Math.floor(Math.log10(step) + 1e-9));
  const values: number[] = [];
  for (let i = 0; i <= n; i++) values.push(Number((min + i * step).toFixed(Math.min(decimals + 1, 12))));
  return { min: values[0] ?? min, max: values[values.length - 1] ?? max, step, values };
}

/** Tick label: as many decimals as the step needs and no more, with a true minus sign. */
export function tickLabel(value: number, step: number): string {
  const decimals = Math.max(0, -Math.floor(Math.log10(step) + 1e-9));
  const s = (Math.abs(value) < step * 1e-6 ? 0 : value).toFixed(decimals);
  return s.replace('-', '−');
}

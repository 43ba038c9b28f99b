import { EngineInputError } from '../diagnostics';
import type { SquareMetresPerSecond } from '../units';
import { ASTM_D2270_TABLE } from './astmD2270Table';

/**
 * Viscosity index by ASTM D2270 ("Standard Practice for Calculating Viscosity Index from Kinematic
 * Viscosity at 40 and 100 °C"), with U = KV40 and Y = KV100, both in mm²/s inside the formulas:
 *
 * - L and H: Table 1 for Y = 2…70 mm²/s, linear interpolation between rows; above 70 mm²/s
 *   L = 0.8353Y² + 14.67Y − 216 and H = 0.1684Y² + 11.85Y − 97.
 * - Procedure A (VI ≤ 100, i.e. U ≥ H): VI = 100 (L − U)/(L − H).
 * - Procedure B (VI ≥ 100, i.e. U < H): N = (log H − log U)/log Y, VI = (10^N − 1)/0.00715 + 100.
 *   Both give 100 at U = H, so the switch is continuous.
 *
 * The standard reports VI to the nearest whole number; an exact half goes to the even number,
 * as in ASTM E29 rounding [memory]. Validity: Y ≥ 2 mm²/s (the table starts there); below that
 * an EngineInputError. Worked examples of the standard: KV40 73.30 / KV100 8.86 → VI 92;
 * KV40 22.83 / KV100 5.05 → VI 156.
 */

export interface ViscosityIndexResult {
  /** VI rounded as the standard reports it (nearest whole number). */
  readonly value: number;
  /** VI before rounding. */
  readonly unrounded: number;
  /** Basic value L (40 °C viscosity of a VI 0 oil of the same KV100), m²/s. */
  readonly l: SquareMetresPerSecond;
  /** Basic value H (40 °C viscosity of a VI 100 oil of the same KV100), m²/s. */
  readonly h: SquareMetresPerSecond;
  readonly procedure: 'A' | 'B';
}

/** Lowest KV100 the D2270 table covers, 2 mm²/s, in m²/s. */
export const D2270_MIN_KV100 = 2e-6 as SquareMetresPerSecond;

const MM2S_PER_M2S = 1e6;
const TABLE_MAX_Y = 70;

const path = (prefix: string, name: string): string => (prefix ? `${prefix}.${name}` : name);

/** L and H in mm²/s for Y in mm²/s (Y ≥ 2; checked by the callers). */
function basicValuesMm2s(y: number): { l: number; h: number } {
  if (y > TABLE_MAX_Y) {
    return { l: 0.8353 * y * y + 14.67 * y - 216, h: 0.1684 * y * y + 11.85 * y - 97 };
  }
  // Binary search for the last row with Y_row ≤ y.
  let lo = 0;
  let hi = ASTM_D2270_TABLE.length - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    const row = ASTM_D2270_TABLE[mid];
    if (row !== undefined && row[0] <= y) lo = mid;
    else hi = mid;
  }
  const a = ASTM_D2270_TABLE[lo];
  const b = ASTM_D2270_TABLE[hi];
  if (a === undefined || b === undefined) throw new Error('ASTM D2270 table is empty');
  if (y <= a[0]) return { l: a[1], h: a[2] };
  const f = (y - a[0]) / (b[0] - a[0]);
  return { l: a[1] + f * (b[1] - a[1]), h: a[2] + f * (b[2] - a[2]) };
}

/** Round to the nearest whole number, an exact half to the even one (ASTM E29 [memory]). */
function roundHalfEven(x: number): number {
  const r = Math.round(x);
  return Math.abs(x - Math.trunc(x)) === 0.5 && r % 2 !== 0 ? r - 1 : r;
}

function unroundedVi(u: number, y: number): { vi: number; l: number; h: number; procedure: 'A' | 'B' } {
  const { l, h } = basicValuesMm2s(y);
  if (u >= h) return { vi: (100 * (l - u)) / (l - h), l, h, procedure: 'A' };
  const n = (Math.log10(h) - Math.log10(u)) / Math.log10(y);
  return { vi: (Math.pow(10, n) - 1) / 0.00715 + 100, l, h, procedure: 'B' };
}

function requireKv(field: string, v: SquareMetresPerSecond, min: number, minText: string): void {
  if (!Number.isFinite(v) || v * MM2S_PER_M2S < min) {
    throw new EngineInputError(
      'oil.d2270-range',
      field,
      minText,
      `${field} = ${String(v * MM2S_PER_M2S)} mm²/s is outside the ASTM D2270 range (${minText}).`,
    );
  }
}

/**
 * ASTM D2270 basic values L and H for a given KV100.
 * @param kv100 - kinematic viscosity at 100 °C, m²/s (≥ 2 mm²/s)
 * @param field - input path prefix for errors, e.g. `oils[0]` (error on `oils[0].kv100_mm2s`)
 * @throws EngineInputError when kv100 < 2 mm²/s or not finite.
 */
export function d2270BasicValues(kv100: SquareMetresPerSecond, field = ''): { l: SquareMetresPerSecond; h: SquareMetresPerSecond } {
  requireKv(path(field, 'kv100_mm2s'), kv100, 2, '≥ 2 mm²/s');
  const { l, h } = basicValuesMm2s(kv100 * MM2S_PER_M2S);
  return { l: (l / MM2S_PER_M2S) as SquareMetresPerSecond, h: (h / MM2S_PER_M2S) as SquareMetresPerSecond };
}

/**
 * Viscosity index from KV40 and KV100 (ASTM D2270 procedures A and B).
 * @param kv40 - kinematic viscosity at 40 °C, m²/s (> 0)
 * @param kv100 - kinematic viscosity at 100 °C, m²/s (≥ 2 mm²/s)
 * @param field - input path prefix for errors, e.g. `oils[0]`
 * @throws EngineInputError on `…kv100_mm2s` below 2 mm²/s, on `…kv40_mm2s` if not positive.
 */
export function viscosityIndex(kv40: SquareMetresPerSecond, kv100: SquareMetresPerSecond, field = ''): ViscosityIndexResult {
  requireKv(path(field, 'kv100_mm2s'), kv100, 2, '≥ 2 mm²/s');
  if (!Number.isFinite(kv40) || kv40 <= 0) {
    const f = path(field, 'kv40_mm2s');
    throw new EngineInputError('input.not-positive', f, '> 0 mm²/s', `${f} = ${String(kv40 * MM2S_PER_M2S)} mm²/s must be greater than 0.`);
  }
  const r = unroundedVi(kv40 * MM2S_PER_M2S, kv100 * MM2S_PER_M2S);
  return {
    value: roundHalfEven(r.vi),
    unrounded: r.vi,
    l: (r.l / MM2S_PER_M2S) as SquareMetresPerSecond,
    h: (r.h / MM2S_PER_M2S) as SquareMetresPerSecond,
    procedure: r.procedure,
  };
}

/**
 * The KV100 that gives an oil of the given KV40 the given (unrounded) D2270 viscosity index:
 * bisection on Y between 2 mm²/s and KV40, to 1e-12 relative. For a grade finder that builds
 * a VG oil of a chosen VI. At fixed KV40, VI rises with KV100 wherever VI < 4000 (a grid check in
 * tests/engine/oil/viscosityIndex.test.ts), so the root is unique for any real oil.
 * @param kv40 - kinematic viscosity at 40 °C, m²/s (> 2 mm²/s)
 * @param vi - target viscosity index (finite)
 * @param field - input path prefix for errors
 * @returns KV100, m²/s
 * @throws EngineInputError when no KV100 in 2 mm²/s…KV40 reaches that VI.
 */
export function kv100ForViscosityIndex(kv40: SquareMetresPerSecond, vi: number, field = ''): SquareMetresPerSecond {
  const u = kv40 * MM2S_PER_M2S;
  if (!Number.isFinite(vi)) {
    const f = path(field, 'viscosityIndex');
    throw new EngineInputError('input.not-finite', f, 'finite', `${f} = ${String(vi)} must be a finite number.`);
  }
  let lo = 2;
  let hi = u;
  const fLo = Number.isFinite(u) && u > lo ? unroundedVi(u, lo).vi - vi : NaN;
  const fHi = Number.isFinite(u) && u > lo ? unroundedVi(u, hi * (1 - 1e-12)).vi - vi : NaN;
  if (!(fLo <= 0 && fHi >= 0)) {
    const f = path(field, 'viscosityIndex');
    throw new EngineInputError(
      'oil.vi-unreachable',
      f,
      'KV100 within 2 mm²/s…KV40',
      `${f} = ${String(vi)}: no KV100 between 2 mm²/s and KV40 = ${String(u)} mm²/s gives that ASTM D2270 viscosity index.`,
    );
  }
  while ((hi - lo) / hi > 1e-12) {
    const mid = 0.5 * (lo + hi);
    if (unroundedVi(u, mid).vi < vi) lo = mid;
    else hi = mid;
  }
  return ((0.5 * (lo + hi)) / MM2S_PER_M2S) as SquareMetresPerSecond;
}

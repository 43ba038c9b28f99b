import { EngineInputError } from '../diagnostics';
import type { SquareMetresPerSecond } from '../units';

/**
 * ISO 3448 viscosity classification of industrial liquid lubricants: grade VG n spans ±10 % of its
 * mid-point kinematic viscosity at 40 °C (e.g. VG 220 = 198…242 mm²/s). The mid-points equal
 * the grade numbers from VG 10 up; below that they are 2.2, 3.2, 4.6 and 6.8 mm²/s for
 * VG 2, 3, 5 and 7 [memory]. The bands do not touch, so an oil between two bands is "between
 * grades" (null). Limits are inclusive.
 */

export const ISO_VG_GRADES = [2, 3, 5, 7, 10, 15, 22, 32, 46, 68, 100, 150, 220, 320, 460, 680, 1000, 1500, 2200, 3200] as const;
export type IsoViscosityGrade = (typeof ISO_VG_GRADES)[number];

export interface IsoGradeLimits {
  readonly grade: IsoViscosityGrade;
  /** Mid-point kinematic viscosity at 40 °C, m²/s. */
  readonly midpoint: SquareMetresPerSecond;
  /** Lower limit (0.9 × mid-point), m²/s. */
  readonly min: SquareMetresPerSecond;
  /** Upper limit (1.1 × mid-point), m²/s. */
  readonly max: SquareMetresPerSecond;
}

const MIDPOINT_MM2S: Readonly<Record<IsoViscosityGrade, number>> = {
  2: 2.2, 3: 3.2, 5: 4.6, 7: 6.8, 10: 10, 15: 15, 22: 22, 32: 32, 46: 46, 68: 68, 100: 100,
  150: 150, 220: 220, 320: 320, 460: 460, 680: 680, 1000: 1000, 1500: 1500, 2200: 2200, 3200: 3200,
};

// Rounded to 0.01 mm²/s so that 0.9 × 220 is 198 exactly, as the standard prints it.
const mm2s = (x: number): SquareMetresPerSecond => (Math.round(x * 100) / 100 / 1e6) as SquareMetresPerSecond;

/** The grades with their mid-point and limits at 40 °C, in ascending order. */
export const ISO_VG_LIMITS: readonly IsoGradeLimits[] = ISO_VG_GRADES.map((grade) => {
  const mid = MIDPOINT_MM2S[grade];
  return { grade, midpoint: mm2s(mid), min: mm2s(0.9 * mid), max: mm2s(1.1 * mid) };
});

/** Relative slack at the limits, so that 242 mm²/s entered as 242e-6 m²/s still counts as VG 220. */
const EDGE = 1e-9;

/**
 * The ISO 3448 grade of an oil, or null when its KV40 lies between two grades or outside
 * VG 2…3200.
 * @param kv40 - kinematic viscosity at 40 °C, m²/s (> 0)
 * @param field - input path named in errors, e.g. `oils[0].kv40_mm2s`
 * @throws EngineInputError when kv40 is not a positive finite number.
 */
export function isoViscosityGrade(kv40: SquareMetresPerSecond, field = 'kv40_mm2s'): IsoViscosityGrade | null {
  if (!Number.isFinite(kv40) || kv40 <= 0) {
    throw new EngineInputError('input.not-positive', field, '> 0 mm²/s', `${field} = ${String(kv40 * 1e6)} mm²/s must be greater than 0.`);
  }
  for (const g of ISO_VG_LIMITS) {
    if (kv40 >= g.min * (1 - EDGE) && kv40 <= g.max * (1 + EDGE)) return g.grade;
  }
  return null;
}

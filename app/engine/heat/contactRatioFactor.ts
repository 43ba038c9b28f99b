import { EngineInputError, requirePositive } from '../diagnostics';
import { requireNonNegative } from '../film/inputChecks';

/**
 * Contact ratio factor X_ε of the integral temperature method: the mean flash temperature
 * over the path of contact, with the load sharing, as a fraction of the flash temperature at
 * the pinion tip E computed with the full load, θfla,int = X_ε · θfla,E.
 *
 * With ε1 = CE/p_bt (pinion addendum contact ratio), ε2 = AC/p_bt (wheel), εα = ε1 + ε2:
 *
 *   X_ε = Q / (2 εα ε1), where Q is
 *   εα < 1:                 ε1² + ε2²
 *   1 ≤ εα < 2, ε1, ε2 < 1: 0.70 (ε1² + ε2²) − 0.22 (ε1 + ε2) + 0.52 − 0.60 ε1 ε2
 *   1 ≤ εα < 2, ε1 ≥ 1:     0.18 ε1² + 0.70 ε2² + 0.82 ε1 − 0.52 ε2 − 0.30 ε1 ε2
 *   1 ≤ εα < 2, ε2 ≥ 1:     0.70 ε1² + 0.18 ε2² − 0.52 ε1 + 0.82 ε2 − 0.30 ε1 ε2
 *   2 ≤ εα < 3, ε1 ≥ ε2:    0.44 ε1² + 0.59 ε2² + 0.30 ε1 − 0.30 ε2 − 0.15 ε1 ε2
 *   2 ≤ εα < 3, ε1 < ε2:    0.59 ε1² + 0.44 ε2² − 0.30 ε1 + 0.30 ε2 − 0.15 ε1 ε2
 *
 * Recalled [memory]; supported by two checks of our own: the εα < 1 branch is the exact mean of
 * a flash temperature linear in the distance from C, and every pair of neighbouring branches
 * meets continuously on its common boundary (tests/reference/isoTs6336_21.test.ts).
 *
 * @param eps1 - pinion addendum contact ratio ε1 (> 0)
 * @param eps2 - wheel addendum contact ratio ε2 (≥ 0)
 * @returns X_ε, dimensionless
 *
 * εα ≥ 3 (outside the standard's table) or ε1 ≤ 0 throw EngineInputError.
 * Source: ISO/TS 6336-21:2017 (as DIN 3990-4 integral temperature method), contact ratio factor [memory].
 */
export function integralContactRatioFactor(eps1: number, eps2: number): number {
  requirePositive('eps1', eps1);
  requireNonNegative('eps2', eps2);
  const e1 = eps1;
  const e2 = eps2;
  const ea = e1 + e2;
  let q: number;
  if (ea < 1) {
    q = e1 * e1 + e2 * e2;
  } else if (ea < 2) {
    if (e1 >= 1) q = 0.18 * e1 * e1 + 0.7 * e2 * e2 + 0.82 * e1 - 0.52 * e2 - 0.3 * e1 * e2;
    else if (e2 >= 1) q = 0.7 * e1 * e1 + 0.18 * e2 * e2 - 0.52 * e1 + 0.82 * e2 - 0.3 * e1 * e2;
    else q = 0.7 * (e1 * e1 + e2 * e2) - 0.22 * ea + 0.52 - 0.6 * e1 * e2;
  } else if (ea < 3) {
    if (e1 >= e2) q = 0.44 * e1 * e1 + 0.59 * e2 * e2 + 0.3 * e1 - 0.3 * e2 - 0.15 * e1 * e2;
    else q = 0.59 * e1 * e1 + 0.44 * e2 * e2 - 0.3 * e1 + 0.3 * e2 - 0.15 * e1 * e2;
  } else {
    throw new EngineInputError(
      'input.out-of-range',
      'epsAlpha',
      '< 3',
      `Transverse contact ratio εα = ${ea.toFixed(3)} is 3 or more, outside the X_ε table of ISO/TS 6336-21.`,
    );
  }
  return q / (2 * ea * e1);
}

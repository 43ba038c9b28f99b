import type { WarningSink } from '../diagnostics';
import type { Metres, MetresPerSecond, NewtonsPerMetre, Pascals, PascalSeconds, PerPascal } from '../units';
import { lineContactGroups } from './lineContactGroups';

/**
 * Dowson–Higginson minimum film thickness of an isothermal, fully flooded EHL line contact.
 *
 *   H_min = h_min / R = 2.65 U^0.7 G^0.54 W^−0.13
 *   U = η0 ū / (E′ R),  G = α E′,  W = w / (E′ R)
 *
 * Equivalently h_min = 2.65 α^0.54 (η0 ū)^0.7 R^0.43 E′^−0.03 w^−0.13.
 * Hamrock convention: E′ = 2 / [(1−ν1²)/E1 + (1−ν2²)/E2] = 2E*.
 *
 * @param eta0 - dynamic viscosity at inlet (bulk) temperature and ambient pressure, Pa·s (> 0)
 * @param alpha - pressure–viscosity coefficient, 1/Pa (> 0)
 * @param uMean - mean entrainment velocity ū = (v1 + v2)/2, m/s
 * @param radius - reduced radius of curvature R (1/R = 1/ρ1 + 1/ρ2, normal section), m (> 0)
 * @param loadPerLength - normal load per unit contact length w, N/m (> 0)
 * @param eReduced - reduced modulus E′ (Hamrock convention, = 2E*), Pa (> 0)
 * @param warnings - optional sink for extrapolation warnings
 * @returns h_min in metres
 *
 * Validity: U, W, G inside LINE_CONTACT_FIT_LIMITS (lineContactRange.ts); outside them a
 * warning per group is added and the formula value is still returned. ū ≤ 0 (no
 * entrainment) returns 0 and adds `film.no-entrainment`. A non-positive or non-finite
 * η0, α, R, w or E′ (or a non-finite ū) throws EngineInputError.
 * No thermal (see thermalCorrection.ts) or starvation correction is applied.
 *
 * Source: D. Dowson, G. R. Higginson, Elasto-Hydrodynamic Lubrication, Pergamon, 1966/1977
 * (2.65 form); as given in B. J. Hamrock, Fundamentals of Fluid Film Lubrication [memory].
 */
export function dowsonHigginsonMinFilm(
  eta0: PascalSeconds,
  alpha: PerPascal,
  uMean: MetresPerSecond,
  radius: Metres,
  loadPerLength: NewtonsPerMetre,
  eReduced: Pascals,
  warnings?: WarningSink,
): Metres {
  const g = lineContactGroups('Dowson–Higginson', eta0, alpha, uMean, radius, loadPerLength, eReduced, warnings);
  if (!g) return 0 as Metres;
  const { U, W, G } = g;
  return (2.65 * Math.pow(U, 0.7) * Math.pow(G, 0.54) * Math.pow(W, -0.13) * radius) as Metres;
}

import type { WarningSink } from '../diagnostics';
import type { Metres, MetresPerSecond, NewtonsPerMetre, Pascals, PascalSeconds, PerPascal } from '../units';
import { lineContactGroups } from './lineContactGroups';

/** Minimum and central film thickness of a line contact, in metres. Reuse one object in a loop. */
export interface PanHamrockFilm {
  /** h_min, at the exit constriction. */
  hMin: Metres;
  /** h_c, in the flat central part of the conjunction. */
  hCentral: Metres;
}

/**
 * Pan–Hamrock minimum and central film thickness of an isothermal, fully flooded EHL line contact.
 *
 *   H_min = h_min / R = 1.714 W^−0.128 U^0.694 G^0.568
 *   H_c   = h_c / R   = 2.922 W^−0.166 U^0.692 G^0.470
 *   U = η0 ū / (E′ R),  G = α E′,  W = w / (E′ R),  E′ = 2E* (Hamrock convention)
 *
 * @param eta0 - dynamic viscosity at inlet temperature, ambient pressure, Pa·s (> 0)
 * @param alpha - pressure–viscosity coefficient, 1/Pa (> 0)
 * @param uMean - mean entrainment velocity ū = (v1 + v2)/2, m/s
 * @param radius - reduced radius of curvature R, m (> 0)
 * @param loadPerLength - normal load per unit contact length w, N/m (> 0)
 * @param eReduced - reduced modulus E′ = 2/[(1−ν1²)/E1 + (1−ν2²)/E2], Pa (> 0)
 * @param warnings - optional sink for extrapolation warnings
 * @param out - optional object to write into (no allocation in a hot loop)
 * @returns `out` (or a new object) holding h_min and h_c in metres
 *
 * Validity and out-of-range behaviour as dowsonHigginsonMinFilm: warnings outside
 * LINE_CONTACT_FIT_LIMITS; ū ≤ 0 gives both films 0 and `film.no-entrainment`;
 * meaningless inputs throw EngineInputError.
 *
 * Source: P. Pan, B. J. Hamrock, "Simple formulas for performance parameters used in
 * elastohydrodynamically lubricated line contacts", ASME J. Tribology 111 (1989) 246–251 [memory].
 */
export function panHamrockFilm(
  eta0: PascalSeconds,
  alpha: PerPascal,
  uMean: MetresPerSecond,
  radius: Metres,
  loadPerLength: NewtonsPerMetre,
  eReduced: Pascals,
  warnings?: WarningSink,
  out: PanHamrockFilm = { hMin: 0 as Metres, hCentral: 0 as Metres },
): PanHamrockFilm {
  const g = lineContactGroups('Pan–Hamrock', eta0, alpha, uMean, radius, loadPerLength, eReduced, warnings);
  if (!g) {
    out.hMin = 0 as Metres;
    out.hCentral = 0 as Metres;
    return out;
  }
  const { U, W, G } = g;
  out.hMin = (1.714 * Math.pow(W, -0.128) * Math.pow(U, 0.694) * Math.pow(G, 0.568) * radius) as Metres;
  out.hCentral = (2.922 * Math.pow(W, -0.166) * Math.pow(U, 0.692) * Math.pow(G, 0.47) * radius) as Metres;
  return out;
}

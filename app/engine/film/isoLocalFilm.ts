import { requirePositive, type WarningSink } from '../diagnostics';
import type { Metres, MetresPerSecond, Pascals, PascalSeconds, PerPascal } from '../units';
import { requireFinite } from './inputChecks';
import { warnOutsideLineContactFit } from './lineContactRange';

/**
 * ISO/TR 15144-1 local lubricant film thickness at a point Y of the path of contact
 * (the film used for the specific film thickness λ_GF,Y of the micropitting method).
 *
 * As printed (h in µm, ρ in mm): h_Y = 1600 ρn,Y G_M^0.6 U_Y^0.7 W_Y^−0.13 S_GF,Y^0.22 [memory].
 * In SI (1600 = 1.6 × 1000 µm/mm), the form evaluated here:
 *
 *   h_Y = 1.6 ρn,Y G_M^0.6 U_Y^0.7 W_Y^−0.13 S_GF,Y^0.22
 *   G_M = α E_r,   U_Y = η vΣ,Y / (2 E_r ρn,Y),   W_Y = 2π p_dyn,Y² / E_r²   [memory]
 *   E_r = 2 / [(1−ν1²)/E1 + (1−ν2²)/E2]  (= 2E*, as E′ of the Hamrock convention)
 *
 * With p² = w E_r /(2π ρ) (Hertz line contact), W_Y = w/(E_r ρ) and U_Y = η ū/(E_r ρ): the
 * groups are the Dowson–Higginson ones, and the 1.6 G^0.6 form equals 2.65 G^0.54 at G ≈ 4490.
 *
 * S_GF,Y, the sliding (local heating) parameter, is an input, not computed here: as recalled
 * [memory, weak] it is (α η) at the local contact temperature θB,Y over (α η) at the bulk
 * temperature θM, so 0 < S_GF ≤ 1, and S_GF = 1 (the default) is the isothermal film,
 * exact where there is no sliding (pitch point). The caller computes it with its viscosity model.
 *
 * @param eta - dynamic viscosity at the bulk temperature θM, Pa·s (> 0)
 * @param alpha - pressure–viscosity coefficient at θM, 1/Pa (> 0)
 * @param vSum - sum velocity vΣ,Y = v1 + v2 at Y, m/s
 * @param rhoN - normal relative radius of curvature ρn,Y, m (> 0)
 * @param pDyn - local Hertzian contact pressure p_dyn,Y (with the load factors), Pa (> 0)
 * @param eR - reduced modulus E_r, Pa (> 0)
 * @param sGF - sliding parameter S_GF,Y, dimensionless (> 0), default 1
 * @param warnings - optional sink for extrapolation warnings
 * @returns h_Y in metres
 *
 * Validity: groups inside LINE_CONTACT_FIT_LIMITS (warning outside, value still returned);
 * vΣ ≤ 0 returns 0 with `film.no-entrainment`; non-positive η, α, ρ, p, E_r, S_GF throw EngineInputError.
 *
 * Source: ISO/TR 15144-1:2014, calculation of micropitting load capacity, local film
 * thickness (method B) [memory]; built on Dowson & Higginson (1966) 1.6 G^0.6 form.
 */
export function isoLocalFilm(
  eta: PascalSeconds,
  alpha: PerPascal,
  vSum: MetresPerSecond,
  rhoN: Metres,
  pDyn: Pascals,
  eR: Pascals,
  sGF = 1,
  warnings?: WarningSink,
): Metres {
  requirePositive('eta', eta, 'Pa·s');
  requirePositive('alpha', alpha, '1/Pa');
  requireFinite('vSum', vSum, 'm/s');
  requirePositive('rhoN', rhoN, 'm');
  requirePositive('pDyn', pDyn, 'Pa');
  requirePositive('eR', eR, 'Pa');
  requirePositive('sGF', sGF);
  if (vSum <= 0) {
    warnings?.add({
      code: 'film.no-entrainment',
      severity: 'warning',
      field: 'vSum',
      message: `Sum velocity vΣ = ${vSum} m/s is not above 0: no oil is drawn into the contact and no EHL film is formed (film taken as 0).`,
    });
    return 0 as Metres;
  }
  const G = alpha * eR;
  const U = (eta * vSum) / (2 * eR * rhoN);
  const pe = pDyn / eR;
  const W = 2 * Math.PI * pe * pe;
  warnOutsideLineContactFit('ISO/TR 15144-1', U, W, G, warnings);
  return (1.6 * rhoN * Math.pow(G, 0.6) * Math.pow(U, 0.7) * Math.pow(W, -0.13) * Math.pow(sGF, 0.22)) as Metres;
}

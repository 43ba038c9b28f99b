import { requirePositive, type WarningSink } from '../diagnostics';
import type { MetresPerSecond, PascalSeconds, PerKelvin, WattsPerMetreKelvin } from '../units';
import { requireFinite, requireNonNegative } from './inputChecks';

/** Thermal conductivity of a mineral gear oil, W/(m·K) (common practice: 0.12–0.14). */
export const MINERAL_OIL_CONDUCTIVITY = 0.13 as WattsPerMetreKelvin;

/** Thermal loading parameter above which the fit is taken as extrapolated [memory, weak]. */
export const MURCH_WILSON_L_MAX = 10;

/**
 * Murch–Wilson inlet shear-heating reduction factor for the isothermal EHL film:
 * h_thermal = φT · h_isothermal.
 *
 *   φT = 3.94 / (3.94 + L^0.62),   L = β η0 ū² / k_f
 *
 * ū is the MEAN entrainment velocity (v1 + v2)/2, as in the film formulas; only its
 * magnitude matters (ū²), so a negative ū is accepted. L = 0 gives φT = 1.
 *
 * @param beta - temperature–viscosity coefficient β = −(1/η) dη/dT at the inlet temperature, 1/K (≥ 0)
 * @param eta0 - dynamic viscosity at the inlet temperature, Pa·s (> 0)
 * @param uMean - mean entrainment velocity ū, m/s
 * @param kFluid - oil thermal conductivity k_f, W/(m·K) (> 0), default 0.13 (mineral oil, common practice)
 * @param warnings - optional sink; `film.thermal-loading-range` when L > MURCH_WILSON_L_MAX
 * @returns φT, dimensionless, in (0, 1]
 *
 * Validity: the fit is used up to L ≈ 10 [memory, weak]; above that a warning is added and
 * the formula value is still returned. Negative β, non-positive η0 or k_f, or non-finite ū throw EngineInputError.
 *
 * Source: L. E. Murch, W. R. D. Wilson, "A thermal elastohydrodynamic inlet zone analysis",
 * ASME J. Lubrication Technology 97 (1975) 212–216 [memory].
 */
export function murchWilsonThermalFactor(
  beta: PerKelvin,
  eta0: PascalSeconds,
  uMean: MetresPerSecond,
  kFluid: WattsPerMetreKelvin = MINERAL_OIL_CONDUCTIVITY,
  warnings?: WarningSink,
): number {
  requireNonNegative('beta', beta, '1/K');
  requirePositive('eta0', eta0, 'Pa·s');
  requireFinite('uMean', uMean, 'm/s');
  requirePositive('kFluid', kFluid, 'W/(m·K)');
  const L = (beta * eta0 * uMean * uMean) / kFluid;
  if (L > MURCH_WILSON_L_MAX) {
    warnings?.add({
      code: 'film.thermal-loading-range',
      severity: 'warning',
      field: 'L',
      message: `Thermal loading parameter L = ${L.toFixed(1)} is above ${MURCH_WILSON_L_MAX}; the Murch–Wilson factor is an extrapolation.`,
    });
  }
  return 3.94 / (3.94 + Math.pow(L, 0.62));
}

import { requirePositive, type WarningSink } from '../diagnostics';
import { requireFinite, requireNonNegative } from '../film/inputChecks';
import { celsiusToKelvin, kelvinToCelsius, type Kelvin, type KelvinDifference, type NewtonMetres } from '../units';
import { multipleMeshFactor } from './meshingPinions';
import type { ScuffingSafety } from './scuffingTemperature';

/**
 * Pinion torque T1 of the FZG A/8.3/90 test per load stage (index 0 = stage 1 … index 11 = stage 12), N·m.
 * Source: ISO 14635-1, load stages of the FZG test [memory].
 */
export const FZG_A_PINION_TORQUE: readonly NewtonMetres[] = [
  3.3, 13.7, 35.3, 60.8, 94.1, 135.3, 183.4, 239.3, 302.0, 372.6, 450.1, 534.5,
] as NewtonMetres[];

/** Weighting of the flash temperature in θint (C2) and in θM (C1), ISO/TS 6336-21 [memory]. */
export const INTEGRAL_WEIGHT_FLASH = 1.5;
export const INTEGRAL_WEIGHT_BULK = 0.7;

export interface IntegralTemperature {
  /** θint = θM + 1.5 θfla,int, K. */
  readonly integral: Kelvin;
  /** θM = θoil + 0.7 X_mp θfla,int, K. */
  readonly bulk: Kelvin;
  /** θfla,int = θfla,E X_ε, K (difference). */
  readonly flashIntegral: KelvinDifference;
}

/**
 * Integral temperature of the integral temperature method:
 *
 *   θfla,int = θfla,E · X_ε
 *   θM       = θoil + 0.7 · X_mp · θfla,int,   X_mp = (1 + n_p)/2
 *   θint     = θM + 1.5 · θfla,int
 *
 * θfla,E is an input: the flash temperature at the pinion tip E with the full transverse
 * unit load (no load sharing; X_ε carries it) and the mean friction μm. The standard writes it
 * as a closed form (thermo-elastic, geometry, angle, approach and tip-relief factors); here it is
 * the Blok flash temperature at E (blokFlash.ts, with w = K_Bγ w_Bt), the same physics, with no
 * scale factor: on the FZG A test gear at stage 12 and 90 °C it gives θfla,E · X_ε ≈ 106 K
 * against the test's own θfla,int,T = 0.2 · 534.5 = 107 K (tests/reference/fzgScuffingCalibration.test.ts).
 *
 * @param thetaOil - oil temperature, K
 * @param flashTipE - θfla,E, K (difference, ≥ 0)
 * @param xEps - contact ratio factor X_ε (contactRatioFactor.ts), dimensionless (≥ 0)
 * @param meshingPinions - n_p, gears meshing with the pinion (integer ≥ 1), default 1
 *
 * Non-finite or negative inputs throw EngineInputError.
 * Source: ISO/TS 6336-21:2017, integral temperature [memory].
 */
export function integralTemperature(thetaOil: Kelvin, flashTipE: KelvinDifference, xEps: number, meshingPinions = 1): IntegralTemperature {
  requirePositive('thetaOil', thetaOil, 'K');
  requireNonNegative('flashTipE', flashTipE, 'K');
  requireNonNegative('xEps', xEps);
  const flashIntegral = flashTipE * xEps;
  const bulk = thetaOil + INTEGRAL_WEIGHT_BULK * multipleMeshFactor(meshingPinions) * flashIntegral;
  return {
    integral: (bulk + INTEGRAL_WEIGHT_FLASH * flashIntegral) as Kelvin,
    bulk: bulk as Kelvin,
    flashIntegral: flashIntegral as KelvinDifference,
  };
}

/** θfla,int,T = 0.2 · T1T · X_L: the test gear's own integral flash temperature (K, T1T in N·m), ISO/TS 6336-21 [memory]. */
export const TEST_FLASH_PER_TORQUE = 0.2;
/** θMT = 80 + 0.23 · T1T · X_L: the test gear's bulk temperature (°C, T1T in N·m), ISO/TS 6336-21 [memory]. */
export const TEST_BULK_PER_TORQUE = 0.23;

/**
 * Integral scuffing temperature from the FZG A/8.3/90 test. It is the integral temperature the
 * test gear itself reaches at the failure stage, bulk part and weighted flash part:
 *
 *   θintS = θMT + X_WrelT · C2 · θfla,int,T
 *   θMT        = 80 + 0.23 · T1T · X_L          (°C)
 *   θfla,int,T = 0.2 · T1T · X_L                (K)
 *   C2 = 1.5
 *
 * For stage 12 (T1T = 534.5 N·m), mineral oil, X_WrelT = 1: 202.9 + 1.5 · 106.9 = 363.3 °C.
 * (θMT alone, 80 + 0.23 T1T, is the test's bulk temperature, not its integral scuffing
 * temperature: it leaves out the flash part and makes the method ≈ 2× too strict.)
 *
 * @param t1T - pinion torque of the failure load stage, N·m (> 0); see {@link FZG_A_PINION_TORQUE}
 * @param xL - lubricant factor X_L (> 0), default 1 (mineral oil)
 * @param xWrelT - relative structural factor X_WrelT = X_W / X_WT of the rated flanks against the
 *   case-carburised test gear (X_WT = 1), default 1
 * @returns θintS, K
 * Source: ISO/TS 6336-21:2017, integral scuffing temperature [memory].
 */
export function integralScuffingTemperature(t1T: NewtonMetres, xL = 1, xWrelT = 1): Kelvin {
  requirePositive('t1T', t1T, 'N·m');
  requirePositive('xL', xL);
  requirePositive('xWrelT', xWrelT);
  const bulkT = 80 + TEST_BULK_PER_TORQUE * t1T * xL;
  const flashT = TEST_FLASH_PER_TORQUE * t1T * xL;
  return celsiusToKelvin(bulkT + xWrelT * INTEGRAL_WEIGHT_FLASH * flashT);
}

/**
 * Integral scuffing safety S_intS = θintS / θint.
 *
 * The ratio is of Celsius temperatures, as in the standard (a ratio in kelvin would be a
 * different number); both inputs are converted from K to °C here. When θint ≤ 0 °C the
 * ratio has no meaning: { value: null, reason: 'integral-temperature-not-positive' } and a warning.
 *
 * @param thetaIntS - integral scuffing temperature, K
 * @param thetaInt - integral temperature, K
 * @param warnings - optional sink
 * Source: ISO/TS 6336-21:2017, safety factor [memory].
 */
export function integralScuffingSafety(thetaIntS: Kelvin, thetaInt: Kelvin, warnings?: WarningSink): ScuffingSafety {
  requireFinite('thetaIntS', thetaIntS, 'K');
  requireFinite('thetaInt', thetaInt, 'K');
  const sC = kelvinToCelsius(thetaIntS);
  const iC = kelvinToCelsius(thetaInt);
  if (!(iC > 0)) {
    warnings?.add({
      code: 'heat.integral-temperature-not-positive',
      severity: 'warning',
      field: 'thetaInt',
      message: `Integral temperature ${iC.toFixed(1)} °C is not above 0 °C: the integral scuffing safety (a ratio of °C temperatures) is not defined.`,
    });
    return { value: null, reason: 'integral-temperature-not-positive' };
  }
  return { value: sC / iC, reason: 'ok' };
}

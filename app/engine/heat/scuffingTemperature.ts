import { EngineInputError, requirePositive, type WarningSink } from '../diagnostics';
import { requireFinite } from '../film/inputChecks';
import { celsiusToKelvin, kelvinToCelsius, type Kelvin } from '../units';

/** FZG A/8.3/90 failure load stage: 1…12, or '>12' when the oil passed stage 12 (numbers above 12 mean the same). */
export type FzgFailureStage = number | '>12';

export interface ScuffingTemperature {
  /** θS, K (absolute). */
  readonly value: Kelvin;
  /** True when the oil passed stage 12: θS is then a lower bound (the value for stage 12). */
  readonly atLeast: boolean;
  /** The stage the value was computed for (1…12). */
  readonly stage: number;
}

/**
 * Scuffing temperature of an oil from its FZG A/8.3/90 failure load stage S
 * (the contact temperature the flash temperature method gives for the test gear at that stage):
 *
 *   θS = 80 + (0.85 + 1.4 X_W) · X_L · S²   (°C)
 *
 * For X_W = X_L = 1: S = 9 → 262.25 °C, S = 12 → 404 °C.
 *
 * @param stage - failure load stage, an integer 1…12, or '>12' (any number > 12 counts as '>12',
 *   computed with S = 12 and atLeast = true)
 * @param xW - structural factor X_W of the flank material/treatment (> 0), default 1 (through-hardened, carburised)
 * @param xL - lubricant factor X_L (> 0), default 1 (mineral oil)
 * @returns θS in K with the atLeast flag
 *
 * A non-integer stage, a stage below 1, or non-positive factors throw EngineInputError.
 * Source: ISO/TS 6336-20:2017, scuffing temperature from the FZG test [memory, strong].
 */
export function scuffingTemperature(stage: FzgFailureStage, xW = 1, xL = 1): ScuffingTemperature {
  requirePositive('xW', xW);
  requirePositive('xL', xL);
  let s: number;
  let atLeast = false;
  if (stage === '>12' || (typeof stage === 'number' && stage > 12 && Number.isFinite(stage))) {
    s = 12;
    atLeast = true;
  } else if (typeof stage === 'number' && Number.isInteger(stage) && stage >= 1) {
    s = stage;
  } else {
    throw new EngineInputError(
      'input.out-of-range',
      'fzgFailureStage',
      'integer 1…12 or >12',
      `FZG failure load stage ${String(stage)} must be a whole number 1…12, or ">12".`,
    );
  }
  return { value: celsiusToKelvin(80 + (0.85 + 1.4 * xW) * xL * s * s), atLeast, stage: s };
}

export type ScuffingSafetyReason =
  | 'ok'
  | 'no-temperature-rise'
  | 'oil-at-or-above-scuffing-temperature'
  /** Integral method only: θint ≤ 0 °C, where a ratio of °C temperatures means nothing. */
  | 'integral-temperature-not-positive';

/** A safety factor that can be undefined: value null when the ratio has no meaning, with the reason. */
export interface ScuffingSafety {
  readonly value: number | null;
  readonly reason: ScuffingSafetyReason;
}

/**
 * Scuffing safety factor of the flash temperature method:
 *
 *   S_B = (θS − θoil) / (θB,max − θoil)
 *
 * Temperatures may be in K or °C (differences only).
 * - θB,max ≤ θoil (no flash or bulk rise: no load, no friction, or no sliding): the ratio is
 *   unbounded; returns { value: null, reason: 'no-temperature-rise' } and warns
 *   `heat.no-temperature-rise`. Never Infinity or NaN.
 * - θS ≤ θoil: the oil is at or above its scuffing temperature before any flash; returns the
 *   (≤ 0) ratio with reason 'oil-at-or-above-scuffing-temperature' and warns.
 *
 * @param thetaS - scuffing temperature θS, K
 * @param thetaOil - oil temperature θoil, K
 * @param thetaBmax - maximum contact temperature θB,max = θM + θfl,max, K
 * @param warnings - optional sink for the two cases above
 * Source: ISO/TS 6336-20:2017, safety factor for scuffing [memory].
 */
export function scuffingSafety(thetaS: Kelvin, thetaOil: Kelvin, thetaBmax: Kelvin, warnings?: WarningSink): ScuffingSafety {
  requireFinite('thetaS', thetaS, 'K');
  requireFinite('thetaOil', thetaOil, 'K');
  requireFinite('thetaBmax', thetaBmax, 'K');
  const rise = thetaBmax - thetaOil;
  if (!(rise > 0)) {
    warnings?.add({
      code: 'heat.no-temperature-rise',
      severity: 'info',
      field: 'thetaBmax',
      message: `Contact temperature θB,max (${kelvinToCelsius(thetaBmax).toFixed(1)} °C) is not above the oil temperature (${kelvinToCelsius(thetaOil).toFixed(1)} °C): the scuffing safety factor is not defined (no flash temperature).`,
    });
    return { value: null, reason: 'no-temperature-rise' };
  }
  const value = (thetaS - thetaOil) / rise;
  if (thetaS <= thetaOil) {
    warnings?.add({
      code: 'heat.oil-above-scuffing-temperature',
      severity: 'warning',
      field: 'thetaOil',
      message: `Oil temperature ${kelvinToCelsius(thetaOil).toFixed(1)} °C is at or above the scuffing temperature θS = ${kelvinToCelsius(thetaS).toFixed(1)} °C: no scuffing margin.`,
    });
    return { value, reason: 'oil-at-or-above-scuffing-temperature' };
  }
  return { value, reason: 'ok' };
}

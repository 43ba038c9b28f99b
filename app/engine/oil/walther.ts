import { EngineInputError } from '../diagnostics';
import type { Kelvin, PerKelvin, SquareMetresPerSecond } from '../units';

/**
 * ASTM D341 viscosity–temperature relation (Walther):
 *
 *   log10 log10 Z = A − B log10 T
 *
 * with T the absolute temperature in K and Z a corrected kinematic viscosity, ν in mm²/s:
 *
 *   Z = ν + 0.7 + exp(−1.47 − 1.84 ν − 0.51 ν²)
 *   ν = (Z − 0.7) − exp(−0.7487 − 3.295 (Z − 0.7) + 0.6119 (Z − 0.7)² − 0.3193 (Z − 0.7)³)
 *
 * The mm²/s and the base-10 logarithms are part of the published constants; the public API takes and
 * returns m²/s and K. Validity (ASTM D341-09 [memory]): ν from 0.21 to 2·10⁷ mm²/s, for petroleum
 * oils and liquid hydrocarbons. The inverse correction is the standard's own approximation: a
 * round trip ν → Z → ν is exact to about 3·10⁻⁴ relative at 0.21–2 mm²/s, 9·10⁻⁵ at 2 mm²/s
 * and better than 10⁻¹⁰ from 5 mm²/s up (measured in tests/reference/astmD341.test.ts).
 * Source: ASTM D341, "Standard Practice for Viscosity–Temperature Equations and Charts for Liquid
 * Petroleum or Hydrocarbon Products".
 */

/** Walther constants A and B of log10 log10 Z = A − B log10 T (Z in mm²/s, T in K). */
export interface WaltherConstants {
  readonly a: number;
  readonly b: number;
}

/** Lower end of the ASTM D341 correction's range, 0.21 mm²/s, in m²/s [memory: D341-09]. */
export const D341_MIN_VISCOSITY = 0.21e-6 as SquareMetresPerSecond;
/** Upper end of the ASTM D341 range, 2·10⁷ mm²/s, in m²/s [memory: D341-09]. */
export const D341_MAX_VISCOSITY = 20 as SquareMetresPerSecond;

const MM2S_PER_M2S = 1e6;
const LN10 = Math.LN10;

/** Z(ν), in mm²/s, for ν given in mm²/s. */
function zOf(nuMm2s: number): number {
  return nuMm2s + 0.7 + Math.exp(-1.47 - 1.84 * nuMm2s - 0.51 * nuMm2s * nuMm2s);
}

/** ν(Z), in mm²/s: the D341 inverse. */
function nuOf(z: number): number {
  const x = z - 0.7;
  return x - Math.exp(-0.7487 - 3.295 * x + 0.6119 * x * x - 0.3193 * x * x * x);
}

/** dν/dZ of the D341 inverse (dimensionless). */
function dNuDz(z: number): number {
  const x = z - 0.7;
  const p = -0.7487 - 3.295 * x + 0.6119 * x * x - 0.3193 * x * x * x;
  const dp = -3.295 + 1.2238 * x - 0.9579 * x * x;
  return 1 - Math.exp(p) * dp;
}

function requireD341Viscosity(field: string, nu: SquareMetresPerSecond): void {
  if (!Number.isFinite(nu) || nu < D341_MIN_VISCOSITY || nu > D341_MAX_VISCOSITY) {
    throw new EngineInputError(
      'oil.d341-viscosity-range',
      field,
      '0.21…2e7 mm²/s',
      `${field} = ${String(nu * MM2S_PER_M2S)} mm²/s is outside the ASTM D341 range 0.21…2e7 mm²/s.`,
    );
  }
}

function requireAbsoluteTemperature(field: string, t: Kelvin): void {
  if (!Number.isFinite(t) || t <= 0) {
    throw new EngineInputError('input.not-positive', field, '> 0 K', `${field} = ${String(t)} K must be an absolute temperature above 0 K.`);
  }
}

/**
 * The D341 corrected viscosity Z = ν + 0.7 + exp(−1.47 − 1.84ν − 0.51ν²).
 * @param nu - kinematic viscosity, m²/s (D341 range 0.21…2e7 mm²/s; not checked here)
 * @returns Z in mm²/s (the standard's unit)
 */
export function waltherZ(nu: SquareMetresPerSecond): number {
  return zOf(nu * MM2S_PER_M2S);
}

/**
 * The D341 inverse ν = (Z−0.7) − exp(−0.7487 − 3.295(Z−0.7) + 0.6119(Z−0.7)² − 0.3193(Z−0.7)³).
 * @param z - corrected viscosity Z, mm²/s (> 1 for a meaningful Walther line)
 * @returns kinematic viscosity, m²/s
 */
export function viscosityFromWaltherZ(z: number): SquareMetresPerSecond {
  return (nuOf(z) / MM2S_PER_M2S) as SquareMetresPerSecond;
}

/**
 * Fit A and B through two measured points, usually KV40 at 313.15 K and KV100 at 373.15 K:
 * B = (log log Z1 − log log Z2)/(log T2 − log T1), A = log log Z1 + B log T1.
 * @param nu1 - kinematic viscosity at t1, m²/s (0.21…2e7 mm²/s)
 * @param t1 - temperature of the first point, K
 * @param nu2 - kinematic viscosity at t2, m²/s (0.21…2e7 mm²/s)
 * @param t2 - temperature of the second point, K (≠ t1)
 * @param field1 - input path named in errors about nu1
 * @param field2 - input path named in errors about nu2
 * @throws EngineInputError when a viscosity is outside the D341 range, a temperature is not
 *   positive, the temperatures coincide, or the viscosity does not fall as temperature rises.
 */
export function fitWalther(
  nu1: SquareMetresPerSecond,
  t1: Kelvin,
  nu2: SquareMetresPerSecond,
  t2: Kelvin,
  field1 = 'nu1',
  field2 = 'nu2',
): WaltherConstants {
  requireD341Viscosity(field1, nu1);
  requireD341Viscosity(field2, nu2);
  requireAbsoluteTemperature(`${field1}.temperature`, t1);
  requireAbsoluteTemperature(`${field2}.temperature`, t2);
  if (t1 === t2) {
    throw new EngineInputError('oil.walther-same-temperature', field2, '≠ first temperature', `${field2}: the two Walther points are at the same temperature (${String(t1)} K).`);
  }
  const w1 = Math.log10(Math.log10(waltherZ(nu1)));
  const w2 = Math.log10(Math.log10(waltherZ(nu2)));
  const b = (w1 - w2) / (Math.log10(t2) - Math.log10(t1));
  if (!(b > 0)) {
    throw new EngineInputError(
      'oil.viscosity-not-falling',
      field2,
      'viscosity falls as temperature rises',
      `${field2}: ${String(nu2 * MM2S_PER_M2S)} mm²/s at ${String(t2)} K against ${String(nu1 * MM2S_PER_M2S)} mm²/s at ${String(t1)} K would make the oil thicken as it warms.`,
    );
  }
  return { a: w1 + b * Math.log10(t1), b };
}

/**
 * ν(T) on the Walther line: Z = 10^(10^(A − B log10 T)), then the D341 inverse.
 * Cheap and allocation-free (hot loop). Outside the fitted points it extrapolates; the caller
 * bounds T (the oil model limits it to −40…200 °C and to the D341 viscosity range).
 * @param c - Walther constants from {@link fitWalther}
 * @param t - absolute temperature, K (> 0)
 * @returns kinematic viscosity, m²/s
 * @throws EngineInputError when t is not a positive finite number.
 */
export function waltherViscosity(c: WaltherConstants, t: Kelvin): SquareMetresPerSecond {
  if (!(t > 0) || t === Infinity) requireAbsoluteTemperature('temperature', t);
  const z = Math.pow(10, Math.pow(10, c.a - c.b * Math.log10(t)));
  return (nuOf(z) / MM2S_PER_M2S) as SquareMetresPerSecond;
}

/**
 * T(ν), the inverse of {@link waltherViscosity}: log10 T = (A − log10 log10 Z(ν))/B.
 * @param c - Walther constants
 * @param nu - kinematic viscosity, m²/s (0.21…2e7 mm²/s)
 * @param field - input path named in errors
 * @returns absolute temperature, K
 * @throws EngineInputError when nu is outside the D341 range.
 */
export function waltherTemperature(c: WaltherConstants, nu: SquareMetresPerSecond, field = 'viscosity'): Kelvin {
  requireD341Viscosity(field, nu);
  return Math.pow(10, (c.a - Math.log10(Math.log10(waltherZ(nu)))) / c.b) as Kelvin;
}

/**
 * Analytic slope d ln ν / dT of the Walther line, in 1/K (negative for a real oil):
 * d ln Z/dT = −B ln Z / T, and d ln ν/dT = (dν/dZ)(dZ/dT)/ν with dν/dZ from the D341 inverse.
 * Allocation-free (hot loop).
 * @param c - Walther constants
 * @param t - absolute temperature, K (> 0)
 * @throws EngineInputError when t is not a positive finite number.
 */
export function waltherLogSlope(c: WaltherConstants, t: Kelvin): PerKelvin {
  if (!(t > 0) || t === Infinity) requireAbsoluteTemperature('temperature', t);
  const log10z = Math.pow(10, c.a - c.b * Math.log10(t));
  const z = Math.pow(10, log10z);
  const dzdt = (-c.b * z * log10z * LN10) / t;
  return ((dNuDz(z) * dzdt) / nuOf(z)) as PerKelvin;
}

import { requirePositive } from '../diagnostics';
import { requireNonNegative } from '../film/inputChecks';
import type {
  JoulesPerKilogramKelvin,
  KelvinDifference,
  KilogramsPerCubicMetre,
  Metres,
  MetresPerSecond,
  NewtonsPerMetre,
  ThermalContactCoefficient,
  WattsPerMetreKelvin,
} from '../units';

/**
 * Blok's constant for a semi-elliptical (Hertzian) heat source when the Hertz SEMI-width bH
 * is used. With the full width 2bH the same relation is written with 0.80·√2 ≈ 1.13
 * (1.11 is quoted for the semi-ellipse); the two differ by about 2 %.
 */
export const BLOK_CONSTANT_SEMI_WIDTH = 0.8;

/**
 * Thermal contact coefficient (thermal effusivity) B_M = √(k ρ c).
 *
 * Units: √(W/(m·K) · kg/m³ · J/(kg·K)) = W·s^0.5/(m²·K) = N/(m·s^0.5·K); divide by 1000
 * for the N/(mm·s^0.5·K) of the gear standards. Steel, k = 45 W/(m·K), ρ = 7850 kg/m³,
 * c = 470 J/(kg·K): B_M ≈ 12.9e3 W·s^0.5/(m²·K) = 12.9 N/(mm·s^0.5·K).
 *
 * @param k - thermal conductivity, W/(m·K) (> 0)
 * @param rho - density, kg/m³ (> 0)
 * @param c - specific heat capacity, J/(kg·K) (> 0)
 * @returns B_M in W·s^0.5/(m²·K)
 */
export function thermalContactCoefficient(k: WattsPerMetreKelvin, rho: KilogramsPerCubicMetre, c: JoulesPerKilogramKelvin): ThermalContactCoefficient {
  requirePositive('k', k, 'W/(m·K)');
  requirePositive('rho', rho, 'kg/m³');
  requirePositive('c', c, 'J/(kg·K)');
  return Math.sqrt(k * rho * c) as ThermalContactCoefficient;
}

/**
 * Blok flash temperature of a line contact (a semi-elliptical frictional heat source moving
 * over two semi-infinite bodies at high Péclet number).
 *
 * Equal materials (B_M1 = B_M2 = B_M), the form of AGMA 925 [memory]:
 *   θfl = 0.80 · μ · w · |√v1 − √v2| / (B_M · √bH)
 *
 * Different materials: the heat is shared so that both surfaces reach the same maximum
 * temperature (Blok's partition). This gives
 *   θfl = 0.80 · μ · w · |v1 − v2| / (√bH · (B_M1 √v1 + B_M2 √v2))
 * which is the form evaluated here; for B_M1 = B_M2 it reduces exactly to the one above,
 * since |v1 − v2| / (√v1 + √v2) = |√v1 − √v2|.
 *
 * Consistent SI units need no further constant: N/m · (m/s)^0.5 / (N/(m·s^0.5·K) · m^0.5) = K.
 * (In AGMA's mixed units, w N/mm, bH mm, v m/s, B_M N/(mm·s^0.5·K), a factor √1000 = 31.62 appears.)
 *
 * @param mu - coefficient of friction, dimensionless (≥ 0)
 * @param w - normal load per unit contact length at the point, N/m (≥ 0)
 * @param v1 - tangential velocity of the pinion flank relative to the contact, m/s (≥ 0)
 * @param v2 - tangential velocity of the wheel flank relative to the contact, m/s (≥ 0)
 * @param bM1 - thermal contact coefficient of the pinion, W·s^0.5/(m²·K) (> 0)
 * @param bM2 - thermal contact coefficient of the wheel, W·s^0.5/(m²·K) (> 0)
 * @param bH - Hertz contact SEMI-width at the point, m (> 0)
 * @returns flash temperature θfl, K (a rise over the bulk temperature); 0 when v1 = v2 (pure rolling)
 *
 * Validity: high Péclet number v·bH/(2κ) ≳ 5 on both flanks [memory]; for steel (κ ≈ 1.2e-5 m²/s)
 * and bH ≈ 0.2 mm that is v ≳ 0.6 m/s; below it the result overestimates and is not flagged.
 * Negative μ, w or velocities and non-positive B_M or bH throw EngineInputError.
 *
 * Source: H. Blok, "Theoretical study of temperature rise at surfaces of actual contact under
 * oiliness lubricating conditions", Proc. General Discussion on Lubrication, IMechE, 1937;
 * AGMA 925-A03 flash temperature [memory].
 */
export function blokFlashTemperature(
  mu: number,
  w: NewtonsPerMetre,
  v1: MetresPerSecond,
  v2: MetresPerSecond,
  bM1: ThermalContactCoefficient,
  bM2: ThermalContactCoefficient,
  bH: Metres,
): KelvinDifference {
  requireNonNegative('mu', mu);
  requireNonNegative('w', w, 'N/m');
  requireNonNegative('v1', v1, 'm/s');
  requireNonNegative('v2', v2, 'm/s');
  requirePositive('bM1', bM1, 'W·s^0.5/(m²·K)');
  requirePositive('bM2', bM2, 'W·s^0.5/(m²·K)');
  requirePositive('bH', bH, 'm');
  const s1 = Math.sqrt(v1);
  const s2 = Math.sqrt(v2);
  if (v1 === v2) return 0 as KelvinDifference;
  // v1 ≠ v2, both ≥ 0, so the denominator is > 0.
  return ((BLOK_CONSTANT_SEMI_WIDTH * mu * w * Math.abs(v1 - v2)) / (Math.sqrt(bH) * (bM1 * s1 + bM2 * s2))) as KelvinDifference;
}

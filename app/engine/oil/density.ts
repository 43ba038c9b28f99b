import { EngineInputError } from '../diagnostics';
import type { Kelvin, KilogramsPerCubicMetre } from '../units';
import { ZERO_CELSIUS_K } from '../units';

/** dρ/dθ of the linear density law, in kg/(m³·K) (ISO/TR 15144-1 form [memory]). */
export const DENSITY_TEMPERATURE_SLOPE = 0.7;

/**
 * Oil density at temperature θ: ρ(θ) = ρ15 − 0.7 (θ − 15), ρ in kg/m³, θ in °C
 * (ISO/TR 15144-1 form [memory]). Linear, so it holds over the engine's −40…200 °C only as the
 * engineering estimate it is meant to be. Allocation-free.
 * @param density15 - density at 15 °C, kg/m³ (> 0)
 * @param t - temperature, K
 * @param field - input path named in errors, e.g. `oils[0].density15_kgm3`
 * @returns density at t, kg/m³
 * @throws EngineInputError when density15 is not positive or the result is not positive
 *   (a density at 15 °C below 0.7 × (θ − 15) kg/m³: almost surely a unit slip, g/cm³ for kg/m³).
 */
export function oilDensity(density15: KilogramsPerCubicMetre, t: Kelvin, field = 'density15_kgm3'): KilogramsPerCubicMetre {
  const rho = density15 - DENSITY_TEMPERATURE_SLOPE * (t - ZERO_CELSIUS_K - 15);
  if (!(density15 > 0) || !(rho > 0) || rho === Infinity) {
    const theta = t - ZERO_CELSIUS_K;
    throw new EngineInputError(
      'oil.density-not-positive',
      field,
      '> 0 kg/m³',
      `${field} = ${String(density15)} kg/m³ gives a density of ${String(rho)} kg/m³ at ${theta.toFixed(1)} °C; it must be greater than 0.`,
    );
  }
  return rho as KilogramsPerCubicMetre;
}

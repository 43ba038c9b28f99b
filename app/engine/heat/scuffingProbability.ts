import { EngineInputError } from '../diagnostics';
import { requireFinite } from '../film/inputChecks';
import { kelvinToCelsius, type Kelvin } from '../units';
import { standardNormalCdf } from './standardNormalCdf';

/** Standard deviation of the scuffing temperature as a fraction of its mean [memory, AGMA 925 style]. */
export const SCUFFING_TEMPERATURE_SIGMA_FRACTION = 0.15;

/**
 * Probability of scuffing, treating the oil's scuffing temperature as normally distributed:
 *
 *   θS ~ N(θS, σ),  σ = f · θS (θS in °C),  P = Φ((θB,max − θS) / σ)
 *
 * σ is taken on the Celsius value of θS, as AGMA 925 states it; temperatures are given in K
 * and converted. P = 0.5 when θB,max = θS.
 *
 * @param thetaBmax - maximum contact temperature θB,max, K
 * @param thetaS - mean scuffing temperature θS, K (must be above 0 °C)
 * @param sigmaFraction - f, dimensionless, 0 < f ≤ 1, default 0.15
 * @returns P in [0, 1]
 *
 * θS ≤ 0 °C, f outside (0, 1] or non-finite inputs throw EngineInputError.
 * Source: AGMA 925-A03, probability of scuffing [memory]; Φ from standardNormalCdf.ts.
 */
export function scuffingProbability(thetaBmax: Kelvin, thetaS: Kelvin, sigmaFraction = SCUFFING_TEMPERATURE_SIGMA_FRACTION): number {
  requireFinite('thetaBmax', thetaBmax, 'K');
  requireFinite('thetaS', thetaS, 'K');
  if (!(sigmaFraction > 0 && sigmaFraction <= 1)) {
    throw new EngineInputError('input.out-of-range', 'sigmaFraction', '0 < f ≤ 1', `Scatter fraction f = ${String(sigmaFraction)} must be above 0 and at most 1.`);
  }
  const sC = kelvinToCelsius(thetaS);
  if (!(sC > 0)) {
    throw new EngineInputError('input.out-of-range', 'thetaS', '> 0 °C', `Scuffing temperature θS = ${sC.toFixed(1)} °C must be above 0 °C.`);
  }
  return standardNormalCdf((kelvinToCelsius(thetaBmax) - sC) / (sigmaFraction * sC));
}

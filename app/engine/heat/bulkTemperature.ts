import { requirePositive } from '../diagnostics';
import { requireNonNegative } from '../film/inputChecks';
import type { Kelvin, KelvinDifference } from '../units';
import { multipleMeshFactor } from './meshingPinions';

/** Lubrication factor X_S of ISO/TS 6336-20 [memory, weak]: dip 1.0, spray 1.2. */
export const LUBRICATION_FACTOR_XS = { dip: 1.0, spray: 1.2 } as const;

/**
 * Bulk (flank body) temperature of the flash temperature method.
 *
 *   θM = θoil + 0.47 · X_S · X_mp · θfl,max,   X_mp = (1 + n_p)/2
 *
 * @param thetaOil - oil temperature (sump for dip, injection for spray), K (absolute)
 * @param flashMax - maximum flash temperature along the path θfl,max, K (difference, ≥ 0)
 * @param xS - lubrication factor X_S (> 0), default 1.0 (dip); see {@link LUBRICATION_FACTOR_XS}
 * @param meshingPinions - n_p, number of gears meshing with the pinion (integer ≥ 1), default 1
 * @returns θM, K (absolute)
 *
 * Non-finite θoil, negative θfl,max, non-positive X_S or a bad n_p throw EngineInputError.
 * Source: ISO/TS 6336-20:2017, bulk temperature (as DIN 3990-4) [memory].
 */
export function bulkTemperature(thetaOil: Kelvin, flashMax: KelvinDifference, xS: number = LUBRICATION_FACTOR_XS.dip, meshingPinions = 1): Kelvin {
  requirePositive('thetaOil', thetaOil, 'K');
  requireNonNegative('flashMax', flashMax, 'K');
  requirePositive('xS', xS);
  return (thetaOil + 0.47 * xS * multipleMeshFactor(meshingPinions) * flashMax) as Kelvin;
}

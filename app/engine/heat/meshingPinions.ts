import { EngineInputError } from '../diagnostics';

/**
 * Multiple-mesh factor X_mp = (1 + n_p)/2 of ISO/TS 6336-20 and -21 [memory], where n_p is
 * the number of gears meshing with the pinion (1 for a single pair, X_mp = 1).
 * A non-integer or n_p < 1 throws EngineInputError.
 */
export function multipleMeshFactor(meshingPinions: number): number {
  if (!Number.isInteger(meshingPinions) || meshingPinions < 1) {
    throw new EngineInputError(
      'input.out-of-range',
      'meshingPinions',
      'integer ≥ 1',
      `Number of meshing gears n_p = ${String(meshingPinions)} must be a whole number, 1 or more.`,
    );
  }
  return (1 + meshingPinions) / 2;
}

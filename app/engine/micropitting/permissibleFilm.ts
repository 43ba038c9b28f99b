import { requirePositive } from '../diagnostics';

/** The factor between the test's λGF at failure and the permissible λGF, ISO/TS 6336-22 [memory]. */
export const MICROPITTING_TEST_FACTOR = 1.4;

/**
 * Permissible specific film thickness of ISO/TS 6336-22 (ISO/TR 15144-1):
 *
 *   λGFP = 1.4 · WW · λGFT
 *
 * λGFT is the λGF,min of the C-GF test gear at the oil's failure load stage (testGear.ts), computed
 * with the same chain as the duty's λGF,min, so that the method reproduces its own test.
 *
 * @param lambdaGFT - critical specific film thickness of the test, dimensionless (> 0)
 * @param wW - material factor WW (1 for case-carburized steel), dimensionless (> 0)
 * @returns λGFP, dimensionless
 *
 * Non-finite or non-positive inputs throw EngineInputError.
 * Source: ISO/TS 6336-22:2018 (formerly ISO/TR 15144-1:2014), permissible specific film thickness [memory].
 */
export function permissibleSpecificFilm(lambdaGFT: number, wW = 1): number {
  requirePositive('lambdaGFT', lambdaGFT);
  requirePositive('micropittingFactorWW', wW);
  return MICROPITTING_TEST_FACTOR * wW * lambdaGFT;
}

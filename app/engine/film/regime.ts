import { EngineInputError } from '../diagnostics';
import { requireNonNegative } from './inputChecks';

export type Regime = 'boundary' | 'mixed' | 'full-film';

export interface RegimeThresholds {
  /** λ below this is boundary lubrication. */
  readonly boundaryBelow: number;
  /** λ at or above this is full film (EHL). */
  readonly fullFilmFrom: number;
}

/** λ < 1 boundary, 1 ≤ λ < 3 mixed, λ ≥ 3 full film (common practice). */
export const DEFAULT_REGIME_THRESHOLDS: RegimeThresholds = { boundaryBelow: 1, fullFilmFrom: 3 };

/**
 * Lubrication regime from the specific film thickness λ (RMS-composite, specificFilm.ts).
 *
 * @param lambda - specific film thickness, dimensionless (≥ 0)
 * @param thresholds - regime limits, default {@link DEFAULT_REGIME_THRESHOLDS}
 * @returns 'boundary' if λ < boundaryBelow, 'full-film' if λ ≥ fullFilmFrom, else 'mixed'
 *
 * A negative or non-finite λ, or thresholds not satisfying 0 < boundaryBelow ≤ fullFilmFrom,
 * throw EngineInputError. Source: common practice (Tallian; Hamrock, Fundamentals of Fluid Film Lubrication).
 */
export function classifyRegime(lambda: number, thresholds: RegimeThresholds = DEFAULT_REGIME_THRESHOLDS): Regime {
  requireNonNegative('lambda', lambda);
  const { boundaryBelow, fullFilmFrom } = thresholds;
  if (!(boundaryBelow > 0) || !(fullFilmFrom >= boundaryBelow) || !Number.isFinite(fullFilmFrom)) {
    throw new EngineInputError(
      'input.out-of-range',
      'thresholds',
      '0 < boundaryBelow ≤ fullFilmFrom',
      `Regime thresholds boundaryBelow = ${boundaryBelow}, fullFilmFrom = ${fullFilmFrom} must satisfy 0 < boundaryBelow ≤ fullFilmFrom.`,
    );
  }
  if (lambda < boundaryBelow) return 'boundary';
  if (lambda >= fullFilmFrom) return 'full-film';
  return 'mixed';
}

import { EngineInputError, requirePositive } from '../diagnostics';
import type { Metres } from '../units';
import { requireNonNegative } from './inputChecks';

/** Rq/Ra of a Gaussian height distribution (√(π/2) ≈ 1.253), common practice. */
export const RQ_PER_RA_GAUSSIAN = 1.25;

function requireSomeRoughness(ra1: number, ra2: number): void {
  requireNonNegative('ra1', ra1, 'm');
  requireNonNegative('ra2', ra2, 'm');
  if (ra1 + ra2 <= 0) {
    throw new EngineInputError('input.not-positive', 'ra1+ra2', '> 0 m', 'Both flank roughnesses are 0: the specific film thickness is undefined.');
  }
}

/**
 * Specific film thickness (film parameter) against the composite RMS roughness:
 *
 *   λ = h_min / √(Rq1² + Rq2²),   Rq = k · Ra,   k = 1.25 (Gaussian surfaces, common practice)
 *
 * @param hMin - minimum film thickness, m (≥ 0)
 * @param ra1 - arithmetic mean roughness Ra of the pinion flank, m (≥ 0)
 * @param ra2 - arithmetic mean roughness Ra of the wheel flank, m (≥ 0; ra1 + ra2 > 0)
 * @param rqPerRa - Rq/Ra ratio, dimensionless (> 0), default 1.25
 * @returns λ, dimensionless
 *
 * Negative film or roughness, or both roughnesses 0, throw EngineInputError.
 * Source: common practice (Tallian's film parameter; e.g. Hamrock, Fundamentals of Fluid Film Lubrication).
 */
export function specificFilmThickness(hMin: Metres, ra1: Metres, ra2: Metres, rqPerRa = RQ_PER_RA_GAUSSIAN): number {
  requireNonNegative('hMin', hMin, 'm');
  requireSomeRoughness(ra1, ra2);
  requirePositive('rqPerRa', rqPerRa);
  return hMin / (rqPerRa * Math.sqrt(ra1 * ra1 + ra2 * ra2));
}

/**
 * Specific film thickness of the ISO gear methods (micropitting):
 *
 *   λ_GF = h / Ra,   Ra = (Ra1 + Ra2) / 2
 *
 * Note that λ_GF is not λ: for equal Ra it is 1.25·√2 ≈ 1.77 times the RMS-composite λ.
 *
 * @param h - local film thickness h_Y (isoLocalFilm), m (≥ 0)
 * @param ra1 - Ra of the pinion flank, m (≥ 0)
 * @param ra2 - Ra of the wheel flank, m (≥ 0; ra1 + ra2 > 0)
 * @returns λ_GF, dimensionless
 *
 * Negative inputs or both roughnesses 0 throw EngineInputError.
 * Source: ISO/TS 6336-22 (and ISO/TR 15144-1), specific lubricant film thickness [memory].
 */
export function specificFilmThicknessGF(h: Metres, ra1: Metres, ra2: Metres): number {
  requireNonNegative('h', h, 'm');
  requireSomeRoughness(ra1, ra2);
  return (2 * h) / (ra1 + ra2);
}

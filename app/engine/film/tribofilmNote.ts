import { requirePositive } from '../diagnostics';
import type { Metres } from '../units';
import { requireNonNegative } from './inputChecks';
import { classifyRegime, DEFAULT_REGIME_THRESHOLDS, type RegimeThresholds } from './regime';

export interface TribofilmRange {
  readonly min: Metres;
  readonly max: Metres;
}

/** Thickness of a ZDDP-type anti-wear tribofilm, about 50–150 nm (common practice). */
export const ANTI_WEAR_TRIBOFILM: TribofilmRange = { min: 50e-9 as Metres, max: 150e-9 as Metres };

function micrometres(m: number): string {
  const um = m * 1e6;
  return um >= 10 ? um.toFixed(1) : um >= 0.01 ? um.toFixed(2) : um.toFixed(3);
}

/**
 * One sentence for the engineer that sets the oil film beside the composite roughness
 * and an anti-wear tribofilm, e.g. "film 0.12 µm vs composite roughness 0.50 µm (λ 0.24):
 * asperities touch; an anti-wear tribofilm (≈0.05–0.15 µm, common practice) is what carries the contact."
 *
 * The regime uses λ = hMin / sigma with {@link classifyRegime}, so the wording agrees with
 * the regime shown elsewhere when the same thresholds are passed.
 *
 * @param hMin - minimum film thickness, m (≥ 0)
 * @param sigma - composite RMS roughness √(Rq1² + Rq2²), m (> 0)
 * @param thresholds - regime limits, default λ 1 and 3 (common practice)
 * @param tribofilm - tribofilm thickness range, m, default 50–150 nm (common practice)
 * @returns plain text, no trailing newline
 *
 * Negative film or non-positive roughness throw EngineInputError.
 */
export function tribofilmNote(
  hMin: Metres,
  sigma: Metres,
  thresholds: RegimeThresholds = DEFAULT_REGIME_THRESHOLDS,
  tribofilm: TribofilmRange = ANTI_WEAR_TRIBOFILM,
): string {
  requireNonNegative('hMin', hMin, 'm');
  requirePositive('sigma', sigma, 'm');
  const lambda = hMin / sigma;
  const regime = classifyRegime(lambda, thresholds);
  const head = `film ${micrometres(hMin)} µm vs composite roughness ${micrometres(sigma)} µm (λ ${lambda.toFixed(2)})`;
  const film = `an anti-wear tribofilm (≈${micrometres(tribofilm.min)}–${micrometres(tribofilm.max)} µm, common practice)`;
  if (regime === 'boundary') {
    const thin = hMin < tribofilm.max ? ' The oil film is no thicker than the tribofilm itself.' : '';
    return `${head}: asperities touch; ${film} is what carries the contact.${thin}`;
  }
  if (regime === 'mixed') {
    return `${head}: the highest asperities still touch; where they do, ${film} protects them.`;
  }
  return `${head}: the oil film separates the flanks; ${film} matters only at start-up, overload or with debris.`;
}

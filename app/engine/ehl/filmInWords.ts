import { ANTI_WEAR_TRIBOFILM, type TribofilmRange } from '../film/tribofilmNote';
import type { Metres } from '../units';

const um = (m: number): string => {
  const v = m * 1e6;
  return v >= 10 ? v.toFixed(1) : v >= 0.1 ? v.toFixed(2) : v.toFixed(3);
};

/**
 * One sentence on the numerical minimum film beside the composite roughness and the anti-wear
 * tribofilm range (50–150 nm, common practice): below both is what "boundary" means in practice.
 * @param hMin - numerical minimum film, m (≥ 0)
 * @param sigma - composite roughness √(Rq1² + Rq2²), m (> 0)
 * @param converged - whether the solve converged; if not, the sentence says the figure is provisional
 */
export function numericalFilmInWords(hMin: Metres, sigma: Metres, converged: boolean, tribofilm: TribofilmRange = ANTI_WEAR_TRIBOFILM): string {
  const head = `The numerical minimum film is ${um(hMin)} µm against a composite roughness of ${um(sigma)} µm and an anti-wear tribofilm of ${Math.round(tribofilm.min * 1e9)}–${Math.round(tribofilm.max * 1e9)} nm (common practice)`;
  const tail = converged ? '' : ' The solution did not converge, so this figure is provisional.';
  const belowRough = hMin < sigma;
  let verdict: string;
  if (hMin < tribofilm.min) verdict = belowRough ? ': it lies below the tribofilm range and below the roughness, so the contact runs in boundary lubrication and the tribofilm carries it.' : ': it lies below the tribofilm range though above the roughness, which is unusual; check the roughness entered.';
  else if (hMin <= tribofilm.max) verdict = belowRough ? ': it lies within the tribofilm range and below the roughness, so asperities meet through the tribofilm: boundary lubrication in practice.' : ': it lies within the tribofilm range, above the roughness.';
  else verdict = belowRough ? ': it lies above the tribofilm range but below the roughness, so the highest asperities touch: mixed lubrication.' : ': it lies above the tribofilm range and above the roughness, so the oil film separates the flanks.';
  return `${head}${verdict}${tail}`;
}

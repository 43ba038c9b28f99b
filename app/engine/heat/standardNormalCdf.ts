import { EngineInputError } from '../diagnostics';

/**
 * Standard normal cumulative distribution Φ(x) = ½ erfc(−x/√2).
 *
 * erfc is the Chebyshev fit of Numerical Recipes ("erfcc": fractional error below 1.2e-7
 * everywhere, also in the tails, unlike A&S 7.1.26 whose error is absolute):
 *   t = 1/(1 + z/2), z = |x|,  erfc(z) ≈ t · exp(−z² − 1.26551223 + t(1.00002368 + t(0.37409196 +
 *   t(0.09678418 + t(−0.18628806 + t(0.27886807 + t(−1.13520398 + t(1.48851587 +
 *   t(−0.82215223 + 0.17087277 t)))))))))
 *
 * @param x - standard score, dimensionless; ±Infinity give 1 or 0
 * @returns Φ(x) in [0, 1]
 *
 * NaN throws EngineInputError.
 * Source: W. H. Press et al., Numerical Recipes in C, 2nd ed., Cambridge, 1992, §6.2 (erfcc).
 */
export function standardNormalCdf(x: number): number {
  if (Number.isNaN(x)) {
    throw new EngineInputError('input.not-finite', 'x', 'a number', 'Standard score x is NaN.');
  }
  const z = Math.abs(x) / Math.SQRT2;
  const t = 1 / (1 + 0.5 * z);
  const erfc =
    t *
    Math.exp(
      -z * z -
        1.26551223 +
        t *
          (1.00002368 +
            t *
              (0.37409196 +
                t * (0.09678418 + t * (-0.18628806 + t * (0.27886807 + t * (-1.13520398 + t * (1.48851587 + t * (-0.82215223 + t * 0.17087277)))))))),
    );
  // Φ(x) = ½ erfc(−x/√2): for x ≥ 0 that is 1 − ½ erfc(|x|/√2).
  return x >= 0 ? 1 - 0.5 * erfc : 0.5 * erfc;
}

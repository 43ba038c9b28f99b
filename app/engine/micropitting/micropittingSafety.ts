import { EngineInputError, requirePositive, type WarningSink } from '../diagnostics';

/**
 * Micropitting safety factor of ISO/TS 6336-22 (ISO/TR 15144-1):
 *
 *   Sλ = λGF,min / λGFP
 *
 * Range: λGF,min must be above 0 for the method to say anything (a film that is not formed, vΣ ≤ 0,
 * gives λGF,min = 0): there Sλ = 0 is returned with the warning `micropitting.no-film`, never NaN.
 *
 * @param lambdaGFMin - the duty's least λGF in the area at risk (lambdaGFAtRisk.ts), dimensionless (≥ 0)
 * @param lambdaGFP - permissible λGF (permissibleFilm.ts), dimensionless (> 0)
 * @param field - review path for messages, e.g. `loadCases[0]`
 * @param warnings - optional sink
 * @returns Sλ, dimensionless
 *
 * Non-finite or negative λGF,min, or a non-positive λGFP, throw EngineInputError.
 * Source: ISO/TS 6336-22:2018, safety factor against micropitting [memory].
 */
export function micropittingSafety(lambdaGFMin: number, lambdaGFP: number, field = 'lambdaGFMin', warnings?: WarningSink): number {
  requirePositive('lambdaGFP', lambdaGFP);
  if (!Number.isFinite(lambdaGFMin) || lambdaGFMin < 0) {
    throw new EngineInputError('input.out-of-range', field, '≥ 0', `${field}: λGF,min = ${String(lambdaGFMin)} is not a film thickness ratio (must be finite and not below 0).`);
  }
  if (lambdaGFMin === 0) {
    warnings?.add({
      code: 'micropitting.no-film',
      severity: 'warning',
      field,
      message: 'λGF,min = 0 (no oil is drawn into the contact somewhere in the area at risk): outside the range of the micropitting method, Sλ is taken as 0.',
    });
  }
  return lambdaGFMin / lambdaGFP;
}

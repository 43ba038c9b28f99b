import { requirePositive, type WarningSink } from '../diagnostics';
import type { Metres, MetresPerSecond, NewtonsPerMetre, Pascals, PascalSeconds, PerPascal } from '../units';
import { requireFinite } from './inputChecks';
import { warnOutsideLineContactFit } from './lineContactRange';

/** The dimensionless groups of an EHL line contact (Hamrock convention). Reuse one object in a loop. */
export interface LineContactGroups {
  /** Speed parameter U = η0 ū/(E′R). */
  U: number;
  /** Load parameter W = w/(E′R). */
  W: number;
  /** Materials parameter G = αE′. */
  G: number;
}

/**
 * U, W and G of a line contact, the inputs of Dowson–Higginson and Pan–Hamrock alike.
 * Non-positive or non-finite η0, α, R, w or E′ (or a non-finite ū) throw EngineInputError.
 * ū ≤ 0 (no entrainment) adds `film.no-entrainment` and returns null: the film is 0.
 * Groups outside LINE_CONTACT_FIT_LIMITS add a warning naming `model`.
 */
export function lineContactGroups(
  model: string,
  eta0: PascalSeconds,
  alpha: PerPascal,
  uMean: MetresPerSecond,
  radius: Metres,
  loadPerLength: NewtonsPerMetre,
  eReduced: Pascals,
  warnings: WarningSink | undefined,
  out: LineContactGroups = { U: 0, W: 0, G: 0 },
): LineContactGroups | null {
  requirePositive('eta0', eta0, 'Pa·s');
  requirePositive('alpha', alpha, '1/Pa');
  requireFinite('uMean', uMean, 'm/s');
  requirePositive('radius', radius, 'm');
  requirePositive('loadPerLength', loadPerLength, 'N/m');
  requirePositive('eReduced', eReduced, 'Pa');
  if (uMean <= 0) {
    warnings?.add({
      code: 'film.no-entrainment',
      severity: 'warning',
      field: 'uMean',
      message: `Mean entrainment velocity ū = ${uMean} m/s is not above 0: no oil is drawn into the contact and no EHL film is formed (film taken as 0).`,
    });
    return null;
  }
  const eR = eReduced * radius;
  out.U = (eta0 * uMean) / eR;
  out.G = alpha * eReduced;
  out.W = loadPerLength / eR;
  warnOutsideLineContactFit(model, out.U, out.W, out.G, warnings);
  return out;
}

import type { LineContactEhlInput } from '../../app/engine/ehl/lineContactEhl';
import type { Metres, MetresPerSecond, NewtonsPerMetre, Pascals, PascalSeconds, PerPascal } from '../../app/engine/units';

/**
 * A line contact with Hamrock's groups U and W set through its inputs: E′ = 2.26e11 Pa (steel,
 * E′ = 2E*), R = 20 mm, α = 2.2e−8 1/Pa, so G = αE′ = 4972, η0 = 0.05 Pa·s; ū = U E′R/η0, w = W E′R.
 */
export function pointAt(U: number, W: number): LineContactEhlInput {
  const E = 2.26e11, R = 0.02, ETA0 = 0.05;
  return {
    eta0: ETA0 as PascalSeconds,
    alpha: 2.2e-8 as PerPascal,
    uMean: ((U * E * R) / ETA0) as MetresPerSecond,
    radius: R as Metres,
    loadPerLength: (W * E * R) as NewtonsPerMetre,
    eReduced: E as Pascals,
  };
}

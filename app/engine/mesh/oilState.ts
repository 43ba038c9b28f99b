import type { Kelvin, KilogramsPerCubicMetre, PascalSeconds, PerKelvin, PerPascal, SquareMetresPerSecond } from '../units';
import type { CaseInput } from './types';

/** The oil at one temperature: what the film models read. */
export interface OilState {
  readonly temperature: Kelvin;
  readonly kinematicViscosity: SquareMetresPerSecond;
  readonly dynamicViscosity: PascalSeconds;
  readonly density: KilogramsPerCubicMetre;
  readonly pressureViscosity: PerPascal;
  readonly temperatureViscosity: PerKelvin;
}

/** The case's oil at temperature `t` (`field` names the temperature in messages). */
export function oilState(input: CaseInput, t: Kelvin, field: string): OilState {
  const m = (input.oil as NonNullable<CaseInput['oil']>).model;
  return {
    temperature: t,
    kinematicViscosity: m.kinematicViscosity(t, field),
    dynamicViscosity: m.dynamicViscosity(t, field),
    density: m.density(t, field),
    pressureViscosity: m.pressureViscosity(t, field),
    temperatureViscosity: m.temperatureViscosity(t, field),
  };
}

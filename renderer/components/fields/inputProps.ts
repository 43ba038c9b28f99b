import { INPUT_LABELS, type InputKind } from '../../../app/review/inputLabels';
import type { UnitSystem } from '../../units/units';

export interface InputProps {
  readonly label: string;
  readonly kind?: InputKind;
  readonly unit?: string;
}

/**
 * Label and unit of an input from the shared table (app/review/inputLabels.ts), so the screen and
 * the audit of changes name a field with the same words. `pattern` is the review path with list
 * indexes written `[]`, e.g. `loadCases[].oilTemperature_C`.
 */
export function inputProps(pattern: string, units: UnitSystem = 'si'): InputProps {
  const l = INPUT_LABELS[pattern];
  if (!l) throw new Error(`no label for ${pattern} in app/review/inputLabels.ts`);
  return {
    label: units === 'us' && l.usLabel ? l.usLabel : l.label,
    ...(l.kind ? { kind: l.kind } : {}),
    ...(l.unit ? { unit: l.unit } : {}),
  };
}

import { toDisplay, unitLabel, type QuantityKind, type UnitSystem } from './units';
import { formatResult } from './format';
import type { VerdictReason } from '../../app/review/results';

/**
 * A generated sentence (a reason, a caution, a finding) in the display units. The engine writes
 * its sentences in SI; in US customary each "number unit" pair is converted where it stands, to
 * four significant figures. Only the units the engine writes are touched: °C, K (a rise), MPa,
 * mm, µm and m/s; anything else is left as it is. Display only: the record and CSV keep their
 * own unit handling.
 */
const PATTERN = /(−|-)?(\d+(?:\.\d+)?)\s?(°C|MPa|mm²\/s|mm|µm|m\/s|K)(?![A-Za-z²])/g;
const KIND: Readonly<Record<string, QuantityKind | null>> = { '°C': 'temperature', K: 'temperatureDifference', MPa: 'stress', mm: 'length', µm: 'film', 'm/s': 'velocity', 'mm²/s': null };

export function inDisplayUnits(text: string, units: UnitSystem): string {
  if (units === 'si') return text;
  return text.replace(PATTERN, (whole: string, sign: string | undefined, num: string, unit: string) => {
    const kind = KIND[unit];
    if (!kind) return whole;
    const v = (sign ? -1 : 1) * Number(num);
    return `${formatResult(toDisplay(kind, v, units), 4).replace('-', '−')} ${unitLabel(kind, units)}`;
  });
}

/**
 * A verdict's reason in the display units: its sentence, its threshold and its source. A source
 * can carry figures too (the micropitting method's C-GF test at 90 °C and 8.3 m/s), and a reason
 * read in °F with its test in °C would mix the systems on one line. A formula's unit in a source
 * (θS = … S² °C) follows no number and is left as written.
 */
export function reasonInDisplayUnits(reason: VerdictReason, units: UnitSystem): VerdictReason {
  if (units === 'si') return reason;
  return { ...reason, text: inDisplayUnits(reason.text, units), threshold: inDisplayUnits(reason.threshold, units), source: inDisplayUnits(reason.source, units) };
}

import type { OperatingMapResult } from '../../../app/review/operatingMaps';
import { VERDICT_WORDS } from '../../../app/review/vocabulary';
import { formatResult } from '../../units/format';
import { toDisplay, unitLabel, type UnitSystem } from '../../units/units';
import { VerdictIcon } from '../VerdictBadge';
import { cellValues, type Cell } from './mapView';

interface Props {
  readonly id: string;
  readonly maps: readonly OperatingMapResult[];
  readonly labels: readonly string[];
  readonly cursor: Cell | null;
  readonly units: UnitSystem;
}

/** A value with its raw number on the element (for readers of the DOM and tests), as Quantity does. */
const Value = ({ value, sig, name }: { value: number | null; sig: number; name: string }) => (
  <span className="map-readout__value" data-name={name} data-value={value === null ? 'unbounded' : String(value)}>
    {value === null ? 'unbounded (no temperature rise)' : formatResult(value, sig)}
  </span>
);

/** What the cell under the cursor holds, for every oil of the case; a polite live region. */
export function MapReadout({ id, maps, labels, cursor, units }: Props) {
  const first = maps[0];
  const at = first && cursor ? cellValues(first, cursor) : null;
  return (
    <div id={id} className="map-readout" aria-live="polite" data-testid="map-readout" data-row={cursor?.r} data-col={cursor?.c}>
      {!at || !cursor ? (
        <p className="note">Point at a cell, or focus a map and use the arrow keys, to read its values.</p>
      ) : (
        <>
          <p className="map-readout__where">
            At <strong data-name="temperature" data-value={String(at.temperature_C)}>{formatResult(toDisplay('temperature', at.temperature_C, units), 3)} {unitLabel('temperature', units)}</strong> and{' '}
            <strong data-name="load" data-value={String(at.loadPercent)}>{formatResult(at.loadPercent, 3)} %</strong> load:
          </p>
          <ul className="map-readout__oils">
            {maps.map((m, i) => {
              const v = cellValues(m, cursor);
              return (
                <li key={i} data-oil={m.oil} data-verdict={v.verdict}>
                  <span className="map-readout__oil">{labels[i]}</span> λmin <Value value={v.lambdaMin} sig={3} name="lambdaMin" /> · SB <Value value={v.scuffingSafety} sig={3} name="scuffingSafety" /> · SintS{' '}
                  <Value value={v.integralSafety} sig={3} name="integralSafety" /> · <VerdictIcon code={v.verdict} size={14} /> <span data-name="verdict">{VERDICT_WORDS[v.verdict]}</span>
                </li>
              );
            })}
          </ul>
        </>
      )}
    </div>
  );
}

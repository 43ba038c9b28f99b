import { useId } from 'react';
import { DEFINITIONS, tooltipOf, type DefinitionKey } from '../results/definitions';
import { formatResult } from '../units/format';
import { toDisplay, unitLabel, type UnitSystem } from '../units/units';

interface Props {
  readonly def: DefinitionKey;
  readonly value: number | string | null | undefined;
  readonly units: UnitSystem;
  readonly sig?: number;
  /** Show the symbol before the value. */
  readonly withSymbol?: boolean;
  readonly testId?: string;
}

/** One result: value and unit, with its definition and source as tooltip and accessible description. */
export function Quantity({ def, value, units, sig = 3, withSymbol, testId }: Props) {
  const d = DEFINITIONS[def];
  const tipId = useId();
  const shown = typeof value === 'number' ? formatResult(toDisplay(d.kind, value, units), sig) : (value ?? '—');
  const unit = typeof value === 'number' ? unitLabel(d.kind, units) : '';
  const tip = tooltipOf(d);
  return (
    <span className="qty" title={tip} aria-describedby={tipId} data-testid={testId} data-value={typeof value === 'number' ? String(value) : undefined}>
      {withSymbol ? <span className="qty__sym">{d.symbol} = </span> : null}
      <span className="qty__val">{shown}</span>
      {unit ? <span className="qty__unit"> {unit}</span> : null}
      <span id={tipId} hidden>
        {tip}
      </span>
    </span>
  );
}

/** A labelled row of a result list (term, value). */
export function QuantityRow({ def, value, units, sig, testId }: Omit<Props, 'withSymbol'>) {
  const d = DEFINITIONS[def];
  return (
    <div className="qrow">
      <dt>
        {d.label} <span className="qrow__sym">{d.symbol}</span>
      </dt>
      <dd>
        <Quantity def={def} value={value} units={units} sig={sig} testId={testId} />
      </dd>
    </div>
  );
}

import { useMemo } from 'react';
import type { InputChange } from '../../../app/review/audit/diff';
import { changeLine, type NumberWords } from '../../../app/review/audit/words';
import { formatInput } from '../../units/format';
import { toDisplay, unitLabel, type UnitSystem } from '../../units/units';
import { canShow, showField } from './showField';

/** Numbers of inputs as their fields show them, in the chosen unit system. */
export function screenNumbers(units: UnitSystem): NumberWords {
  return (value, field) => {
    if (field?.kind) return `${formatInput(toDisplay(field.kind, value, units))} ${unitLabel(field.kind, units)}`;
    if (field?.unit) return field.unit === '°' ? `${formatInput(value)}°` : `${formatInput(value)} ${field.unit}`;
    return formatInput(value);
  };
}

interface Props {
  readonly changes: readonly InputChange[];
  readonly units: UnitSystem;
  /** Without it the list only shows (a comparison with another revision). */
  readonly onUndo?: (change: InputChange) => void;
  readonly testId: string;
}

/** The changes, one a line with its panel, label, before → after, "show" and (where given) "undo this change". */
export function ChangeList({ changes, units, onUndo, testId }: Props) {
  const num = useMemo(() => screenNumbers(units), [units]);
  return (
    <ul className="change-list" data-testid={testId}>
      {changes.map((c) => (
        <li key={`${c.kind}:${c.path}`} className="change-list__item" data-change-path={c.path} data-change-kind={c.kind}>
          <span className="change-list__panel">{c.panel}</span> <span className="change-list__text">{changeLine(c, num)}</span>{' '}
          {canShow(c) ? (
            <button type="button" className="link-button" aria-label={`Show ${c.label}`} onClick={() => showField(c)}>
              show
            </button>
          ) : null}
          {onUndo ? (
            <>
              {' '}
              <button type="button" className="link-button" aria-label={`Undo this change: ${c.label}`} onClick={() => onUndo(c)}>
                undo this change
              </button>
            </>
          ) : null}
        </li>
      ))}
    </ul>
  );
}

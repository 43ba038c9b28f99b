import { memo } from 'react';
import { useDraftValue, useFieldMessages, useSheet } from '../../state/context';
import { pathKey, type FieldPath } from '../../state/paths';
import { FieldShell, fieldId } from './FieldShell';
import { sameFieldProps } from './sameProps';

interface Props<V extends string | number> {
  readonly path: FieldPath;
  readonly label: string;
  readonly options: readonly (readonly [V, string])[];
  readonly hint?: string;
  /** Instead of setting `path`. */
  readonly onValue?: (value: V) => void;
  /** The value shown when the draft's value is not one of the options. */
  readonly value?: V;
}

/** A choice from a fixed list; option values keep their type (numbers stay numbers). */
function SelectFieldView<V extends string | number>({ path, label, options, hint, onValue, value }: Props<V>) {
  const { dispatch } = useSheet();
  const key = pathKey(path);
  const id = fieldId(key);
  const inDraft = useDraftValue(path);
  const stored = value ?? inDraft;
  const index = options.findIndex(([v]) => v === stored);
  const messages = useFieldMessages(path);
  // A long option gets room in the grid, so the chosen one is never cut off (about 0.5 rem per character).
  const longest = Math.max(label.length, ...options.map(([, t]) => t.length));
  const span = longest > 34 ? 'field-wide' : longest > 17 ? 'field-span2' : undefined;
  return (
    <div className={span}>
    <FieldShell id={id} label={label} messages={messages} hint={hint}>
      <select
        id={id}
        className="field__input"
        value={index < 0 ? '' : String(index)}
        data-path={key}
        aria-invalid={messages.length > 0}
        aria-describedby={messages.length ? `${id}-msg` : undefined}
        onChange={(e) => {
          const picked = options[Number(e.target.value)];
          if (!picked) return;
          if (onValue) onValue(picked[0]);
          else dispatch({ type: 'set', path, value: picked[0] });
        }}
      >
        {index < 0 ? <option value="">—</option> : null}
        {options.map(([v, text], i) => (
          <option key={String(v)} value={String(i)}>
            {text}
          </option>
        ))}
      </select>
    </FieldShell>
    </div>
  );
}

/** Re-renders when its props, its value or its messages change, not on every edit of the sheet. */
export const SelectField = memo(SelectFieldView, sameFieldProps) as typeof SelectFieldView;

import { memo } from 'react';
import { useDraftValue, useFieldMessages, useSheet } from '../../state/context';
import { pathKey, type FieldPath } from '../../state/paths';
import { FieldShell, fieldId } from './FieldShell';
import { sameFieldProps } from './sameProps';

interface Props {
  readonly path: FieldPath;
  readonly label: string;
  readonly optional?: boolean;
  readonly wide?: boolean;
  /** Several lines (notes). */
  readonly multiline?: boolean;
  readonly placeholder?: string;
  readonly note?: string;
}

/** A text input; an optional one left empty removes its key. Re-renders when its props, value or messages change. */
export const TextField = memo(function TextField({ path, label, optional, wide, multiline, placeholder, note }: Props) {
  const { dispatch } = useSheet();
  const key = pathKey(path);
  const id = fieldId(key);
  const stored = useDraftValue(path);
  const messages = useFieldMessages(path);
  const common = {
    id,
    value: typeof stored === 'string' ? stored : '',
    'data-path': key,
    'aria-invalid': messages.length > 0,
    'aria-describedby': messages.length ? `${id}-msg` : note ? `${id}-note` : undefined,
    placeholder: placeholder ?? (optional ? 'optional' : undefined),
    onChange: (e: { target: { value: string } }) => dispatch({ type: 'set', path, value: optional && e.target.value === '' ? undefined : e.target.value }),
  };
  return (
    <div className={wide ? 'field-wide' : undefined}>
      <FieldShell id={id} label={label} messages={messages} note={note}>
        {multiline ? <textarea className="field__input field__input--text" rows={3} {...common} /> : <input className="field__input field__input--text" type="text" {...common} />}
      </FieldShell>
    </div>
  );
}, sameFieldProps);

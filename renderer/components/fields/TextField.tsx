import { useSheet } from '../../state/context';
import { getIn, pathKey, type FieldPath } from '../../state/paths';
import { FieldShell, fieldId } from './FieldShell';

interface Props {
  readonly path: FieldPath;
  readonly label: string;
  readonly optional?: boolean;
  readonly wide?: boolean;
}

/** A text input; an optional one left empty removes its key. */
export function TextField({ path, label, optional, wide }: Props) {
  const { draft, dispatch, messagesAt } = useSheet();
  const key = pathKey(path);
  const id = fieldId(key);
  const stored = getIn(draft, path);
  const messages = messagesAt(key);
  return (
    <div className={wide ? 'field-wide' : undefined}>
      <FieldShell id={id} label={label} messages={messages}>
        <input
          id={id}
          className="field__input field__input--text"
          type="text"
          value={typeof stored === 'string' ? stored : ''}
          data-path={key}
          aria-invalid={messages.length > 0}
          aria-describedby={messages.length ? `${id}-msg` : undefined}
          placeholder={optional ? 'optional' : undefined}
          onChange={(e) => dispatch({ type: 'set', path, value: optional && e.target.value === '' ? undefined : e.target.value })}
        />
      </FieldShell>
    </div>
  );
}

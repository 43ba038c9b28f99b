import { memo } from 'react';
import { useFieldMessages } from '../../state/context';
import { pathKey, type FieldPath } from '../../state/paths';
import { fieldId } from './FieldShell';
import { sameFieldProps } from './sameProps';

interface Props {
  readonly path: FieldPath;
  readonly label: string;
  readonly checked: boolean;
  readonly onChange: (checked: boolean) => void;
}

/** A checkbox with its label after it; re-renders when its props or its messages change. */
export const CheckField = memo(function CheckField({ path, label, checked, onChange }: Props) {
  const key = pathKey(path);
  const id = fieldId(key);
  const messages = useFieldMessages(path);
  return (
    <div className="check">
      <input id={id} type="checkbox" checked={checked} data-path={key} onChange={(e) => onChange(e.target.checked)} />
      <label htmlFor={id}>{label}</label>
      {messages.length ? <span className="field__message" role="alert">{messages.join('; ')}</span> : null}
    </div>
  );
}, sameFieldProps);

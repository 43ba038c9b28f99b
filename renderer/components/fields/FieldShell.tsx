import type { ReactNode } from 'react';

interface Props {
  readonly id: string;
  readonly label: string;
  readonly unit?: string | undefined;
  readonly messages: readonly string[];
  readonly hint?: string | undefined;
  /** A short remark under the control, e.g. "from power". */
  readonly note?: string | undefined;
  readonly children: ReactNode;
}

/** Label, control, unit and the inline messages of one input; the messages describe the control. */
export function FieldShell({ id, label, unit, messages, hint, note, children }: Props) {
  return (
    <div className={`field${messages.length ? ' field--invalid' : ''}`}>
      <label htmlFor={id} className="field__label" title={hint}>
        {label}
      </label>
      <span className="field__control">
        {children}
        {unit ? <span className="field__unit" aria-hidden="true">{unit}</span> : null}
      </span>
      {note && !messages.length ? <span className="field__note" id={`${id}-note`}>{note}</span> : null}
      {messages.length > 0 ? (
        <span id={`${id}-msg`} className="field__message" role="alert">
          {messages.join('; ')}
        </span>
      ) : null}
    </div>
  );
}

/** A DOM id for a field path. */
export const fieldId = (pathKey: string): string => `f-${pathKey.replace(/[^A-Za-z0-9_-]/g, '-')}`;

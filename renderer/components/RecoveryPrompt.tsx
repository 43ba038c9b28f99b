import { useEffect, useRef } from 'react';
import { trapTab } from './focusTrap';
import { isoDateTime } from '../../app/review/decisionSubject';

interface Props {
  readonly savedAt: string;
  /** The file's name (main keeps its path). */
  readonly name: string | null;
  readonly onRecover: () => void;
  readonly onDiscard: () => void;
}

/** Offered at start when main kept unsaved edits (after a crash or a forced close). */
export function RecoveryPrompt({ savedAt, name, onRecover, onDiscard }: Props) {
  const ref = useRef<HTMLDialogElement>(null);
  const recover = useRef<HTMLButtonElement>(null);
  useEffect(() => {
    if (ref.current && !ref.current.open) ref.current.showModal();
    // showModal focuses the first control; the safe default is to keep the edits.
    recover.current?.focus();
  }, []);
  return (
    <dialog ref={ref} className="dialog" aria-labelledby="recover-title" onCancel={(e) => e.preventDefault()} onKeyDown={trapTab} data-testid="recovery">
      <h2 id="recover-title">Recover unsaved edits?</h2>
      <p>
        Edits that were not saved were kept on {isoDateTime(savedAt)}
        {name ? ` for ${name}` : ''}.
      </p>
      <div className="dialog__buttons">
        <button type="button" onClick={onDiscard}>Discard them and open the demo</button>
        <button type="button" className="primary" onClick={onRecover} ref={recover}>Recover the edits</button>
      </div>
    </dialog>
  );
}

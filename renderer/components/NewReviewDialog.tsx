import { useEffect, useRef, useState } from 'react';
import { TEMPLATES, TEMPLATE_WORDS, toFillIn, type TemplateKind } from '../../app/review/templates';
import { trapTab } from './focusTrap';

interface Props {
  /** The open review has edits that are not saved: say they will be lost. */
  readonly dirty: boolean;
  readonly onStart: (kind: TemplateKind) => void;
  readonly onClose: () => void;
}

/** New review: a choice of starting template, and a warning before unsaved edits are discarded. */
export function NewReviewDialog({ dirty, onStart, onClose }: Props) {
  const ref = useRef<HTMLDialogElement>(null);
  const [kind, setKind] = useState<TemplateKind>('spur');
  useEffect(() => {
    if (ref.current && !ref.current.open) ref.current.showModal();
  }, []);
  return (
    <dialog ref={ref} className="dialog" aria-labelledby="new-title" onClose={onClose} onKeyDown={trapTab} data-testid="new-review">
      <h2 id="new-title">New review</h2>
      <fieldset className="decision">
        <legend>Start from</legend>
        {TEMPLATES.map((t) => (
          <label key={t} className="radio">
            <input type="radio" name="template" value={t} checked={kind === t} onChange={() => setKind(t)} />
            <span>
              <strong>{TEMPLATE_WORDS[t].name}</strong> — {TEMPLATE_WORDS[t].detail}
            </span>
          </label>
        ))}
      </fieldset>
      <p>The template holds engineering defaults only. You fill in:</p>
      <ul>
        {toFillIn(kind).map((t) => (
          <li key={t}>{t}</li>
        ))}
      </ul>
      {dirty ? (
        <p className="notice notice--error" role="alert" data-testid="new-review-discard">
          The open review has unsaved edits. Starting a new review discards them.
        </p>
      ) : null}
      <div className="dialog__buttons">
        <button type="button" onClick={() => ref.current?.close()}>Cancel</button>
        <button type="button" className="primary" onClick={() => onStart(kind)}>
          {dirty ? 'Discard the edits and start' : 'Start the new review'}
        </button>
      </div>
    </dialog>
  );
}

import { memo, useEffect, useRef, useState, type FormEvent } from 'react';
import { messageInWords } from '../../../app/review/pathWords';
import { DECISIONS, type Signoff } from '../../../app/review/schema';
import { trapTab } from '../focusTrap';
import { DECISION_WORDS } from '../../../app/review/vocabulary';
import type { SignoffForm } from './words';

interface Props {
  readonly open: boolean;
  readonly previous: Signoff | undefined;
  /** What the decision approves, in words (decisionSubject). */
  readonly subject: string;
  readonly onClose: () => void;
  /** Resolves when signed; rejects with the reason shown in the dialog. */
  readonly onSign: (form: SignoffForm) => Promise<void>;
}

/**
 * The Sign-off dialog: a modal <dialog>, so the rest of the sheet is inert and Tab stays inside;
 * Escape cancels. Reviewer and role are required, as the contract's signReview wants.
 */
function SignoffDialogView({ open, previous, subject, onClose, onSign }: Props) {
  const ref = useRef<HTMLDialogElement>(null);
  const [form, setForm] = useState<SignoffForm>(() => initial(previous));
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);

  useEffect(() => {
    const d = ref.current;
    if (!d) return;
    if (open && !d.open) {
      setForm(initial(previous));
      setError(null);
      d.showModal();
      d.querySelector<HTMLInputElement>('#so-reviewer')?.focus();
    } else if (!open && d.open) d.close();
  }, [open, previous]);

  const set = <K extends keyof SignoffForm>(k: K, v: SignoffForm[K]) => setForm((f) => ({ ...f, [k]: v }));
  const submit = async (e: FormEvent) => {
    e.preventDefault();
    if (!form.reviewer.trim() || !form.role.trim()) {
      setError('Reviewer and role are required.');
      return;
    }
    setBusy(true);
    setError(null);
    try {
      await onSign(form);
    } catch (err) {
      setError(messageInWords((err as Error).message, null));
    } finally {
      setBusy(false);
    }
  };

  return (
    <dialog ref={ref} className="dialog" aria-labelledby="signoff-title" onClose={onClose} onKeyDown={trapTab} data-testid="signoff-dialog">
      <form onSubmit={(e) => void submit(e)} className="dialog__form">
        <h2 id="signoff-title">Sign off this review</h2>
        <p className="note">The sign-off records who decided what, with a fingerprint of the inputs and results. Any later edit shows as “Changed since signing”.</p>
        <label htmlFor="so-reviewer">Reviewer (required)</label>
        <input id="so-reviewer" required maxLength={200} value={form.reviewer} onChange={(e) => set('reviewer', e.target.value)} />
        <label htmlFor="so-role">Role (required)</label>
        <input id="so-role" required maxLength={200} value={form.role} onChange={(e) => set('role', e.target.value)} />
        <label htmlFor="so-org">Organisation</label>
        <input id="so-org" maxLength={200} value={form.organisation} onChange={(e) => set('organisation', e.target.value)} />
        <fieldset className="decision" aria-describedby="so-subject">
          <legend>Decision</legend>
          <p className="note" id="so-subject" data-testid="signoff-subject">
            The decision is on {subject}.
          </p>
          {DECISIONS.map((d) => (
            <label key={d} className="radio">
              <input type="radio" name="decision" value={d} checked={form.decision === d} onChange={() => set('decision', d)} /> {DECISION_WORDS[d]}
            </label>
          ))}
        </fieldset>
        <label htmlFor="so-conditions">Conditions{form.decision === 'approved-with-conditions' ? ' (state them)' : ''}</label>
        <textarea id="so-conditions" rows={3} maxLength={4000} value={form.conditions} onChange={(e) => set('conditions', e.target.value)} />
        {error ? (
          <p className="field__message" role="alert">
            {error}
          </p>
        ) : null}
        <div className="dialog__buttons">
          <button type="button" onClick={onClose} disabled={busy}>
            Cancel
          </button>
          <button type="submit" className="primary" disabled={busy}>
            {busy ? 'Signing…' : 'Sign'}
          </button>
        </div>
      </form>
    </dialog>
  );
}

function initial(previous: Signoff | undefined): SignoffForm {
  return {
    reviewer: previous?.reviewer ?? '',
    role: previous?.role ?? '',
    organisation: previous?.organisation ?? '',
    decision: previous?.decision ?? 'approved',
    conditions: previous?.conditions ?? '',
  };
}

/**
 * Closed, it stays as it is: the sheet's renders (every edit, every result) do not re-render its
 * form. Opening it (or any render while open) takes the props afresh.
 */
export const SignoffDialog = memo(SignoffDialogView, (a, b) => !a.open && !b.open);

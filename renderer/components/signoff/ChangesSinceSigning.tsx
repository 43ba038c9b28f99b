import { useMemo, useRef } from 'react';
import { diffInputs, type InputChange } from '../../../app/review/audit/diff';
import { resultsMoved, type ResultMove } from '../../../app/review/audit/resultsMoved';
import { checkSignedState, inputsOf, NO_AUDIT_WORDS, type SignedStateCheck } from '../../../app/review/audit/signedState';
import { undoEdit } from '../../../app/review/audit/undo';
import type { ChangeFindingCode, Results, ReviewStatus, VerdictCode } from '../../../app/review/results';
import type { Review } from '../../../app/review/schema';
import { CHANGE_WORDS, VERDICT_WORDS } from '../../../app/review/vocabulary';
import { useDraftValue, useSheet } from '../../state/context';
import type { UnitSystem } from '../../units/units';
import { ChangeList } from './ChangeList';

interface Props {
  readonly review: Review | null;
  readonly results: Results | null;
  readonly status: ReviewStatus;
  readonly units: UnitSystem;
}

/**
 * The signed state's check, once per sign-off: it recomputes the signed inputs (one run, a few
 * milliseconds), so it is kept until the draft's sign-off changes (open, sign), not redone per edit.
 */
function useSignedCheck(review: Review | null, signoffKey: unknown): SignedStateCheck | null {
  const valid = review !== null;
  const latest = useRef(review);
  latest.current = review;
  return useMemo(() => (valid && latest.current?.signoff ? checkSignedState(latest.current) : null), [signoffKey, valid]);
}

/** For a changed review: what changed since signing, each with "show" and "undo this change". */
export function ChangesSinceSigning({ review, results, status, units }: Props) {
  const { store, dispatch } = useSheet();
  const check = useSignedCheck(review, useDraftValue(['signoff']));
  const changes = useMemo<InputChange[] | null>(() => (check?.kind === 'kept' && review ? diffInputs(inputsOf(check.signed), inputsOf(review)) : null), [check, review]);
  const moved = useMemo(() => (check?.kind === 'kept' && check.results && results && changes?.length ? resultsMoved(check.results, results) : null), [check, results, changes]);

  if (!check || status === 'draft') return null;
  if (check.kind === 'not-kept' || check.kind === 'altered') {
    if (status === 'signed') return null;
    return (
      <p className={check.kind === 'altered' ? 'note note--error' : 'note'} role={check.kind === 'altered' ? 'alert' : undefined} data-testid="audit-unavailable" data-audit={check.kind}>
        {NO_AUDIT_WORDS[check.kind]}
      </p>
    );
  }
  if (check.kind !== 'kept') return null;
  if (!review) return <p className="note">Correct the marked inputs to see the changes since signing.</p>;
  if (!changes?.length) return null;
  const signedState = check.signed;
  const undo = (c: InputChange) => {
    const edit = undoEdit(store.getState().draft ?? {}, inputsOf(signedState), c);
    dispatch({ type: 'set', path: edit.path, value: edit.value });
  };
  const verdicts = moved?.moves.filter((m) => (m.quantity === 'verdict' || m.quantity === 'oilVerdict' || m.quantity === 'changeFinding') && m.before && m.after) ?? [];
  const word = (m: ResultMove, v: ResultMove['before']) => (m.quantity === 'changeFinding' ? CHANGE_WORDS[v as ChangeFindingCode] : VERDICT_WORDS[v as VerdictCode]);
  return (
    <section className="audit" aria-labelledby="changes-since-signing-h" data-testid="changes-since-signing">
      <h3 id="changes-since-signing-h">
        Changes since signing ({changes.length})
      </h3>
      {check.confirmed ? null : <p className="note">Signed with another Flankfilm version: the signed inputs are shown but cannot be checked against the fingerprint here.</p>}
      <ChangeList changes={changes} units={units} onUndo={undo} testId="change-list" />
      {moved ? (
        <p className="note" data-testid="verdict-moved" data-verdict-changed={moved.verdictChanged}>
          {moved.verdictChanged ? 'The verdict changed: ' : 'The verdict did not change.'}
          {verdicts.map((m) => `${m.loadCase ?? 'overall'}${m.oil ? ` — ${m.oil}` : ''}: ${word(m, m.before)} → ${word(m, m.after)}`).join('; ')}
        </p>
      ) : null}
    </section>
  );
}

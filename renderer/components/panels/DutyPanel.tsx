import { memo, useEffect, useRef } from 'react';
import { useDraftSelect, useSheet } from '../../state/context';
import { getIn } from '../../state/paths';
import type { Draft } from '../../state/reviewState';
import { newLoadCase } from '../../state/templates';
import { formatInput } from '../../units/format';
import { LoadCaseEditor } from './LoadCaseEditor';
import { Panel } from './Panel';

const casesOf = (draft: Draft | null) => (getIn(draft, ['loadCases']) as unknown[] | undefined) ?? [];

/** The shares of time as entered (the schema's default 1 where none is given); null while one is not a number. */
function sharesOf(cases: readonly unknown[]): number[] | null {
  const shares = cases.map((c) => (c && typeof c === 'object' ? (c as { timeShare?: unknown }).timeShare : undefined) ?? 1);
  return shares.every((v): v is number => typeof v === 'number' && Number.isFinite(v) && v > 0) ? shares : null;
}

/** "The shares add up to …, not 1", or undefined while they do (or one is not a number yet). */
function shareNoteOf(cases: readonly unknown[]): string | undefined {
  const shares = sharesOf(cases);
  const sum = shares ? shares.reduce((a, b) => a + b, 0) : null;
  // Shares are given to three decimals at most in practice: 0.5 % is the tolerance for "adds up to 1".
  return sum !== null && Math.abs(sum - 1) > 0.005 ? `The shares add up to ${formatInput(Number(sum.toPrecision(4)))}, not 1` : undefined;
}

/** The load cases of the duty, and whether their shares of time add up to 1. */
function DutyPanelView() {
  const { store, dispatch } = useSheet();
  // The count and the shares' note, not the cases: an edit inside a case re-renders only its inputs.
  const count = useDraftSelect((d) => casesOf(d).length);
  const shareNote = useDraftSelect((d) => shareNoteOf(casesOf(d)));
  const added = useRef<number | null>(null);
  useEffect(() => {
    if (added.current === null) return;
    document.querySelector<HTMLInputElement>(`[data-path="loadCases[${added.current}].name"]`)?.focus();
    added.current = null;
  }, [count]);

  const normalise = () => {
    const shares = sharesOf(casesOf(store.getState().draft));
    if (!shares) return;
    const sum = shares.reduce((a, b) => a + b, 0);
    shares.forEach((v, i) => dispatch({ type: 'set', path: ['loadCases', i, 'timeShare'], value: Number((v / sum).toFixed(4)) }));
  };
  return (
    <Panel
      id="duty"
      title="Duty"
      actions={
        <button
          type="button"
          disabled={count >= 20}
          title={count >= 20 ? 'A review holds at most 20 load cases' : undefined}
          onClick={() => {
            const cases = casesOf(store.getState().draft);
            added.current = cases.length;
            dispatch({ type: 'addItem', list: 'loadCases', item: newLoadCase(cases[cases.length - 1], cases) });
          }}
        >
          Add load case
        </button>
      }
    >
      {shareNote ? (
        <p className="problems" role="status" data-testid="share-sum">
          {shareNote}: each case&apos;s share is its fraction of the operating time.{' '}
          <button type="button" onClick={normalise}>Normalise the shares to add up to 1</button>
        </p>
      ) : null}
      {Array.from({ length: count }, (_, i) => (
        <LoadCaseEditor key={i} index={i} canRemove={count > 1} shareNote={shareNote} />
      ))}
    </Panel>
  );
}

/** Inputs only: re-renders with the units, the number of cases or the shares' note; not on other edits or when results arrive. */
export const DutyPanel = memo(DutyPanelView);

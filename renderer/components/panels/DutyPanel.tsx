import { memo, useEffect, useRef } from 'react';
import { useSheet } from '../../state/context';
import { getIn } from '../../state/paths';
import { newLoadCase } from '../../state/templates';
import { formatInput } from '../../units/format';
import { LoadCaseEditor } from './LoadCaseEditor';
import { Panel } from './Panel';

/** The shares of time as entered (the schema's default 1 where none is given); null while one is not a number. */
function sharesOf(cases: readonly unknown[]): number[] | null {
  const shares = cases.map((c) => (c && typeof c === 'object' ? (c as { timeShare?: unknown }).timeShare : undefined) ?? 1);
  return shares.every((v): v is number => typeof v === 'number' && Number.isFinite(v) && v > 0) ? shares : null;
}

/** The load cases of the duty, and whether their shares of time add up to 1. */
function DutyPanelView() {
  const { draft, dispatch } = useSheet();
  const cases = (getIn(draft, ['loadCases']) as unknown[] | undefined) ?? [];
  const shares = sharesOf(cases);
  const sum = shares ? shares.reduce((a, b) => a + b, 0) : null;
  // Shares are given to three decimals at most in practice: 0.5 % is the tolerance for "adds up to 1".
  const off = sum !== null && Math.abs(sum - 1) > 0.005;
  const shareNote = off && sum !== null ? `The shares add up to ${formatInput(Number(sum.toPrecision(4)))}, not 1` : undefined;
  const added = useRef<number | null>(null);
  useEffect(() => {
    if (added.current === null) return;
    document.querySelector<HTMLInputElement>(`[data-path="loadCases[${added.current}].name"]`)?.focus();
    added.current = null;
  }, [cases.length]);

  const normalise = () => {
    if (!shares || sum === null) return;
    shares.forEach((v, i) => dispatch({ type: 'set', path: ['loadCases', i, 'timeShare'], value: Number((v / sum).toFixed(4)) }));
  };
  return (
    <Panel
      id="duty"
      title="Duty"
      actions={
        <button
          type="button"
          disabled={cases.length >= 20}
          title={cases.length >= 20 ? 'A review holds at most 20 load cases' : undefined}
          onClick={() => {
            added.current = cases.length;
            dispatch({ type: 'addItem', list: 'loadCases', item: newLoadCase(cases[cases.length - 1], cases) });
          }}
        >
          Add load case
        </button>
      }
    >
      {off ? (
        <p className="problems" role="status" data-testid="share-sum">
          {shareNote}: each case&apos;s share is its fraction of the operating time.{' '}
          <button type="button" onClick={normalise}>Normalise the shares to add up to 1</button>
        </p>
      ) : null}
      {cases.map((_, i) => (
        <LoadCaseEditor key={i} index={i} canRemove={cases.length > 1} shareNote={shareNote} />
      ))}
    </Panel>
  );
}

/** Inputs only: re-renders when the draft, units or messages change (the sheet's context), not when results arrive. */
export const DutyPanel = memo(DutyPanelView);

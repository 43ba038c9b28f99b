import type { LimitCheck } from '../../../app/review/results';
import { formatResult } from '../../units/format';

/**
 * One figure against its policy limit, with the word pass or fail and a shape (never colour
 * alone). A figure below its minimum is never drawn in the colour of a pass.
 */
export function CheckChip({ check: k, suffix }: { readonly check: LimitCheck; readonly suffix?: string }) {
  const state = k.pass === null ? 'undefined' : k.pass ? 'pass' : 'fail';
  const word = state === 'undefined' ? 'not defined' : state;
  const value = k.value === null ? '—' : formatResult(k.value, 3);
  return (
    <span className={`check check--${state}`} data-testid="limit-check" data-quantity={k.quantity} data-state={state}>
      <span aria-hidden="true" className="check__icon">
        {state === 'pass' ? '✓' : state === 'fail' ? '✗' : '–'}
      </span>
      {k.symbol} {value} {state === 'fail' ? '<' : '≥'} {formatResult(k.limit, 3)} <strong className="check__word">{word}</strong>
      {suffix ? <span className="check__where"> ({suffix})</span> : null}
    </span>
  );
}

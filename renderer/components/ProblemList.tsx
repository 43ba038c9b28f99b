import type { ReviewIssue } from '../../app/review/parse';
import { isReviewPath, pathWords } from '../../app/review/pathWords';
import type { Draft } from '../state/reviewState';
import { friendlyMessage } from '../state/messages';
import type { UnitSystem } from '../units/units';
import type { RecomputeFailure } from '../worker/protocol';

interface Props {
  readonly issues: readonly ReviewIssue[];
  readonly engineError: RecomputeFailure | null;
  readonly stale: boolean;
  /** For the names of the load cases and oils the items point to. */
  readonly draft: Draft | null;
  readonly units: UnitSystem;
}

/** Moves the focus to the field of `path`, where its message stands. */
function focusField(path: string): void {
  document.querySelector<HTMLElement>(`[data-path="${CSS.escape(path)}"]`)?.focus();
}

/**
 * A summary of what keeps the review from computing; each item names its field in words (panel,
 * load case or oil, label), goes to it when clicked, and also shows at the field.
 */
export function ProblemList({ issues, engineError, stale, draft, units }: Props) {
  if (!issues.length && !engineError) return null;
  const count = issues.length + (engineError ? 1 : 0);
  const engineField = engineError?.field && isReviewPath(engineError.field) ? engineError.field : null;
  return (
    <div className="problems" role="status" data-testid="problems">
      <strong>{stale ? 'Not recomputed: ' : ''}
        {count} input{count === 1 ? '' : 's'} to correct</strong>
      <ul>
        {issues.map((i) => (
          <li key={`${i.path}|${i.message}`} data-path-of={i.path}>
            <button type="button" className="problem-link" onClick={() => focusField(i.path)}>{pathWords(i.path, draft, units)}</button>: {friendlyMessage(i.message, i.path)}
          </li>
        ))}
        {engineError ? (
          <li data-testid="engine-error" data-path-of={engineError.field ?? undefined}>
            {engineField ? <><button type="button" className="problem-link" onClick={() => focusField(engineField)}>{pathWords(engineField, draft, units)}</button>: </> : null}
            {friendlyMessage(engineError.message, engineError.field ?? undefined)}
          </li>
        ) : null}
      </ul>
    </div>
  );
}

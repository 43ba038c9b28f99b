import type { ReviewIssue } from '../../app/review/parse';
import { friendlyMessage } from '../state/messages';
import type { RecomputeFailure } from '../worker/protocol';

interface Props {
  readonly issues: readonly ReviewIssue[];
  readonly engineError: RecomputeFailure | null;
  readonly stale: boolean;
}

/** A summary of what keeps the review from computing; each item also shows at its field. */
export function ProblemList({ issues, engineError, stale }: Props) {
  if (!issues.length && !engineError) return null;
  return (
    <div className="problems" role="status" data-testid="problems">
      <strong>{stale ? 'Not recomputed: ' : ''}
        {issues.length + (engineError ? 1 : 0)} input{issues.length + (engineError ? 1 : 0) === 1 ? '' : 's'} to correct</strong>
      <ul>
        {issues.map((i) => (
          <li key={`${i.path}|${i.message}`}>
            <code>{i.path}</code>: {friendlyMessage(i.message)}
          </li>
        ))}
        {engineError ? (
          <li data-testid="engine-error">
            {engineError.field ? <code>{engineError.field}</code> : null}
            {engineError.field ? ': ' : ''}
            {engineError.message}
          </li>
        ) : null}
      </ul>
    </div>
  );
}

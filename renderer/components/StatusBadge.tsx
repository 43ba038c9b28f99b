import type { ReviewStatus } from '../../app/review/results';
import { STATUS_WORDS } from '../../app/review/status';

/** Draft / Signed / Changed since signing, with a shape for each. */
export function StatusBadge({ status, testId }: { readonly status: ReviewStatus; readonly testId?: string }) {
  const glyph = status === 'signed' ? '✔' : status === 'draft' ? '✎' : '⚠';
  return (
    <span className={`status status--${status}`} data-testid={testId} data-status={status}>
      <span aria-hidden="true">{glyph}</span> {STATUS_WORDS[status]}
    </span>
  );
}

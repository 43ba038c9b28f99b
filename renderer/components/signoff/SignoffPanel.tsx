import type { ReactNode } from 'react';
import type { ReviewStatus } from '../../../app/review/results';
import type { Review, Signoff } from '../../../app/review/schema';
import { decisionLine, isoDateTime } from '../../../app/review/decisionSubject';
import { Panel } from '../panels/Panel';
import { StatusBadge } from '../StatusBadge';

interface Props {
  readonly status: ReviewStatus;
  readonly signoff: Signoff | undefined;
  /** The oils, to name what the decision approves. */
  readonly review: Pick<Review, 'oils'> | null;
  readonly canSign: boolean;
  readonly onOpen: () => void;
  /** The changes since signing and the comparison with another revision. */
  readonly children?: ReactNode;
}

/** Who signed, when and what they decided; the button to sign (again); and what changed since. */
export function SignoffPanel({ status, signoff, review, canSign, onOpen, children }: Props) {
  return (
    <Panel
      id="sign-off"
      title="Sign-off"
      actions={
        <button type="button" className="primary" onClick={onOpen} disabled={!canSign} data-testid="open-signoff">
          {signoff ? 'Sign again…' : 'Sign off…'}
        </button>
      }
    >
      <p>
        Status: <StatusBadge status={status} testId="signoff-status" />
      </p>
      {signoff ? (
        <dl className="qlist" data-testid="signoff-details">
          <div className="qrow"><dt>Reviewer</dt><dd data-testid="signoff-reviewer">{signoff.reviewer}</dd></div>
          <div className="qrow"><dt>Role</dt><dd>{signoff.role}</dd></div>
          {signoff.organisation ? <div className="qrow"><dt>Organisation</dt><dd>{signoff.organisation}</dd></div> : null}
          <div className="qrow"><dt>Decision</dt><dd data-testid="signoff-decision">{decisionLine(signoff, review ?? { oils: [] })}</dd></div>
          {signoff.conditions ? <div className="qrow"><dt>Conditions</dt><dd>{signoff.conditions}</dd></div> : null}
          <div className="qrow"><dt>Signed</dt><dd>{isoDateTime(signoff.signedAt)}</dd></div>
          <div className="qrow"><dt>Engine</dt><dd>{signoff.engineVersion}</dd></div>
          <div className="qrow"><dt title="SHA-256 over the inputs, the results summary and the engine version">Fingerprint</dt><dd><code>{signoff.fingerprint.slice(0, 16)}…</code></dd></div>
        </dl>
      ) : (
        <p className="note">Not signed. Sign when the inputs are final; the record then carries the sign-off.</p>
      )}
      {!canSign ? <p className="note">Correct the marked inputs before signing.</p> : null}
      {children}
    </Panel>
  );
}

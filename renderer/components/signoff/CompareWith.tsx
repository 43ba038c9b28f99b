import { useCallback, useEffect, useMemo, useRef, useState } from 'react';
import { diffInputs } from '../../../app/review/audit/diff';
import { inputsOf } from '../../../app/review/audit/signedState';
import { formatIssues, parseReviewText } from '../../../app/review/parse';
import { messageInWords } from '../../../app/review/pathWords';
import type { Review } from '../../../app/review/schema';
import type { UnitSystem } from '../../units/units';
import { ChangeList } from './ChangeList';

interface Props {
  readonly review: Review | null;
  readonly units: UnitSystem;
  /** Let the user pick another review file; its text, or null if cancelled. */
  readonly pickOther: () => Promise<string | null>;
  /** Bumped by the menu's "Compare with…": pick a file as the button does. */
  readonly request: number;
}

type Other = { readonly review: Review } | { readonly error: string };

/** "Compare with…": open another revision and list what changed from it to the review on screen. */
export function CompareWith({ review, units, pickOther, request }: Props) {
  const [other, setOther] = useState<Other | null>(null);
  const [busy, setBusy] = useState(false);
  const changes = useMemo(() => (other && 'review' in other && review ? diffInputs(inputsOf(other.review), inputsOf(review)) : null), [other, review]);

  const pick = useCallback(async () => {
    setBusy(true);
    try {
      const text = await pickOther();
      if (text === null) return;
      const parsed = parseReviewText(text);
      setOther(parsed.ok ? { review: parsed.review } : { error: `That file is not a review this Flankfilm can compare:\n${messageInWords(formatIssues(parsed.issues), null, units)}` });
    } catch (e) {
      setOther({ error: messageInWords((e as Error).message, null, units) });
    } finally {
      setBusy(false);
    }
  }, [pickOther, units]);
  const seen = useRef(request);
  useEffect(() => {
    if (request === seen.current) return;
    seen.current = request;
    void pick();
    document.getElementById('sign-off')?.scrollIntoView({ block: 'start' });
  }, [request, pick]);

  return (
    <div className="compare" data-testid="compare">
      <p>
        <button type="button" onClick={() => void pick()} disabled={busy || !review} data-testid="compare-with">
          Compare with…
        </button>{' '}
        {other ? (
          <button type="button" className="link-button" onClick={() => setOther(null)}>
            Close the comparison
          </button>
        ) : null}
      </p>
      {other && 'error' in other ? (
        <p className="field__message" role="alert">
          {other.error}
        </p>
      ) : null}
      {other && 'review' in other ? (
        <section aria-labelledby="compare-h" data-testid="comparison">
          <h3 id="compare-h">
            Changes from “{other.review.title}”, revision {other.review.revision}
          </h3>
          {changes && changes.length ? <ChangeList changes={changes} units={units} testId="compare-list" /> : <p className="note">No differences in the inputs.</p>}
        </section>
      ) : null}
    </div>
  );
}

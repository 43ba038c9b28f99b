import { startTransition, useLayoutEffect, useRef, useState } from 'react';
import type { Results, ReviewStatus } from '../../app/review/results';
import type { Review } from '../../app/review/schema';
import type { RecomputeFailure } from '../worker/protocol';
import { RecomputeClient } from '../worker/recomputeClient';

export interface Computed {
  /** The last results that run() gave; kept while an entry is invalid or the engine refuses one. */
  readonly results: Results | null;
  readonly status: ReviewStatus | null;
  /** The edition the results belong to. */
  readonly edition: number;
  /** run() refused the newest valid edition (EngineInputError or a failure). */
  readonly error: RecomputeFailure | null;
  readonly computing: boolean;
  readonly millis: number | null;
}

interface Answered extends Omit<Computed, 'computing'> {
  /** The newest edition the worker answered, with results or with an error. */
  readonly answered: number;
}

const NONE: Answered = { results: null, status: null, edition: -1, error: null, answered: -1, millis: null };

/**
 * Recompute each valid edition in the worker, latest wins; the UI thread only posts and receives.
 * The request goes out as the edit is committed (a layout effect), so the worker computes while
 * the browser paints the edit, not after it.
 */
export function useRecompute(review: Review | null, edition: number, opened = 0): Computed {
  const [state, setState] = useState<Answered>(NONE);
  // The newest valid edition asked for, set while rendering (React's "state from the previous
  // render"): "computing" follows from it without a second pass over the sheet after each edit.
  const [asked, setAsked] = useState(-1);
  if (review && edition !== asked) setAsked(edition);
  const client = useRef<RecomputeClient | null>(null);
  // Answers for editions before the review was opened belong to the previous review: dropped.
  const floor = useRef(-1);
  const latest = useRef(edition);
  latest.current = edition;

  useLayoutEffect(() => {
    const c = new RecomputeClient((res) => {
      if (res.edition < floor.current) return;
      startTransition(() =>
        setState((s) =>
          res.ok
            ? { results: res.results, status: res.status, edition: res.edition, error: null, answered: Math.max(s.answered, res.edition), millis: res.millis }
            : { ...s, error: res.error, answered: Math.max(s.answered, res.edition) },
        ),
      );
    });
    client.current = c;
    return () => {
      c.dispose();
      if (client.current === c) client.current = null;
    };
  }, []);

  // Another review opened: the last one's results are not "the last valid entry" of this one, and
  // what was asked before it is no longer awaited (its answers are dropped).
  useLayoutEffect(() => {
    floor.current = latest.current;
    const done = floor.current - 1;
    setState((s) => (s.results || s.error ? { ...NONE, answered: Math.max(s.answered, done) } : s.answered >= done ? s : { ...s, answered: done }));
  }, [opened]);

  useLayoutEffect(() => {
    if (!review || !client.current) return;
    client.current.request({ edition, review });
  }, [review, edition]);

  const { answered, ...shown } = state;
  return { ...shown, computing: asked > answered };
}

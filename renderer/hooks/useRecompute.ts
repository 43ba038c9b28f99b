import { startTransition, useCallback, useLayoutEffect, useRef, useState } from 'react';
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

export interface Recompute extends Computed {
  /** Send an edition now (ahead of its render); each edition is sent once, older ones never. */
  readonly request: (review: Review, edition: number) => void;
}

interface Answered extends Omit<Computed, 'computing'> {
  /** The newest edition the worker answered, with results or with an error. */
  readonly answered: number;
}

const NONE: Answered = { results: null, status: null, edition: -1, error: null, answered: -1, millis: null };

/**
 * Recompute each valid edition in the worker, latest wins; the UI thread only posts and receives.
 * An edit's request goes out as it is dispatched (`request`, see useDocument's onValidEdit), any
 * other at the latest as its render commits (a layout effect): the worker computes while the
 * sheet renders and paints the edit, not after.
 */
export function useRecompute(review: Review | null, edition: number, opened = 0): Recompute {
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

  // The newest edition sent: one sent early (`request`, from the edit's dispatch) is not sent again.
  const sent = useRef(-1);
  const request = useCallback((r: Review, e: number) => {
    if (!client.current || e <= sent.current) return;
    sent.current = e;
    client.current.request({ edition: e, review: r });
  }, []);

  useLayoutEffect(() => {
    if (review) request(review, edition);
  }, [review, edition, request]);

  const { answered, ...shown } = state;
  return { ...shown, computing: asked > answered, request };
}

import { startTransition, useEffect, useRef, useState } from 'react';
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

/** Recompute each valid edition in the worker, latest wins; the UI thread only posts and receives. */
export function useRecompute(review: Review | null, edition: number, opened = 0): Computed {
  const [state, setState] = useState<Computed>({ results: null, status: null, edition: -1, error: null, computing: false, millis: null });
  const client = useRef<RecomputeClient | null>(null);
  const asked = useRef(-1);
  // Answers for editions before the review was opened belong to the previous review: dropped.
  const floor = useRef(-1);
  const latest = useRef(edition);
  latest.current = edition;

  useEffect(() => {
    const c = new RecomputeClient((res) => {
      if (res.edition < floor.current) return;
      const done = res.edition >= asked.current;
      startTransition(() =>
        setState((s) =>
          res.ok
            ? { results: res.results, status: res.status, edition: res.edition, error: null, computing: !done, millis: res.millis }
            : { ...s, error: res.error, computing: !done },
        ),
      );
    });
    client.current = c;
    return () => {
      c.dispose();
      if (client.current === c) client.current = null;
    };
  }, []);

  // Another review opened: the last one's results are not "the last valid entry" of this one.
  useEffect(() => {
    floor.current = latest.current;
    setState((s) => (s.results || s.error ? { results: null, status: null, edition: -1, error: null, computing: false, millis: null } : s));
  }, [opened]);

  useEffect(() => {
    if (!review || !client.current) return;
    asked.current = edition;
    setState((s) => ({ ...s, computing: true }));
    client.current.request({ edition, review });
  }, [review, edition]);

  return state;
}

import { useEffect, useRef, useState } from 'react';
import type { EhlPointResult } from '../../app/review/ehlAtPoint';
import type { EhlPointRequest } from '../../app/review/ehlPoint';
import type { Review } from '../../app/review/schema';
import { FilmClient } from '../worker/filmClient';

export type FilmState =
  | { readonly phase: 'idle' }
  | { readonly phase: 'running' }
  | { readonly phase: 'done'; readonly result: EhlPointResult }
  | { readonly phase: 'failed'; readonly message: string };

/** The numerical film at `point` of `review`, solved in a worker whenever the point or the review changes (latest wins). */
export function useFilmDetail(review: Review | null, point: EhlPointRequest | null): FilmState {
  const [state, setState] = useState<FilmState>({ phase: 'idle' });
  const client = useRef<FilmClient | null>(null);
  useEffect(() => {
    const c = new FilmClient((m) => setState(m.kind === 'done' ? { phase: 'done', result: m.result } : { phase: 'failed', message: m.message }));
    client.current = c;
    return () => {
      c.dispose();
      if (client.current === c) client.current = null;
    };
  }, []);
  useEffect(() => {
    if (!review || !point || !client.current) return;
    setState({ phase: 'running' });
    client.current.start({ review, point });
  }, [review, point]);
  return state;
}

import { useCallback, useEffect, useRef, useState } from 'react';
import type { OperatingMapResult } from '../../app/review/operatingMaps';
import type { Review } from '../../app/review/schema';
import { MapClient } from '../worker/mapClient';

/** Review edits wait this long for the next keystroke before the map is swept again. */
export const MAP_DEBOUNCE_MS = 600;

export type MapPhase = 'idle' | 'running' | 'done' | 'cancelled' | 'failed';

export interface MapSweep {
  readonly maps: readonly OperatingMapResult[];
  /** The review the maps were swept from (its policy levels, case temperatures and oil roles). */
  readonly review: Review;
  readonly edition: number;
  readonly millis: number;
}

export interface OperatingMapState {
  readonly phase: MapPhase;
  readonly done: number;
  readonly total: number;
  /** The last finished sweep, kept while the next one runs, after a cancel and while an entry is invalid. */
  readonly sweep: MapSweep | null;
  readonly error: string | null;
  /** The edition being swept (or last asked for). */
  readonly asked: number;
}

export interface OperatingMapControls extends OperatingMapState {
  /** Sweep now, and again after each later edit (debounced) until cancelled. */
  readonly compute: () => void;
  readonly cancel: () => void;
}

/**
 * The Map panel's sweep: on demand, in its own worker, latest wins. Once asked for, it follows
 * the review (debounced) so typing is never held up; Cancel stops it and the following.
 */
export function useOperatingMap(review: Review | null, edition: number): OperatingMapControls {
  const [state, setState] = useState<OperatingMapState>({ phase: 'idle', done: 0, total: 0, sweep: null, error: null, asked: -1 });
  const [following, setFollowing] = useState(false);
  const client = useRef<MapClient | null>(null);
  const asked = useRef<{ review: Review; edition: number } | null>(null);

  useEffect(() => {
    const c = new MapClient((m) => {
      const of = asked.current;
      if (m.kind === 'progress') setState((s) => ({ ...s, done: m.done, total: m.total }));
      else if (m.kind === 'failed') setState((s) => ({ ...s, phase: 'failed', error: m.message }));
      else if (of) setState((s) => ({ ...s, phase: 'done', done: m.maps.length, total: m.maps.length, error: null, sweep: { maps: m.maps, review: of.review, edition: of.edition, millis: m.millis } }));
    });
    client.current = c;
    return () => {
      c.dispose();
      if (client.current === c) client.current = null;
    };
  }, []);

  const start = useCallback((r: Review, e: number) => {
    if (!client.current) return;
    asked.current = { review: r, edition: e };
    setState((s) => ({ ...s, phase: 'running', done: 0, total: r.loadCases.length * r.oils.length, error: null, asked: e }));
    client.current.start(r);
  }, []);

  const compute = useCallback(() => {
    if (!review) return;
    setFollowing(true);
    start(review, edition);
  }, [review, edition, start]);

  const cancel = useCallback(() => {
    setFollowing(false);
    if (client.current?.cancel()) setState((s) => ({ ...s, phase: 'cancelled' }));
  }, []);

  // Follow the review's edits while the map is wanted; the debounce keeps the sweep out of the way of typing.
  useEffect(() => {
    if (!following || !review || asked.current?.edition === edition) return;
    const timer = setTimeout(() => start(review, edition), MAP_DEBOUNCE_MS);
    return () => clearTimeout(timer);
  }, [following, review, edition, start]);

  return { ...state, compute, cancel };
}

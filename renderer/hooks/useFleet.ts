import { useCallback, useEffect, useRef, useState } from 'react';
import type { Bridge } from '../../app/bridge/contract';
import { parseOilsText } from '../../app/fleet/oilsFile';
import type { FleetResult } from '../../app/fleet/types';
import { formatIssues, parseReviewText, type ReviewIssue } from '../../app/review/parse';
import type { Oil, Review } from '../../app/review/schema';
import type { JobClient } from '../worker/jobClient';
import { createFleetClient } from '../worker/fleetClient';
import type { FleetMessage, FleetRequest } from '../worker/fleetProtocol';

/** A review file the user picked: its name (never a path), its text, and the review or what is wrong. */
export interface FleetReviewFile {
  readonly name: string;
  readonly text: string;
  readonly review: Review | null;
  /** What is wrong with the file (empty when it reads). */
  readonly problems: readonly ReviewIssue[];
}

export interface FleetOilsFile {
  readonly name: string;
  readonly text: string;
  readonly oils: readonly Oil[] | null;
  readonly problems: readonly ReviewIssue[];
}

export interface FleetState {
  readonly reviews: readonly FleetReviewFile[];
  readonly oils: FleetOilsFile | null;
  readonly phase: 'idle' | 'running' | 'done' | 'failed';
  readonly done: number;
  readonly total: number;
  readonly result: FleetResult | null;
  readonly millis: number | null;
  readonly error: string | null;
}

const EMPTY: FleetState = { reviews: [], oils: null, phase: 'idle', done: 0, total: 0, result: null, millis: null, error: null };

/** Anything with a name and text(): a File from a picker or a drop. */
export interface NamedText {
  readonly name: string;
  text(): Promise<string>;
}

/** The Fleet view's state: the files picked, the run in its worker with progress, the export. */
export function useFleet(bridge: Bridge) {
  const [state, setState] = useState<FleetState>(EMPTY);
  const client = useRef<JobClient<FleetRequest, FleetMessage> | null>(null);

  useEffect(() => {
    const c = createFleetClient((m) => {
      if (m.kind === 'progress') setState((s) => ({ ...s, done: m.done, total: m.total }));
      else if (m.kind === 'done') setState((s) => ({ ...s, phase: 'done', result: m.result, millis: m.millis, error: null }));
      else setState((s) => ({ ...s, phase: 'failed', error: m.message }));
    });
    client.current = c;
    return () => c.dispose();
  }, []);

  const addReviews = useCallback(async (files: readonly NamedText[]) => {
    const read = await Promise.all(
      files.map(async (f): Promise<FleetReviewFile> => {
        const text = await f.text();
        const p = parseReviewText(text);
        return p.ok ? { name: f.name, text, review: p.review, problems: [] } : { name: f.name, text, review: null, problems: p.issues };
      }),
    );
    setState((s) => ({ ...s, reviews: [...s.reviews.filter((r) => !read.some((x) => x.name === r.name)), ...read], result: null, phase: 'idle' }));
  }, []);

  const setOils = useCallback(async (file: NamedText) => {
    const text = await file.text();
    const p = parseOilsText(text);
    setState((s) => ({ ...s, oils: p.ok ? { name: file.name, text, oils: p.oils, problems: [] } : { name: file.name, text, oils: null, problems: p.issues }, result: null, phase: 'idle' }));
  }, []);

  const clear = useCallback(() => {
    client.current?.cancel();
    setState(EMPTY);
  }, []);

  const compute = useCallback(() => {
    const oils = state.oils?.oils;
    if (!oils || state.reviews.length === 0) return;
    const gearboxes = state.reviews.flatMap((r) => (r.review ? [{ source: r.name, review: r.review }] : []));
    const failed = state.reviews.flatMap((r) => (r.review ? [] : [{ source: r.name, message: `${r.name}: not a valid review:\n${formatIssues(r.problems)}` }]));
    setState((s) => ({ ...s, phase: 'running', done: 0, total: gearboxes.length * oils.length, error: null }));
    client.current?.start((run) => ({ run, gearboxes, oils, failed }));
  }, [state.oils, state.reviews]);

  const cancel = useCallback(() => {
    if (client.current?.cancel()) setState((s) => ({ ...s, phase: 'idle' }));
  }, []);

  const exportRecord = useCallback(
    async (paper: 'a4' | 'letter'): Promise<string | null> => {
      if (!state.oils || state.reviews.length === 0) return null;
      const r = await bridge.exportFleetRecord({ reviews: state.reviews.map((x) => ({ name: x.name, text: x.text })), oils: state.oils.text, paper });
      return r.canceled ? null : `Fleet record saved as ${r.name} (${Math.round(r.bytes / 1024)} kB)`;
    },
    [bridge, state.oils, state.reviews],
  );

  return { state, addReviews, setOils, clear, compute, cancel, exportRecord };
}

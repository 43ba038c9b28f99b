import { useCallback, useEffect, useState } from 'react';
import type { Bridge } from '../../app/bridge/contract';
import { formatIssues, parseReviewText } from '../../app/review/parse';
import { messageInWords } from '../../app/review/pathWords';
import type { Review } from '../../app/review/schema';
import type { SignoffForm } from '../components/signoff/words';
import { draftText, type DocAction, type DocState, type Draft } from '../state/reviewState';
import type { UnitSystem } from '../units/units';

export type Busy = null | 'open' | 'save' | 'record' | 'csv' | 'sign';
export interface Notice {
  readonly kind: 'info' | 'error';
  readonly text: string;
}

interface Deps {
  readonly bridge: Bridge;
  readonly doc: DocState;
  readonly review: Review | null;
  readonly dispatch: React.Dispatch<DocAction>;
  readonly setUnits: (u: UnitSystem) => void;
  /** The units labels are given in. */
  readonly units: UnitSystem;
}

/** The parsed review as the draft (defaults written out), or the raw JSON if the schema refuses it. */
function draftOf(text: string): { draft: Draft | null; problem: string | null; units: UnitSystem } {
  const parsed = parseReviewText(text);
  if (parsed.ok) return { draft: JSON.parse(JSON.stringify(parsed.review)) as Draft, problem: null, units: parsed.review.displayUnits };
  try {
    const raw = JSON.parse(text) as unknown;
    if (raw && typeof raw === 'object' && !Array.isArray(raw)) return { draft: raw as Draft, problem: `The review has problems, marked at the fields:\n${messageInWords(formatIssues(parsed.issues), raw)}`, units: 'si' };
  } catch {
    // not JSON: nothing to edit
  }
  return { draft: null, problem: messageInWords(formatIssues(parsed.issues), null), units: 'si' };
}

/** Open, save, export and sign through the bridge, with what is going on and what came of it. */
export function useDocumentActions({ bridge, doc, review, dispatch, setUnits, units }: Deps) {
  const [busy, setBusy] = useState<Busy>(null);
  const [notice, setNotice] = useState<Notice | null>(null);
  const [progress, setProgress] = useState<{ done: number; total: number } | null>(null);
  useEffect(() => bridge.onProgress?.(setProgress), [bridge]);
  const cancelRecord = useCallback(() => void bridge.cancelExport({}).catch(() => undefined), [bridge]);

  const guard = useCallback(
    async (what: Exclude<Busy, null>, job: () => Promise<string | null>) => {
      setBusy(what);
      try {
        const text = await job();
        if (text) setNotice({ kind: 'info', text });
      } catch (e) {
        // A service names fields by their paths (they stay in --json); the screen names them in words.
        setNotice({ kind: 'error', text: messageInWords((e as Error).message, doc.draft, units) });
      } finally {
        setBusy(null);
        setProgress(null);
      }
    },
    [doc.draft, units],
  );

  const load = useCallback(
    (text: string, file: { handle: string | null; name: string | null } | null, dirty: boolean, note?: string): string | null => {
      const { draft, problem, units } = draftOf(text);
      if (!draft) throw new Error(`Could not open the review: ${problem ?? 'unreadable'}`);
      dispatch({ type: 'load', draft, handle: file?.handle ?? null, name: file?.name ?? null, dirty });
      setUnits(units);
      return problem ?? note ?? null;
    },
    [dispatch, setUnits],
  );

  const openDemo = useCallback(() => guard('open', async () => load((await bridge.openDemo({})).text, null, false, 'Opened the invented demo review.')), [bridge, guard, load]);

  const open = useCallback(
    (handle?: string) =>
      guard('open', async () => {
        const r = await bridge.openReview(handle ? { handle } : {});
        if (r.canceled) return null;
        return load(r.text, r, false, r.migratedFrom ? `Opened; converted from file version ${r.migratedFrom}.` : `Opened ${r.name ?? 'the review'}`);
      }),
    [bridge, guard, load],
  );

  const save = useCallback(
    (saveAs: boolean) =>
      guard('save', async () => {
        if (!doc.draft) return null;
        const r = await bridge.saveReview({ handle: doc.handle, text: draftText(doc.draft), saveAs });
        if (r.canceled) return null;
        dispatch({ type: 'saved', handle: r.handle, name: r.name });
        await bridge.discardAutosave({}).catch(() => undefined);
        return `Saved to ${r.name}`;
      }),
    [bridge, doc.draft, doc.handle, dispatch, guard],
  );

  const exportRecord = useCallback(
    (paper: 'a4' | 'letter') =>
      guard('record', async () => {
        if (!doc.draft || !review) throw new Error('Correct the marked inputs before exporting the record.');
        const r = await bridge.exportRecord({ text: draftText(doc.draft), paper, handle: doc.handle });
        return r.canceled ? 'No record made (canceled).' : `Record saved to ${r.name} (${Math.round(r.bytes / 1024)} kB)`;
      }),
    [bridge, doc.draft, doc.handle, review, guard],
  );

  const exportCsv = useCallback(
    (table: 'points' | 'summary' = 'points') =>
      guard('csv', async () => {
        if (!doc.draft || !review) throw new Error('Correct the marked inputs before exporting the CSV.');
        const r = await bridge.exportCsv({ text: draftText(doc.draft), handle: doc.handle, table });
        return r.canceled ? null : `${table === 'summary' ? 'Summary CSV' : 'CSV'} saved as ${r.name}`;
      }),
    [bridge, doc.draft, doc.handle, review, guard],
  );

  /** Rejects with the reason, for the dialog to show. */
  const sign = useCallback(
    async (form: SignoffForm) => {
      if (!doc.draft || !review) throw new Error('Correct the marked inputs before signing.');
      setBusy('sign');
      try {
        const r = await bridge.signReview({
          text: draftText(doc.draft),
          reviewer: form.reviewer.trim(),
          role: form.role.trim(),
          decision: form.decision,
          ...(form.organisation.trim() ? { organisation: form.organisation.trim() } : {}),
          ...(form.conditions.trim() ? { conditions: form.conditions.trim() } : {}),
        });
        const { draft } = draftOf(r.text);
        if (!draft) throw new Error('The signed review came back unreadable.');
        dispatch({ type: 'load', draft, handle: doc.handle, name: doc.name, dirty: true, sameReview: true });
        setNotice({ kind: 'info', text: `Signed by ${form.reviewer.trim()}. Save the review to keep the sign-off.` });
      } finally {
        setBusy(null);
      }
    },
    [bridge, doc.draft, doc.handle, doc.name, review, dispatch],
  );

  return { busy, notice, setNotice, load, openDemo, open, save, exportRecord, exportCsv, sign, guard, progress, cancelRecord };
}

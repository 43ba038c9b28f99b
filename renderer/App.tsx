import { useCallback, useEffect, useLayoutEffect, useMemo, useRef, useState } from 'react';
import type { Bridge, MenuCommand } from '../app/bridge/contract';
import type { ReviewStatus } from '../app/review/results';
import type { Review } from '../app/review/schema';
import { GearPairPanel } from './components/panels/GearPairPanel';
import { DutyPanel } from './components/panels/DutyPanel';
import { OilsPanel } from './components/panels/OilsPanel';
import { PolicyPanel } from './components/panels/PolicyPanel';
import { VerdictPanel } from './components/panels/VerdictPanel';
import { SideBySidePanel } from './components/panels/SideBySidePanel';
import { MapPanel } from './components/panels/MapPanel';
import { MeshPanel } from './components/mesh/MeshPanel';
import { SignoffPanel } from './components/signoff/SignoffPanel';
import { SignoffDialog } from './components/signoff/SignoffDialog';
import { ChangesSinceSigning } from './components/signoff/ChangesSinceSigning';
import { CompareWith } from './components/signoff/CompareWith';
import { TopBar } from './components/TopBar';
import { RecoveryPrompt } from './components/RecoveryPrompt';
import { InfoDialog } from './components/InfoDialog';
import { NewReviewDialog } from './components/NewReviewDialog';
import { RecordPanel } from './components/panels/RecordPanel';
import type { DocAction } from './state/reviewState';
import { TEMPLATE_WORDS, type TemplateKind } from '../app/review/templates';
import { ProblemList } from './components/ProblemList';
import { FleetView } from './components/fleet/FleetView';
import { useDocument } from './hooks/useDocument';
import { useRecompute } from './hooks/useRecompute';
import { usePersistence } from './hooks/usePersistence';
import { useFileDrop } from './hooks/useFileDrop';
import { useDocumentActions } from './hooks/useDocumentActions';
import { Sheet, type SheetContext } from './state/context';
import { newReviewDraft } from './state/templates';
import type { UnitSystem } from './units/units';
import { basisTag, METHODS, type MethodEntry } from '../app/review/methods';
import { decisionSubject } from '../app/review/decisionSubject';
import { isDemoReview } from '../app/review/demo';

/** One method as a line of the Help dialog: what, the formula, the source and how firmly it is held. */
const methodLine = (m: MethodEntry): string => `${m.topic} — ${m.quantity}: ${m.formula} (${m.source}${basisTag(m.basis) ? `; ${basisTag(m.basis)}` : ''})`;

/** Said once, here, rather than on every line that carries the tag. */
const BASIS_NOTE = '“[memory]” marks a form or value recalled and checked against our own arithmetic but not read from the text; “common practice” marks a rule of thumb with no single source.';

type Recovery = { text: string; handle: string | null; name: string | null; savedAt: string };

/** The sheet: inputs on the left, findings on the right; state in a reducer, physics in a worker. */
export function App({ bridge }: { readonly bridge: Bridge }) {
  // An edit's recompute starts as it is dispatched, before the sheet renders it.
  const early = useRef<(r: Review, e: number) => void>(() => undefined);
  const { doc, dispatch, review, issues, store } = useDocument(useCallback((r: Review, e: number) => early.current(r, e), []));
  const computed = useRecompute(review, doc.edition, doc.opened);
  early.current = computed.request;
  const [units, setUnits] = useState<UnitSystem>('si');
  const [signing, setSigning] = useState(false);
  const [compareRequest, setCompareRequest] = useState(0);
  const [starting, setStarting] = useState(false);
  // The record's paper follows the units (Letter with US customary) until the user chooses one.
  const [paperChoice, setPaperChoice] = useState<'a4' | 'letter' | null>(null);
  const paper = paperChoice ?? (units === 'us' ? 'letter' : 'a4');
  // Fields with typed text not yet taken: the sheet says "computing" until they are.
  const [typing, setTyping] = useState<ReadonlySet<string>>(() => new Set());
  const pending = useCallback((key: string, on: boolean) => {
    setTyping((s) => {
      if (s.has(key) === on) return s;
      const next = new Set(s);
      if (on) next.add(key);
      else next.delete(key);
      return next;
    });
  }, []);
  const [recovery, setRecovery] = useState<Recovery | null>(null);
  const [info, setInfo] = useState<{ title: string; lines: string[] } | null>(null);
  const [view, setView] = useState<'review' | 'fleet'>('review');
  const actions = useDocumentActions({ bridge, doc, review, dispatch, setUnits, units });
  usePersistence(bridge, doc);

  // Opening: offer recovery of kept edits, else the demo.
  const started = useRef(false);
  useEffect(() => {
    if (started.current) return;
    started.current = true;
    bridge
      .recoverAutosave({})
      .then((r) => (r ? setRecovery(r) : actions.openDemo()))
      .catch(() => actions.openDemo());
  }, [bridge, actions]);

  const { open: openReview, guard, load } = actions;
  useFileDrop({
    openHandle: useCallback((handle: string) => void openReview(handle), [openReview]),
    openText: useCallback((text: string) => void guard('open', async () => load(text, null, true, 'Opened the dropped review (not yet saved).')), [guard, load]),
  });

  // Ctrl+N (Cmd+N): New review. In Electron the menu's accelerator does the same; opening twice is harmless.
  useEffect(() => {
    const onKey = (e: KeyboardEvent) => {
      if ((e.ctrlKey || e.metaKey) && !e.shiftKey && !e.altKey && e.key.toLowerCase() === 'n') {
        e.preventDefault();
        setStarting(true);
      }
    };
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, []);
  const { setNotice } = actions;
  /** The unit switch; when it moves the record's paper too, it says so (never silently). */
  const switchUnits = useCallback(
    (u: UnitSystem) => {
      setUnits(u);
      const next = u === 'us' ? 'letter' : 'a4';
      if (paperChoice === null && next !== paper) setNotice({ kind: 'info', text: `The record's paper is now ${next === 'letter' ? 'Letter' : 'A4'}, with the ${u === 'us' ? 'US customary' : 'SI'} units; choose the paper beside Export record to keep another.` });
    },
    [paperChoice, paper, setNotice],
  );
  const startNew = useCallback(
    (kind: TemplateKind) => {
      setStarting(false);
      dispatch({ type: 'load', draft: newReviewDraft(kind), handle: null, dirty: false });
      setUnits('si');
      setNotice({ kind: 'info', text: `Started a new review from the ${TEMPLATE_WORDS[kind].name.toLowerCase()} template: fill in the marked inputs.` });
    },
    [dispatch, setNotice],
  );
  // An edit makes the last "Opened …" or "Saved …" notice out of date: it goes. Errors stay until the next command.
  const edit = useCallback(
    (a: DocAction) => {
      if (a.type !== 'load' && a.type !== 'saved') setNotice((n) => (n?.kind === 'info' ? null : n));
      dispatch(a);
    },
    [dispatch, setNotice],
  );

  // run()'s refusal shows at its field; the store shows it only while the draft is valid.
  useLayoutEffect(() => store.setEngineError(computed.error), [store, computed.error]);
  // The same object from edit to edit: no input re-renders through it, each follows its own path in the store.
  const hasDraft = doc.draft !== null;
  const sheet = useMemo<SheetContext | null>(() => (hasDraft ? { store, units, dispatch: edit, pending } : null), [hasDraft, store, units, edit, pending]);

  const status: ReviewStatus = review ? (computed.status ?? 'draft') : doc.draft?.signoff ? 'changed-since-signing' : 'draft';
  const limits = useMemo(
    () => ({ boundaryBelow: review?.policy.boundaryBelowLambda ?? 1, fullFilmFrom: review?.policy.fullFilmFromLambda ?? 3 }),
    [review?.policy.boundaryBelowLambda, review?.policy.fullFilmFromLambda],
  );

  const onMenu = useRef<(c: MenuCommand, handle?: string) => void>(() => undefined);
  onMenu.current = (command, handle) => {
    const table: Record<MenuCommand, () => void> = {
      new: () => setStarting(true),
      open: () => void actions.open(handle),
      save: () => void actions.save(false),
      'save-as': () => void actions.save(true),
      'export-record': () => void actions.exportRecord(paper),
      'export-csv': () => void actions.exportCsv(),
      'export-summary-csv': () => void actions.exportCsv('summary'),
      sign: () => setSigning(true),
      compare: () => setCompareRequest((n) => n + 1),
      methods: () => setInfo({ title: 'Methods and sources', lines: [BASIS_NOTE, ...(computed.results?.assumptions ?? []), ...METHODS.map(methodLine)] }),
      about: () =>
        void bridge.appInfo({}).then((a) => setInfo({ title: 'About Flankfilm', lines: [`Flankfilm ${a.version}`, `Engine ${a.engineVersion}`, `Platform ${a.platform}`] })),
      'units-si': () => switchUnits('si'),
      'units-us': () => switchUnits('us'),
    };
    table[command]();
  };
  useEffect(() => bridge.onMenu((e) => onMenu.current(e.command, e.handle)), [bridge]);

  const recover = useCallback(
    (r: Recovery) => {
      setRecovery(null);
      void actions.guard('open', async () => actions.load(r.text, r, true, 'Recovered the unsaved edits.'));
    },
    [actions],
  );
  const discard = useCallback(() => {
    setRecovery(null);
    void bridge.discardAutosave({}).finally(() => void actions.openDemo());
  }, [bridge, actions]);

  const pickOther = useCallback(async () => {
    const r = await bridge.openReview({});
    return r.canceled ? null : r.text;
  }, [bridge]);

  const results = computed.results;
  const stale = Boolean(results) && (!review || computed.error !== null);
  const title = typeof doc.draft?.title === 'string' ? doc.draft.title : 'Flankfilm';
  return (
    <div className="app">
      <TopBar
        title={title}
        dirty={doc.dirty}
        status={status}
        units={units}
        busy={actions.busy}
        notice={actions.notice}
        canExport={review !== null}
        computing={computed.computing || typing.size > 0}
        onUnits={switchUnits}
        paper={paper}
        paperChosen={paperChoice !== null}
        onPaper={setPaperChoice}
        onNew={() => setStarting(true)}
        onOpen={() => void actions.open()}
        onSave={() => void actions.save(false)}
        onRecord={(paper) => void actions.exportRecord(paper)}
        onCsv={(table) => void actions.exportCsv(table)}
        onSign={() => setSigning(true)}
        progress={actions.progress}
        onCancelRecord={actions.cancelRecord}
      />
      {recovery ? <RecoveryPrompt savedAt={recovery.savedAt} name={recovery.name} onRecover={() => recover(recovery)} onDiscard={discard} /> : null}
      {starting ? <NewReviewDialog dirty={doc.dirty} onStart={startNew} onClose={() => setStarting(false)} /> : null}
      {info ? <InfoDialog title={info.title} lines={info.lines} onClose={() => setInfo(null)} /> : null}
      <nav className="view-switch" aria-label="View">
        <button type="button" aria-pressed={view === 'review'} onClick={() => setView('review')}>Review</button>
        <button type="button" aria-pressed={view === 'fleet'} onClick={() => setView('fleet')} data-testid="view-fleet">Fleet</button>
      </nav>
      <FleetView bridge={bridge} paper={units === 'us' ? 'letter' : 'a4'} hidden={view !== 'fleet'} />
      {view === 'fleet' ? null : sheet ? (
        <Sheet.Provider value={sheet}>
          <main className="sheet">
            <div className="sheet__inputs" aria-label="Inputs" role="group">
              {doc.draft && isDemoReview(doc.draft) ? (
                <p className="demo-banner" role="note" data-testid="demo-banner">
                  <strong>Invented demo.</strong> The Harrow Creek aggregate plant is made up; every number in this review (gear pair, duty, oils) is invented. Start your own with “New review…” in the toolbar.
                </p>
              ) : null}
              <ProblemList issues={issues} engineError={review ? computed.error : null} stale={stale} draft={doc.draft} units={units} />
              <RecordPanel />
              <GearPairPanel results={results ?? null} stale={stale} />
              <DutyPanel />
              <OilsPanel summaries={results?.oils ?? []} />
              <PolicyPanel />
            </div>
            <div className={`sheet__findings${stale ? ' is-stale' : ''}`} aria-label="Findings" role="group" data-stale={stale} data-edition={computed.edition}>
              {stale ? <p className="stale-note" role="status">Showing the results of the last valid entry.</p> : null}
              <VerdictPanel results={results} units={units} />
              <SideBySidePanel results={results} units={units} />
              <MeshPanel results={results} review={review} limits={limits} units={units} />
              <MapPanel review={review} edition={doc.edition} results={results} units={units} />
              <SignoffPanel status={status} signoff={review?.signoff} review={review} canSign={review !== null} onOpen={() => setSigning(true)}>
                <ChangesSinceSigning review={review} results={results ?? null} status={status} units={units} />
                <CompareWith review={review} units={units} pickOther={pickOther} request={compareRequest} />
              </SignoffPanel>
            </div>
          </main>
          <SignoffDialog
            open={signing}
            previous={review?.signoff}
            subject={review ? decisionSubject(review) : 'the review as a whole'}
            onClose={() => setSigning(false)}
            onSign={async (form) => {
              await actions.sign(form);
              setSigning(false);
            }}
          />
        </Sheet.Provider>
      ) : (
        <main className="sheet sheet--empty">
          <p>{actions.busy ? 'Opening…' : 'No review open.'}</p>
        </main>
      )}
    </div>
  );
}

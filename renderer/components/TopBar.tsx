import { useId } from 'react';
import type { ReviewStatus } from '../../app/review/results';
import type { Busy, Notice } from '../hooks/useDocumentActions';
import type { UnitSystem } from '../units/units';
import { StatusBadge } from './StatusBadge';
import { UnitSwitch } from './UnitSwitch';

interface Props {
  readonly title: string;
  readonly dirty: boolean;
  readonly status: ReviewStatus;
  readonly units: UnitSystem;
  readonly busy: Busy;
  readonly notice: Notice | null;
  readonly canExport: boolean;
  readonly computing: boolean;
  readonly onUnits: (u: UnitSystem) => void;
  /** The record's paper: chosen, or following the units (Letter with US, A4 with SI) while not chosen. */
  readonly paper: 'a4' | 'letter';
  readonly paperChosen: boolean;
  readonly onPaper: (paper: 'a4' | 'letter') => void;
  readonly onNew: () => void;
  readonly onOpen: () => void;
  readonly onSave: () => void;
  readonly onRecord: (paper: 'a4' | 'letter') => void;
  readonly onCsv: (table: 'points' | 'summary') => void;
  readonly onSign: () => void;
  /** Record-export progress from main, if any. */
  readonly progress: { done: number; total: number } | null;
  readonly onCancelRecord: () => void;
}

const BUSY_WORDS: Readonly<Record<Exclude<Busy, null>, string>> = {
  open: 'Opening…',
  save: 'Saving…',
  record: 'Making the record (PDF)…',
  csv: 'Writing the CSV…',
  sign: 'Signing…',
};

/** Why the record, CSV and sign-off commands are disabled, or null when they are not. */
function whyDisabled(p: Props): string | null {
  if (p.busy) return `Wait: ${BUSY_WORDS[p.busy].replace('…', '')} is under way.`;
  if (!p.canExport) return 'Not available yet: correct or fill in the marked inputs so the review computes.';
  return null;
}

/** The sheet's header: what is open, its state, the unit system and the commands. */
export function TopBar(p: Props) {
  const paperId = useId();
  const whyId = useId();
  const why = whyDisabled(p);
  // A disabled command says why: as a tooltip, and to assistive technology by aria-describedby.
  const reason = why ? { title: why, 'aria-describedby': whyId } : {};
  const chosenPaper = p.paper;
  return (
    <header className="topbar">
      <div className="topbar__id">
        <span className="wordmark" aria-hidden="true">
          Flankfilm
        </span>
        <h1 className="topbar__title" title={p.title}>
          <span className="topbar__name">{p.title}</span>
          {p.dirty ? <span className="dirty" title="Unsaved edits" data-testid="unsaved">• unsaved</span> : null}
        </h1>
        <StatusBadge status={p.status} testId="review-status" />
      </div>
      <nav className="topbar__commands" aria-label="Commands">
        <UnitSwitch units={p.units} onChange={p.onUnits} />
        <button type="button" onClick={p.onNew} disabled={p.busy !== null} aria-keyshortcuts="Control+N Meta+N" title="New review (Ctrl+N)">New review…</button>
        <button type="button" onClick={p.onOpen} disabled={p.busy !== null}>Open…</button>
        <button type="button" onClick={p.onSave} disabled={p.busy !== null}>Save</button>
        <span className="record-group">
          <label htmlFor={paperId} className="sr-only">Paper size of the record</label>
          <select id={paperId} value={chosenPaper} onChange={(e) => p.onPaper(e.target.value as 'a4' | 'letter')} title={p.paperChosen ? 'Paper of the record' : 'Paper of the record: follows the units until you choose'} data-testid="paper">
            <option value="a4">A4</option>
            <option value="letter">Letter</option>
          </select>
          <button type="button" onClick={() => p.onRecord(chosenPaper)} disabled={why !== null} data-testid="export-record" {...reason}>
            Export record
          </button>
        </span>
        <button type="button" onClick={() => p.onCsv('points')} disabled={why !== null} data-testid="export-csv" title={why ?? 'Every point along the path of every case × oil'} aria-describedby={why ? whyId : undefined}>Export CSV</button>
        <button type="button" onClick={() => p.onCsv('summary')} disabled={why !== null} data-testid="export-summary-csv" title={why ?? 'One row per case × oil: key figures, limits, pass or fail'} aria-describedby={why ? whyId : undefined}>Summary CSV</button>
        <button type="button" className="primary" onClick={p.onSign} disabled={why !== null} data-testid="sign" {...reason}>Sign off…</button>
        <span id={whyId} className="sr-only">{why ?? ''}</span>
      </nav>
      <div className="topbar__progress" aria-live="polite" data-testid="progress">
        {/* Here, in the line kept for notices, not beside the title: its coming and going never re-wraps the title and shifts the page. */}
        {p.computing ? <span className="computing" data-testid="computing">computing…</span> : null}
        {p.busy ? (
          <>
            {p.busy === 'record' && p.progress ? <progress aria-label={BUSY_WORDS[p.busy]} value={p.progress.done} max={p.progress.total} /> : <progress aria-label={BUSY_WORDS[p.busy]} />} {BUSY_WORDS[p.busy]}
            {p.busy === 'record' ? (
              <button type="button" onClick={p.onCancelRecord} data-testid="cancel-record">
                Cancel
              </button>
            ) : null}
          </>
        ) : p.notice ? (
          <span className={`notice notice--${p.notice.kind}`} role={p.notice.kind === 'error' ? 'alert' : undefined} data-testid="notice">
            {p.notice.text}
          </span>
        ) : null}
      </div>
    </header>
  );
}

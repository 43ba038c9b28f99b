import { useId, useState } from 'react';
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
  readonly onOpen: () => void;
  readonly onSave: () => void;
  readonly onRecord: (paper: 'a4' | 'letter') => void;
  readonly onCsv: () => void;
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

/** The sheet's header: what is open, its state, the unit system and the commands. */
export function TopBar(p: Props) {
  const paperId = useId();
  const [paper, setPaper] = useState<'a4' | 'letter' | null>(null);
  const chosenPaper = paper ?? (p.units === 'us' ? 'letter' : 'a4');
  return (
    <header className="topbar">
      <div className="topbar__id">
        <span className="wordmark" aria-hidden="true">
          Flankfilm
        </span>
        <h1 className="topbar__title">
          {p.title}
          {p.dirty ? <span className="dirty" title="Unsaved edits"> • unsaved</span> : null}
        </h1>
        <StatusBadge status={p.status} testId="review-status" />
        {p.computing ? <span className="computing" aria-hidden="true">recomputing…</span> : null}
      </div>
      <nav className="topbar__commands" aria-label="Commands">
        <UnitSwitch units={p.units} onChange={p.onUnits} />
        <button type="button" onClick={p.onOpen} disabled={p.busy !== null}>Open…</button>
        <button type="button" onClick={p.onSave} disabled={p.busy !== null}>Save</button>
        <span className="record-group">
          <label htmlFor={paperId} className="sr-only">Paper size of the record</label>
          <select id={paperId} value={chosenPaper} onChange={(e) => setPaper(e.target.value as 'a4' | 'letter')}>
            <option value="a4">A4</option>
            <option value="letter">Letter</option>
          </select>
          <button type="button" onClick={() => p.onRecord(chosenPaper)} disabled={p.busy !== null || !p.canExport} data-testid="export-record">
            Export record
          </button>
        </span>
        <button type="button" onClick={p.onCsv} disabled={p.busy !== null || !p.canExport} data-testid="export-csv">Export CSV</button>
        <button type="button" className="primary" onClick={p.onSign} disabled={p.busy !== null || !p.canExport}>Sign off…</button>
      </nav>
      <div className="topbar__progress" aria-live="polite" data-testid="progress">
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

import { memo, useState } from 'react';
import type { ReviewIssue } from '../../../app/review/parse';
import { friendlyMessage } from '../../state/messages';
import { messageInWords, pathWords } from '../../../app/review/pathWords';
import type { Bridge } from '../../../app/bridge/contract';
import { useFleet } from '../../hooks/useFleet';
import { Panel } from '../panels/Panel';
import { FitTable } from './FitTable';
import { FleetFindings } from './FleetFindings';

/** A file's problems, as the sheet's problem list shows them. */
function Problems({ issues }: { readonly issues: readonly ReviewIssue[] }) {
  if (issues.length === 0) return null;
  return (
    <ul className="fleet-problem">
      {issues.map((i) => (
        <li key={`${i.path}|${i.message}`}>
          {pathWords(i.path, null)}: {friendlyMessage(i.message, i.path)}
        </li>
      ))}
    </ul>
  );
}

/**
 * Fleet: several reviews against a candidate-oil file. The files are read here by name (their
 * paths stay with the system); the consolidation runs in a worker with progress; the record is
 * made by main from the same texts. Kept mounted while hidden, so its files and table stay.
 */
function FleetViewPanel({ bridge, paper, hidden }: { readonly bridge: Bridge; readonly paper: 'a4' | 'letter'; readonly hidden: boolean }) {
  const fleet = useFleet(bridge);
  const { state } = fleet;
  const [notice, setNotice] = useState<string | null>(null);
  const ready = state.reviews.some((r) => r.review) && state.oils?.oils != null;
  const exportRecord = () => {
    setNotice('Making the fleet record…');
    fleet.exportRecord(paper).then(
      (m) => setNotice(m),
      (e: unknown) => setNotice(`No record made: ${messageInWords((e as Error).message, null)}`),
    );
  };
  return (
    <main className="fleet" aria-label="Fleet" hidden={hidden}>
      <Panel id="fleet-inputs" title="Fleet: gearboxes and candidate oils">
        <p className="note">Each review is run with each candidate oil alone, under that gearbox's own policy; the smallest set of oils that serves every gearbox is then chosen.</p>
        <div className="fleet-pickers">
          <label>
            Reviews (one per gearbox)
            <input type="file" multiple accept=".json,application/json" data-testid="fleet-reviews" onChange={(e) => void fleet.addReviews([...(e.currentTarget.files ?? [])])} />
          </label>
          <label>
            Candidate oils
            <input type="file" accept=".json,application/json" data-testid="fleet-oils" onChange={(e) => e.currentTarget.files?.[0] && void fleet.setOils(e.currentTarget.files[0])} />
          </label>
        </div>
        <ul className="fleet-files" data-testid="fleet-files">
          {state.reviews.map((r) => (
            <li key={r.name} className={r.review ? undefined : 'fleet-file--bad'}>
              {r.review ? '✓' : '✗'} {r.name}
              {r.review ? ` — ${r.review.title}` : ' — not a valid review, left out'}
              <Problems issues={r.problems} />
            </li>
          ))}
          {state.oils ? (
            <li className={state.oils.oils ? undefined : 'fleet-file--bad'}>
              {state.oils.oils ? '✓' : '✗'} {state.oils.name} — {state.oils.oils ? `${state.oils.oils.length} candidate oils` : 'not a valid candidate-oil file'}
              <Problems issues={state.oils.problems} />
            </li>
          ) : null}
        </ul>
        <div className="panel__actions">
          <button type="button" className="primary" disabled={!ready || state.phase === 'running'} onClick={fleet.compute} data-testid="fleet-compute">Compute fit table</button>
          {state.phase === 'running' ? <button type="button" onClick={fleet.cancel}>Cancel</button> : null}
          <button type="button" disabled={!ready} onClick={exportRecord} data-testid="fleet-export">Export fleet record…</button>
          <button type="button" onClick={fleet.clear}>Clear</button>
        </div>
        {state.phase === 'running' ? (
          <p role="status">
            <progress max={Math.max(1, state.total)} value={state.done} aria-label="Fleet progress" /> {state.done} of {state.total} reviews run
          </p>
        ) : null}
        {state.error ? <p role="alert" className="fleet-problem">{state.error}</p> : null}
        {notice ? <p role="status">{notice}</p> : null}
      </Panel>
      {state.result ? (
        <Panel id="fleet-results" title="Fit table and smallest oil set">
          <FitTable result={state.result} />
          <FleetFindings result={state.result} />
          <p className="note">Follow each gearbox maker's lubricant list, local codes and a licensed engineer's judgement; this is an aid, not an approval.{state.millis !== null ? ` Computed in ${(state.millis / 1000).toFixed(1)} s.` : ''}</p>
        </Panel>
      ) : null}
    </main>
  );
}

/** Its own state only: the review's edits and results (the sheet's renders) do not re-render it. */
export const FleetView = memo(FleetViewPanel);

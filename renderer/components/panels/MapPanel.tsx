import { MESH_WORDS } from '../../../app/review/vocabulary';
import { useId, useMemo, useState } from 'react';
import type { Results, VerdictCode } from '../../../app/review/results';
import type { LoadCase, Review } from '../../../app/review/schema';
import { useOperatingMap, type OperatingMapControls } from '../../hooks/useOperatingMap';
import { formatResult } from '../../units/format';
import { toDisplay, unitLabel, type UnitSystem } from '../../units/units';
import { HeatMap } from '../map/HeatMap';
import { MapLegend } from '../map/MapLegend';
import { MapReadout } from '../map/MapReadout';
import { casePoint, levelText, mapSentences, oilPhrases, type Cell } from '../map/mapView';
import { Panel } from './Panel';

interface Props {
  readonly review: Review | null;
  readonly edition: number;
  readonly results: Results | null;
  readonly units: UnitSystem;
}

const temperatureText = (celsius: number, units: UnitSystem) => `${formatResult(toDisplay('temperature', celsius, units), 3)} ${unitLabel('temperature', units)}`;

const SEVERITY: Readonly<Record<VerdictCode, number>> = { 'aw-suffices': 0, 'ep-warranted': 1, 'beyond-oil': 2 };

/** The governing case of the most severe overall verdict, as an index into `cases`; 0 if none. */
function governingIndex(results: Results | null, cases: readonly LoadCase[]): number {
  const worst = [...(results?.verdicts ?? [])].sort((a, b) => SEVERITY[b.code] - SEVERITY[a.code])[0];
  const i = worst ? cases.findIndex((c) => c.name === worst.governingLoadCase) : -1;
  return Math.max(0, i);
}

function SweepStatus({ m, edition }: { readonly m: OperatingMapControls; readonly edition: number }) {
  const shownProgress = m.phase === 'running' || m.phase === 'cancelled';
  const stale = m.sweep !== null && m.sweep.edition !== edition;
  return (
    <div className="map-status" role="status" data-testid="map-status" data-phase={m.phase} data-done={m.done} data-total={m.total}>
      {shownProgress ? (
        <>
          <progress max={Math.max(1, m.total)} value={m.done} aria-label="Map sweep progress" data-testid="map-progress" />
          <span data-testid="map-progress-text">
            {m.phase === 'cancelled' ? 'Cancelled' : 'Sweeping'}: {m.done} of {m.total} maps
          </span>
        </>
      ) : null}
      {m.phase === 'idle' ? <span>The map sweeps the policy’s oil temperature range against 10–150 % of each case’s torque, for every load case and oil.</span> : null}
      {m.phase === 'done' && m.sweep ? <span>{m.sweep.maps.length} maps swept in {formatResult(m.sweep.millis, 2)} ms.</span> : null}
      {m.phase === 'failed' ? <span className="notice--error" role="alert">The map could not be swept: {m.error}</span> : null}
      {stale ? <span className="note">{m.phase === 'running' ? ' Showing the map of an earlier edit until this one is done.' : ' This map is of an earlier edit: Compute map brings it up to date.'}</span> : null}
    </div>
  );
}

/** The oil temperature × load sweep: one verdict map per oil for a chosen load case. */
export function MapPanel({ review, edition, results, units }: Props) {
  const m = useOperatingMap(review, edition);
  const [picked, setPicked] = useState<number | null>(null);
  const [cursor, setCursor] = useState<Cell | null>(null);
  const selectId = useId();
  const readoutId = useId();
  const sweep = m.sweep;
  const cases = sweep?.review.loadCases ?? review?.loadCases ?? [];
  const index = picked !== null && picked < cases.length ? picked : governingIndex(results, cases);
  const oils = sweep?.review.oils ?? [];
  const maps = useMemo(() => (sweep ? sweep.maps.slice(index * sweep.review.oils.length, (index + 1) * sweep.review.oils.length) : []), [sweep, index]);
  const names = useMemo(() => oilPhrases(oils), [oils]);
  const policy = sweep?.review.policy;
  const caseT = sweep?.review.loadCases[index]?.oilTemperature_C ?? 0;
  const tShown = (c: number) => temperatureText(c, units);
  const sentences = useMemo(
    () => (policy ? mapSentences(maps, names, policy.scuffingSafetyMin, caseT, { temperature: (c) => temperatureText(c, units), number: (x) => formatResult(x, 3), level: levelText }) : []),
    [maps, names, policy, caseT, units],
  );
  const point = maps[0] ? casePoint(maps[0], caseT) : null;

  return (
    <Panel
      id="map"
      title="Map"
      actions={
        <>
          <span className="field field--inline">
            <label htmlFor={selectId}>Load case</label>
            <select id={selectId} value={index} onChange={(e) => setPicked(Number(e.target.value))} data-testid="map-case" disabled={cases.length === 0}>
              {cases.map((c, i) => (
                <option key={i} value={i}>
                  {c.name}
                </option>
              ))}
            </select>
          </span>
          <button type="button" className="primary" onClick={m.compute} disabled={!review || m.phase === 'running'} data-testid="map-compute">
            Compute map
          </button>
          <button type="button" onClick={m.cancel} disabled={m.phase !== 'running'} data-testid="map-cancel">
            Cancel
          </button>
        </>
      }
    >
      <div className="map" aria-busy={m.phase === 'running'} data-edition={sweep?.edition ?? -1}>
        <SweepStatus m={m} edition={edition} />
        {sweep && policy && maps.length ? (
          <>
            <ul className="map-findings" data-testid="map-findings">
              {maps[0]?.mesh ? <li>The map sweeps the governing mesh of the stage, the {MESH_WORDS[maps[0].mesh]} mesh.</li> : null}
              {sentences.map((s) => (
                <li key={s}>{s}</li>
              ))}
            </ul>
            <MapLegend
              scuffingSafetyMin={policy.scuffingSafetyMin}
              lambdaTarget={policy.lambdaTarget}
              casePoint={`${tShown(caseT)}, 100 % load${point && !point.inside ? ' (outside the map’s temperature range: dashed ring at its edge)' : ''}`}
            />
            <div className="map-grid">
              {maps.map((map, i) => (
                <HeatMap
                  key={`${index}-${i}`}
                  map={map}
                  label={map.oil}
                  scuffingSafetyMin={policy.scuffingSafetyMin}
                  lambdaTarget={policy.lambdaTarget}
                  caseTemperature_C={caseT}
                  units={units}
                  cursor={cursor}
                  onCursor={setCursor}
                  readoutId={readoutId}
                />
              ))}
            </div>
            <MapReadout id={readoutId} maps={maps} labels={maps.map((x) => x.oil)} cursor={cursor} units={units} />
          </>
        ) : sweep && !maps.length ? (
          <p className="note">This review has no oil to map.</p>
        ) : null}
      </div>
    </Panel>
  );
}

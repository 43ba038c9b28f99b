import { memo, useEffect, useId, useMemo, useState } from 'react';
import type { CaseResult, Results } from '../../../app/review/results';
import type { UnitSystem } from '../../units/units';
import { Panel } from '../panels/Panel';
import { QuantityRow } from '../Quantity';
import { MeshChart } from './MeshChart';
import { meshCharts, type RegimeLimits } from './series';

interface Props {
  readonly results: Results | null;
  readonly limits: RegimeLimits;
  readonly units: UnitSystem;
}

/** The load cases in the results' order, each with its rows (one per oil). */
function byLoadCase(cases: readonly CaseResult[]): { name: string; rows: CaseResult[] }[] {
  const out: { name: string; rows: CaseResult[] }[] = [];
  for (const c of cases) {
    const last = out[out.length - 1];
    if (last && last.name === c.loadCase) last.rows.push(c);
    else out.push({ name: c.loadCase, rows: [c] });
  }
  return out;
}

/** One strip of charts along the path of contact, A to E, for one load case with every oil drawn on the same chart. */
function MeshPanelView({ results, limits, units }: Props) {
  const [picked, setPicked] = useState(0);
  const selectId = useId();
  const groups = useMemo(() => byLoadCase(results?.cases ?? []), [results]);
  const index = picked < groups.length ? picked : 0;
  const rows = groups[index]?.rows;
  const c = rows?.[0];
  const specs = useMemo(() => (rows && results ? meshCharts(rows, results.gear, limits, units, results.cases) : []), [rows, results, limits, units]);
  // The charts (children) have drawn their new data by now: the end of the edit-to-chart latency.
  useEffect(() => {
    if (specs.length) performance.mark('chart-updated');
  }, [specs]);
  if (!results || !c) return <Panel id="mesh" title="Mesh"><p className="note">No results yet.</p></Panel>;
  const stem = `flankfilm-mesh-${index + 1}`;
  return (
    <Panel
      id="mesh"
      title="Mesh"
      actions={
        <span className="field field--inline">
          <label htmlFor={selectId}>Load case</label>
          <select id={selectId} value={index} onChange={(e) => setPicked(Number(e.target.value))} data-testid="mesh-case">
            {groups.map((g, i) => (
              <option key={i} value={i}>
                {g.name}
              </option>
            ))}
          </select>
        </span>
      }
    >
      <dl className="qlist qlist--row">
        <QuantityRow def="maxHertzStress" value={c.maxHertzStress_MPa} units={units} sig={4} testId="mesh-max-hertz" />
        <QuantityRow def="pitchLineVelocity" value={c.pitchLineVelocity_mps} units={units} sig={4} />
        <QuantityRow def="lambdaMin" value={c.lambdaMin} units={units} sig={4} testId="mesh-lambda-min" />
        <QuantityRow def="frictionCoefficient" value={c.frictionCoefficient} units={units} sig={4} />
        <QuantityRow def="bulkTemperature" value={c.bulkTemperature_C} units={units} sig={4} />
        <QuantityRow def="maxFlashTemperature" value={c.maxFlashTemperature_K} units={units} sig={4} />
        <QuantityRow def="maxContactTemperature" value={c.maxContactTemperature_C} units={units} sig={4} />
        <QuantityRow def="scuffingTemperature" value={c.scuffingTemperature_C} units={units} sig={4} />
      </dl>
      <p className="note">Every oil of the case on the same charts, on axes fixed for the whole review; one position axis, A to E, for the strip.</p>
      <div className="mesh-strip">
        {specs.map((s) => (
          <MeshChart key={s.id} spec={s} fileStem={stem} units={units} />
        ))}
      </div>
    </Panel>
  );
}

/** Re-renders only when its results or units change, not on every keystroke in the inputs. */
export const MeshPanel = memo(MeshPanelView);

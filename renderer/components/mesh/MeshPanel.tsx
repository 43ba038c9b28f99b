import { memo, useEffect, useId, useMemo, useState } from 'react';
import type { CaseResult, Results } from '../../../app/review/results';
import { MICROPITTING_LABELS } from '../../../app/review/vocabulary';
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

/** Charts along the path of contact, A to E, for one load case × oil. */
function MeshPanelView({ results, limits, units }: Props) {
  const [picked, setPicked] = useState(0);
  const selectId = useId();
  const cases = results?.cases ?? [];
  const index = picked < cases.length ? picked : 0;
  const c = cases[index];
  const specs = useMemo(() => (c && results ? meshCharts(c, results.gear, limits, units) : []), [c, results, limits, units]);
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
          <label htmlFor={selectId}>Case</label>
          <select id={selectId} value={index} onChange={(e) => setPicked(Number(e.target.value))} data-testid="mesh-case">
            {cases.map((x, i) => (
              <option key={i} value={i}>
                {x.loadCase} — {x.oil ?? 'no oil'}
              </option>
            ))}
          </select>
        </span>
      }
    >
      <dl className="qlist qlist--row">
        <QuantityRow def="maxHertzStress" value={c.maxHertzStress_MPa} units={units} sig={4} testId="mesh-max-hertz" />
        <QuantityRow def="pitchLineVelocity" value={c.pitchLineVelocity_mps} units={units} sig={3} />
        <QuantityRow def="lambdaMin" value={c.lambdaMin} units={units} sig={2} testId="mesh-lambda-min" />
        <QuantityRow def="frictionCoefficient" value={c.frictionCoefficient} units={units} sig={2} />
        <QuantityRow def="bulkTemperature" value={c.bulkTemperature_C} units={units} sig={3} />
        <QuantityRow def="maxFlashTemperature" value={c.maxFlashTemperature_K} units={units} sig={3} />
        <QuantityRow def="maxContactTemperature" value={c.maxContactTemperature_C} units={units} sig={3} />
        <QuantityRow def="scuffingTemperature" value={c.scuffingTemperature_C} units={units} sig={3} />
        <QuantityRow def="micropittingSafety" value={c.micropitting?.safety ?? null} units={units} sig={3} testId="mesh-micropitting-safety" />
        <QuantityRow def="micropittingFinding" value={micropittingWords(c)} units={units} testId="mesh-micropitting-finding" />
      </dl>
      <div className="mesh-grid">
        {specs.map((s) => (
          <MeshChart key={s.id} spec={s} fileStem={stem} />
        ))}
      </div>
    </Panel>
  );
}

/** Pass or fail against Sλ,min, in words (never colour alone). */
export function micropittingWords(c: CaseResult): string | null {
  const m = c.micropitting;
  if (!m) return null;
  const limit = m.safety === null ? '' : ` (Sλ ${m.safety >= m.safetyMin ? '≥' : '<'} ${m.safetyMin})`;
  return `${MICROPITTING_LABELS[m.finding]}${limit}`;
}

/** Re-renders only when its results or units change, not on every keystroke in the inputs. */
export const MeshPanel = memo(MeshPanelView);

import { memo, useEffect, useId, useMemo, useState } from 'react';
import type { PlanetaryMesh, Results } from '../../../app/review/results';
import { MESH_WORDS } from '../../../app/review/vocabulary';
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

/** Charts along the path of contact, A to E, for one load case × oil (and, on a planetary stage, one mesh). */
function MeshPanelView({ results, limits, units }: Props) {
  const [picked, setPicked] = useState(0);
  const [pickedMesh, setPickedMesh] = useState<PlanetaryMesh | null>(null);
  const selectId = useId();
  const meshSelectId = useId();
  const meshes = results?.meshes ?? null;
  const mesh = meshes ? (meshes.find((m) => m.mesh === pickedMesh) ?? meshes.find((m) => m.mesh === results?.planetary?.shownMesh) ?? meshes[0]) : null;
  const cases = mesh?.cases ?? results?.cases ?? [];
  const gear = mesh?.gear ?? results?.gear;
  const index = picked < cases.length ? picked : 0;
  const c = cases[index];
  const specs = useMemo(() => (c && gear ? meshCharts(c, gear, limits, units) : []), [c, gear, limits, units]);
  // The charts (children) have drawn their new data by now: the end of the edit-to-chart latency.
  useEffect(() => {
    if (specs.length) performance.mark('chart-updated');
  }, [specs]);
  if (!results || !c) return <Panel id="mesh" title="Mesh"><p className="note">No results yet.</p></Panel>;
  const stem = `flankfilm-mesh-${mesh ? `${mesh.mesh}-` : ''}${index + 1}`;
  return (
    <Panel
      id="mesh"
      title="Mesh"
      actions={
        <>
          {meshes && mesh ? (
            <span className="field field--inline">
              <label htmlFor={meshSelectId}>Mesh</label>
              <select id={meshSelectId} value={mesh.mesh} onChange={(e) => setPickedMesh(e.target.value as PlanetaryMesh)} data-testid="mesh-mesh">
                {meshes.map((m) => (
                  <option key={m.mesh} value={m.mesh}>
                    {MESH_WORDS[m.mesh]}
                  </option>
                ))}
              </select>
            </span>
          ) : null}
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
        </>
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
      </dl>
      <div className="mesh-grid">
        {specs.map((s) => (
          <MeshChart key={s.id} spec={s} fileStem={stem} />
        ))}
      </div>
    </Panel>
  );
}

/** Re-renders only when its results or units change, not on every keystroke in the inputs. */
export const MeshPanel = memo(MeshPanelView);

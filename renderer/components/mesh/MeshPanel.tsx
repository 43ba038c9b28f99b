import { memo, useCallback, useId, useLayoutEffect, useMemo, useRef, useState } from 'react';
import type { CaseResult, PlanetaryMesh, Results } from '../../../app/review/results';
import { MESH_WORDS, MICROPITTING_LABELS } from '../../../app/review/vocabulary';
import type { Review } from '../../../app/review/schema';
import type { EhlPointRequest, EhlPointSpec } from '../../../app/review/ehlPoint';
import { FilmDetail } from '../film/FilmDetail';
import type { UnitSystem } from '../../units/units';
import { Panel } from '../panels/Panel';
import { QuantityRow } from '../Quantity';
import { MeshChart } from './MeshChart';
import { meshCharts, type ChartSpec, type RegimeLimits } from './series';

interface Props {
  readonly results: Results | null;
  /** The review the results come from: Film detail solves at a point of it. */
  readonly review?: Review | null;
  readonly limits: RegimeLimits;
  readonly units: UnitSystem;
}

/** The points at which Film detail can solve the film. */
const FILM_POINTS: ReadonlyArray<{ value: EhlPointSpec & string; label: string }> = [
  { value: 'lambda-min', label: 'least λ' },
  { value: 'A', label: 'A' },
  { value: 'B', label: 'B' },
  { value: 'C', label: 'C' },
  { value: 'D', label: 'D' },
  { value: 'E', label: 'E' },
];

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

/**
 * One strip of charts along the path of contact, A to E, for one load case with every oil drawn on
 * the same chart (on a planetary stage, for the chosen mesh); Film detail at a point on demand.
 */
function MeshPanelView({ results, review = null, limits, units }: Props) {
  const [picked, setPicked] = useState(0);
  const [pickedMesh, setPickedMesh] = useState<PlanetaryMesh | null>(null);
  const [filmAt, setFilmAt] = useState<EhlPointSpec & string>('lambda-min');
  const [filmOil, setFilmOil] = useState(0);
  const [film, setFilm] = useState<EhlPointRequest | null>(null);
  const selectId = useId();
  const meshSelectId = useId();
  const pointId = useId();
  const oilId = useId();
  const meshes = results?.meshes ?? null;
  const mesh = meshes ? (meshes.find((m) => m.mesh === pickedMesh) ?? meshes.find((m) => m.mesh === results?.planetary?.shownMesh) ?? meshes[0]) : null;
  const cases = mesh?.cases ?? results?.cases;
  const gear = mesh?.gear ?? results?.gear;
  const groups = useMemo(() => byLoadCase(cases ?? []), [cases]);
  const index = picked < groups.length ? picked : 0;
  const rows = groups[index]?.rows;
  const c = rows?.[0];
  const specs = useMemo(() => (rows && gear && cases ? meshCharts(rows, gear, limits, units, cases) : []), [rows, gear, cases, limits, units]);
  const onDrawn = useChartsDrawn(specs);
  if (!results || !c || !rows) return <Panel id="mesh" title="Mesh"><p className="note">No results yet.</p></Panel>;
  const stem = `flankfilm-mesh-${index + 1}`;
  const oils = rows.filter((r) => r.oil !== null);
  const filmRow = oils[filmOil < oils.length ? filmOil : 0];
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
            <label htmlFor={selectId}>Load case</label>
            <select id={selectId} value={index} onChange={(e) => setPicked(Number(e.target.value))} data-testid="mesh-case">
              {groups.map((g, i) => (
                <option key={i} value={i}>
                  {g.name}
                </option>
              ))}
            </select>
          </span>
          {review && filmRow && !meshes ? (
            <span className="field field--inline">
              {oils.length > 1 ? (
                <>
                  <label htmlFor={oilId}>Oil</label>
                  <select id={oilId} value={filmOil < oils.length ? filmOil : 0} onChange={(e) => setFilmOil(Number(e.target.value))} data-testid="film-oil">
                    {oils.map((o, i) => (
                      <option key={i} value={i}>
                        {o.oil}
                      </option>
                    ))}
                  </select>
                </>
              ) : null}
              <label htmlFor={pointId}>Film at</label>
              <select id={pointId} value={filmAt} onChange={(e) => setFilmAt(e.target.value as EhlPointSpec & string)} data-testid="film-point">
                {FILM_POINTS.map((p) => (
                  <option key={p.value} value={p.value}>
                    {p.label}
                  </option>
                ))}
              </select>
              <button type="button" onClick={() => setFilm({ caseName: filmRow.loadCase, oilName: filmRow.oil as string, at: filmAt })} data-testid="film-open">
                Film detail…
              </button>
            </span>
          ) : null}
        </>
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
        <QuantityRow def="micropittingSafety" value={c.micropitting?.safety ?? null} units={units} sig={3} testId="mesh-micropitting-safety" />
        <QuantityRow def="micropittingFinding" value={micropittingWords(c)} units={units} testId="mesh-micropitting-finding" />
      </dl>
      <p className="note">
        Figures of {c.oil ?? 'the case'}. Every oil of the case on the same charts, on axes fixed for the whole review; one position axis, A to E, for the strip.
      </p>
      <div className="mesh-strip">
        {specs.map((s) => (
          <MeshChart key={s.id} spec={s} fileStem={stem} units={units} onDrawn={onDrawn} />
        ))}
      </div>
      {film && review ? <FilmDetail review={review} point={film} units={units} onClose={() => setFilm(null)} /> : null}
    </Panel>
  );
}

/**
 * Marks 'chart-updated' (the end of the edit-to-chart latency, tests/e2e/bench.ts) once every chart
 * of the strip shows the current specs: at the commit that brings them (the charts, children,
 * draw in their layout effects before this one runs) or, for a first drawing after paint, when
 * the last chart has drawn. Returns what the charts call when they have drawn.
 */
function useChartsDrawn(specs: readonly ChartSpec[]): (spec: ChartSpec) => void {
  const shown = useRef(new Map<string, ChartSpec>());
  const current = useRef<{ specs: readonly ChartSpec[]; marked: boolean }>({ specs: [], marked: true });
  const check = useCallback(() => {
    const c = current.current;
    if (c.marked || !c.specs.length || !c.specs.every((s) => shown.current.get(s.id) === s)) return;
    c.marked = true;
    performance.mark('chart-updated');
  }, []);
  useLayoutEffect(() => {
    current.current = { specs, marked: false };
    check();
  }, [specs, check]);
  return useCallback(
    (spec: ChartSpec) => {
      shown.current.set(spec.id, spec);
      check();
    },
    [check],
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

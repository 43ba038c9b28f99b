import { memo } from 'react';
import type { CaseResult, Results } from '../../../app/review/results';
import { MESH_WORDS } from '../../../app/review/vocabulary';
import type { UnitSystem } from '../../units/units';
import { Quantity } from '../Quantity';
import { VerdictBadge } from '../VerdictBadge';
import { GradeFinder } from './GradeFinder';
import { Panel } from './Panel';

/**
 * Oils (rows) × load cases (columns): λmin, SB, SintS, FZG stage needed and the verdict. On a
 * planetary stage each oil has a row per mesh, with a mesh column.
 */
function SideBySidePanelView({ results, units }: { readonly results: Results | null; readonly units: UnitSystem }) {
  if (!results) return <Panel id="side-by-side" title="Side by side"><p className="note">No results yet.</p></Panel>;
  const loadCases = [...new Set(results.cases.map((c) => c.loadCase))];
  const oils = [...new Set(results.cases.map((c) => c.oil))];
  const meshes: ReadonlyArray<{ mesh: string | null; cases: readonly CaseResult[] }> = results.meshes ? results.meshes.map((m) => ({ mesh: MESH_WORDS[m.mesh], cases: m.cases })) : [{ mesh: null, cases: results.cases }];
  const rows = oils.flatMap((oil) => meshes.map((m) => ({ oil, ...m })));
  return (
    <Panel id="side-by-side" title="Side by side">
      <div className="table-scroll" tabIndex={0} role="region" aria-label="Oils by load cases">
        <table className="sbs">
          <caption className="sr-only">Oils by load cases: λmin, SB, SintS, FZG stage needed and verdict</caption>
          <thead>
            <tr>
              <th scope="col">Oil</th>
              {results.meshes ? <th scope="col">Mesh</th> : null}
              {loadCases.map((lc) => (
                <th key={lc} scope="col">
                  {lc}
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {rows.map(({ oil, mesh, cases }) => (
              <tr key={`${oil ?? '-'}|${mesh ?? ''}`}>
                <th scope="row">{oil ?? '(no oil)'}</th>
                {mesh ? <td>{mesh}</td> : null}
                {loadCases.map((lc) => {
                  const c = cases.find((x) => x.loadCase === lc && x.oil === oil);
                  if (!c) return <td key={lc}>—</td>;
                  return (
                    <td key={lc} className={`band--${c.verdict?.code ?? 'none'}`} data-testid="sbs-cell">
                      <dl className="sbs__cell">
                        <dt>λmin</dt>
                        <dd><Quantity def="lambdaMin" value={c.lambdaMin} units={units} sig={2} testId="sbs-lambda" /></dd>
                        <dt>SB</dt>
                        <dd><Quantity def="scuffingSafety" value={c.scuffingSafety} units={units} sig={3} testId="sbs-sb" /></dd>
                        <dt>SintS</dt>
                        <dd><Quantity def="integralSafety" value={c.integralSafety} units={units} sig={3} testId="sbs-sints" /></dd>
                        <dt>FZG needed</dt>
                        <dd><Quantity def="requiredFzgStage" value={c.requiredFzgStage === null ? null : String(c.requiredFzgStage)} units={units} testId="sbs-fzg" /></dd>
                        <dt>FZG needed, integral</dt>
                        <dd><Quantity def="requiredFzgStageIntegral" value={c.requiredFzgStageIntegral === null ? null : String(c.requiredFzgStageIntegral)} units={units} testId="sbs-fzg-int" /></dd>
                      </dl>
                      {c.verdict ? <VerdictBadge code={c.verdict.code} compact /> : null}
                    </td>
                  );
                })}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <GradeFinder results={results} />
    </Panel>
  );
}

/** Re-renders only when its results or units change, not on every keystroke in the inputs. */
export const SideBySidePanel = memo(SideBySidePanelView);

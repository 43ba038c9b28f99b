import { memo } from 'react';
import type { CaseResult, LimitCheck, Results } from '../../../app/review/results';
import { MESH_WORDS } from '../../../app/review/vocabulary';
import type { UnitSystem } from '../../units/units';
import { Quantity } from '../Quantity';
import { VerdictBadge } from '../VerdictBadge';
import { micropittingWords } from '../mesh/MeshPanel';
import { GradeFinder } from './GradeFinder';
import { Panel } from './Panel';

const stage = (s: number | '>12' | null) => (s === null ? '—' : s === '>12' ? 'above 12' : String(s));
const checkOf = (c: CaseResult, q: LimitCheck['quantity']) => c.verdict?.checks.find((k) => k.quantity === q) ?? null;

/** Pass or fail beside a figure, as a word and a shape (never colour alone). */
function Mark({ check: k }: { readonly check: LimitCheck | null }) {
  if (!k || k.pass === null) return null;
  return (
    <span className={`mark mark--${k.pass ? 'pass' : 'fail'}`} title={`${k.symbol} ${k.pass ? '≥' : '<'} ${k.limit} (policy)`}>
      <span aria-hidden="true">{k.pass ? '✓' : '✗'}</span> {k.pass ? 'pass' : 'fail'}
    </span>
  );
}

/**
 * Oils (rows) × load cases (columns): λmin, SB, SintS against their limits, the FZG stage needed and
 * what the case needs. On a planetary stage each oil has a row per mesh, with a mesh column.
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
                    <td key={lc} data-testid="sbs-cell">
                      <dl className="sbs__cell">
                        <dt>λmin</dt>
                        <dd><Quantity def="lambdaMin" value={c.lambdaMin} units={units} sig={3} testId="sbs-lambda" /> <Mark check={checkOf(c, 'lambdaMin')} /></dd>
                        {checkOf(c, 'scuffingSafety') ? (
                          <>
                            <dt>SB</dt>
                            <dd><Quantity def="scuffingSafety" value={c.scuffingSafety} units={units} sig={3} testId="sbs-sb" /> <Mark check={checkOf(c, 'scuffingSafety')} /></dd>
                          </>
                        ) : null}
                        {checkOf(c, 'integralSafety') ? (
                          <>
                            <dt>SintS</dt>
                            <dd><Quantity def="integralSafety" value={c.integralSafety} units={units} sig={3} testId="sbs-sints" /> <Mark check={checkOf(c, 'integralSafety')} /></dd>
                          </>
                        ) : null}
                        <dt>FZG needed</dt>
                        <dd data-testid="sbs-fzg">{stage(c.verdict?.neededFzgStage ?? c.requiredFzgStage)}</dd>
                        <dt>flash · integral</dt>
                        <dd data-testid="sbs-fzg-methods">{stage(c.requiredFzgStage)} · {stage(c.requiredFzgStageIntegral)}</dd>
                        <dt>Sλ micropitting</dt>
                        <dd><Quantity def="micropittingSafety" value={c.micropitting?.safety ?? null} units={units} sig={3} testId="sbs-micropitting" /> <Quantity def="micropittingFinding" value={micropittingWords(c)} units={units} testId="sbs-micropitting-finding" /></dd>
                        <dt>Micropitting stage needed</dt>
                        <dd><Quantity def="requiredMicropittingStage" value={c.micropitting ? (c.micropitting.requiredFailureStage === '>10' ? 'above 10' : String(c.micropitting.requiredFailureStage)) : null} units={units} testId="sbs-micropitting-stage" /></dd>
                      </dl>
                      {c.verdict ? (
                        <p className="sbs__need">
                          <span className="note">Needs</span> <VerdictBadge code={c.verdict.code} compact />
                        </p>
                      ) : null}
                    </td>
                  );
                })}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <GradeFinder results={results} target={results.cases.flatMap((c) => c.verdict?.checks ?? []).find((k) => k.quantity === 'lambdaMin')?.limit ?? 1} />
    </Panel>
  );
}

/** Re-renders only when its results or units change, not on every keystroke in the inputs. */
export const SideBySidePanel = memo(SideBySidePanelView);

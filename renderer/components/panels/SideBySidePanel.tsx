import { memo } from 'react';
import type { Results } from '../../../app/review/results';
import type { UnitSystem } from '../../units/units';
import { Quantity } from '../Quantity';
import { VerdictBadge } from '../VerdictBadge';
import { micropittingWords } from '../mesh/MeshPanel';
import { GradeFinder } from './GradeFinder';
import { Panel } from './Panel';

/** Oils (rows) × load cases (columns): λmin, SB, SintS, FZG stage needed, micropitting Sλ and the verdict. */
function SideBySidePanelView({ results, units }: { readonly results: Results | null; readonly units: UnitSystem }) {
  if (!results) return <Panel id="side-by-side" title="Side by side"><p className="note">No results yet.</p></Panel>;
  const loadCases = [...new Set(results.cases.map((c) => c.loadCase))];
  const oils = [...new Set(results.cases.map((c) => c.oil))];
  return (
    <Panel id="side-by-side" title="Side by side">
      <div className="table-scroll" tabIndex={0} role="region" aria-label="Oils by load cases">
        <table className="sbs">
          <caption className="sr-only">Oils by load cases: λmin, SB, SintS, FZG stage needed and verdict</caption>
          <thead>
            <tr>
              <th scope="col">Oil</th>
              {loadCases.map((lc) => (
                <th key={lc} scope="col">
                  {lc}
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {oils.map((oil) => (
              <tr key={oil ?? '-'}>
                <th scope="row">{oil ?? '(no oil)'}</th>
                {loadCases.map((lc) => {
                  const c = results.cases.find((x) => x.loadCase === lc && x.oil === oil);
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
                        <dt>Sλ micropitting</dt>
                        <dd><Quantity def="micropittingSafety" value={c.micropitting?.safety ?? null} units={units} sig={3} testId="sbs-micropitting" /> <Quantity def="micropittingFinding" value={micropittingWords(c)} units={units} testId="sbs-micropitting-finding" /></dd>
                        <dt>Micropitting stage needed</dt>
                        <dd><Quantity def="requiredMicropittingStage" value={c.micropitting ? (c.micropitting.requiredFailureStage === '>10' ? 'above 10' : String(c.micropitting.requiredFailureStage)) : null} units={units} testId="sbs-micropitting-stage" /></dd>
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

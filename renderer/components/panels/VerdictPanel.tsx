import { memo } from 'react';
import type { CaseResult, Results } from '../../../app/review/results';
import type { UnitSystem } from '../../units/units';
import { ChangeCard } from '../verdict/ChangeCard';
import { CautionSummaryList } from '../verdict/CautionSummaryList';
import { NeedCard } from '../verdict/NeedCard';
import { OilFindingHead } from '../verdict/OilFindingHead';
import { CaseVerdictCard } from './CaseVerdictCard';
import { Panel } from './Panel';

/**
 * The change findings first, then what the duty needs (once), then each oil's finding against it
 * with its cases, and every caution once at the end.
 */
function VerdictPanelView({ results, units }: { readonly results: Results | null; readonly units: UnitSystem }) {
  if (!results) {
    return (
      <Panel id="verdict" title="Verdict">
        <p className="note">No results yet.</p>
      </Panel>
    );
  }
  const byOil = new Map<string, CaseResult[]>();
  for (const c of results.cases) {
    const k = c.oil ?? '(no oil)';
    byOil.set(k, [...(byOil.get(k) ?? []), c]);
  }
  // A planetary stage: each oil's cases are those of the mesh that governs for it.
  for (const g of results.planetary?.governingMesh ?? []) {
    const cases = results.meshes?.find((m) => m.mesh === g.mesh)?.cases.filter((c) => c.oil === g.oil);
    if (cases?.length) byOil.set(g.oil, cases);
  }
  const caseCount = new Set(results.cases.map((c) => c.loadCase)).size;
  return (
    <Panel id="verdict" title="Verdict">
      {results.changes.map((ch) => (
        <ChangeCard key={ch.to} change={ch} />
      ))}
      {results.need ? <NeedCard need={results.need} /> : <p className="note">Add an oil to see what the duty needs and whether the oil meets it.</p>}
      <div className="verdict-oils">
        {[...byOil.entries()].map(([oil, cases], oi) => {
          const overall = results.verdicts.find((v) => v.oil === oil);
          return (
            <article key={oil} className="verdict-oil" data-testid={`verdict-oil-${oi}`} aria-label={`Finding for ${oil}`}>
              <header className="verdict-oil__head">
                <h3>{oil}</h3>
                {overall ? <OilFindingHead verdict={overall} /> : null}
              </header>
              {cases.map((c) => (
                <CaseVerdictCard key={c.loadCase} result={c} units={units} governing={c.loadCase === overall?.governingLoadCase} />
              ))}
            </article>
          );
        })}
      </div>
      {results.cautions.length ? <CautionSummaryList cautions={results.cautions} caseCount={caseCount} units={units} /> : <p className="note">{DEFER}</p>}
    </Panel>
  );
}

const DEFER = "This review is an engineering aid, not an approval: follow the gearbox maker's lubricant list, local codes and the judgement of a licensed engineer.";

/** Re-renders only when its results or units change, not on every keystroke in the inputs. */
export const VerdictPanel = memo(VerdictPanelView);

import { memo } from 'react';
import type { CaseResult, Caution, Results } from '../../../app/review/results';
import type { UnitSystem } from '../../units/units';
import { formatPercent } from '../../units/format';
import { Quantity } from '../Quantity';
import { VerdictBadge } from '../VerdictBadge';
import { CaseVerdictCard } from './CaseVerdictCard';
import { CautionList } from './CautionList';
import { Panel } from './Panel';

/** Cautions every case of the oil carries are shown once, at the oil; the rest at their case. */
function sharedCautions(cases: readonly CaseResult[]): Caution[] {
  const [first, ...rest] = cases.map((c) => c.verdict?.cautions ?? []);
  return (first ?? []).filter((k) => rest.every((list) => list.some((x) => x.id === k.id)));
}

/** Per oil: the overall verdict and its governing case, then each load case's verdict with reasons and cautions. */
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
  return (
    <Panel id="verdict" title="Verdict">
      <div className="verdict-oils">
        {[...byOil.entries()].map(([oil, cases], oi) => {
          const overall = results.verdicts.find((v) => v.oil === oil);
          const shared = sharedCautions(cases);
          const sharedIds = new Set(shared.map((k) => k.id));
          return (
            <article key={oil} className={`verdict-oil band--${overall?.code ?? 'none'}`} data-testid={`verdict-oil-${oi}`} aria-label={`Verdict for ${oil}`}>
              <header className="verdict-oil__head">
                <h3>{oil}</h3>
                {overall ? (
                  <>
                    <VerdictBadge code={overall.code} />
                    <p className="verdict-oil__fit" data-testid="oil-fit">
                      {overall.oilFit === 'meets' ? 'This oil meets the need' : 'This oil falls short of the need'} · governing case: <strong data-testid="governing-case">{overall.governingLoadCase}</strong> ·{' '}
                      <Quantity def="dutyShareMet" value={formatPercent(overall.dutyShareMet)} units={units} withSymbol />
                    </p>
                    <p className="verdict-oil__summary">{overall.summary}</p>
                  </>
                ) : null}
                <CautionList cautions={shared} label={`Cautions for ${oil}`} />
              </header>
              {cases.map((c) => (
                <CaseVerdictCard key={c.loadCase} result={c} units={units} governing={c.loadCase === overall?.governingLoadCase} skipCautions={sharedIds} />
              ))}
            </article>
          );
        })}
      </div>
    </Panel>
  );
}

/** Re-renders only when its results or units change, not on every keystroke in the inputs. */
export const VerdictPanel = memo(VerdictPanelView);

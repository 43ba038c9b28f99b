import type { CaseResult } from '../../../app/review/results';
import type { UnitSystem } from '../../units/units';
import { Quantity } from '../Quantity';
import { VerdictBadge } from '../VerdictBadge';
import { reasonInDisplayUnits } from '../../units/inText';
import { CheckChip } from '../verdict/CheckChip';
import { pathsInWords } from '../../../app/review/pathWords';

interface Props {
  readonly result: CaseResult;
  readonly units: UnitSystem;
  /** The governing case shows its reasons unfolded. */
  readonly governing: boolean;
}

/** One load case × oil: what the case needs, the oil's figures against their limits, and the chain of reasons with sources. */
export function CaseVerdictCard({ result: c, units, governing }: Props) {
  const v = c.verdict;
  return (
    <section className="case-verdict" aria-label={`${c.loadCase}, ${c.oil ?? 'no oil'}`} data-testid="case-verdict">
      <header className="case-verdict__head">
        <h4>{c.loadCase}</h4>
        {v ? (
          <span className="case-verdict__need">
            <span className="note">The case needs:</span> <VerdictBadge code={v.code} compact />
          </span>
        ) : (
          <span className="note">No verdict without an oil</span>
        )}
      </header>
      {v ? (
        <p className="case-verdict__checks" aria-label="Figures against their limits">
          {v.checks.map((k) => (
            <CheckChip key={k.quantity} check={k} />
          ))}
        </p>
      ) : null}
      <p className="case-verdict__figures">
        <Quantity def="maxHertzStress" value={c.maxHertzStress_MPa} units={units} sig={4} withSymbol testId="max-hertz" /> ·{' '}
        <Quantity def="maxContactTemperature" value={c.maxContactTemperature_C} units={units} sig={4} withSymbol /> ·{' '}
        {c.scuffingTemperatureAtLeast ? (
          <span className="note">θS: above stage 12: not limiting</span>
        ) : (
          <Quantity def="scuffingTemperature" value={c.scuffingTemperature_C} units={units} sig={4} withSymbol />
        )}
      </p>
      {v && v.reasons.length ? (
        <details className="reasons-box" open={governing}>
          <summary>
            Reasons ({v.reasons.length}){governing ? ' — governing case' : ''}
          </summary>
          <ol className="reasons" aria-label="Reasons">
            {v.reasons.map((reason) => {
              const r = reasonInDisplayUnits(reason, units);
              return (
                <li key={r.rule}>
                  {r.text} <span className="reason__meta">Threshold: {r.threshold}. Source: {r.source}.</span>
                </li>
              );
            })}
          </ol>
        </details>
      ) : null}
      {c.warnings.length ? (
        <ul className="warnings" aria-label="Engine warnings">
          {c.warnings.map((w) => (
            <li key={`${w.code}|${w.field}`} className={`note note--${w.severity}`}>
              {pathsInWords(w.message)}
            </li>
          ))}
        </ul>
      ) : null}
    </section>
  );
}

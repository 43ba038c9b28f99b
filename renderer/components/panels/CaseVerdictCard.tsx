import type { CaseResult } from '../../../app/review/results';
import type { UnitSystem } from '../../units/units';
import { Quantity } from '../Quantity';
import { VerdictBadge } from '../VerdictBadge';
import { CautionList } from './CautionList';

interface Props {
  readonly result: CaseResult;
  readonly units: UnitSystem;
  /** The governing case shows its reasons unfolded. */
  readonly governing: boolean;
  /** Cautions already shown at the oil. */
  readonly skipCautions: ReadonlySet<string>;
}

/** One load case × oil: the verdict, its chain of reasons with numbers and sources, and the cautions. */
export function CaseVerdictCard({ result: c, units, governing, skipCautions }: Props) {
  const v = c.verdict;
  return (
    <section className={`case-verdict band--${v?.code ?? 'none'}`} aria-label={`${c.loadCase}, ${c.oil ?? 'no oil'}`} data-testid="case-verdict">
      <header className="case-verdict__head">
        <h4>{c.loadCase}</h4>
        {v ? <VerdictBadge code={v.code} compact /> : <span className="note">No verdict without an oil</span>}
      </header>
      <p className="case-verdict__figures">
        <Quantity def="maxHertzStress" value={c.maxHertzStress_MPa} units={units} sig={4} withSymbol testId="max-hertz" /> ·{' '}
        <Quantity def="lambdaMin" value={c.lambdaMin} units={units} sig={2} withSymbol /> ·{' '}
        <Quantity def="scuffingSafety" value={c.scuffingSafety} units={units} sig={3} withSymbol /> ·{' '}
        <Quantity def="integralSafety" value={c.integralSafety} units={units} sig={3} withSymbol /> ·{' '}
        <Quantity def="maxContactTemperature" value={c.maxContactTemperature_C} units={units} sig={3} withSymbol /> ·{' '}
        <Quantity def="scuffingTemperature" value={c.scuffingTemperature_C} units={units} sig={3} withSymbol />
        {c.scuffingTemperatureAtLeast ? ' (at least)' : ''}
      </p>
      {v && v.reasons.length ? (
        <details className="reasons-box" open={governing}>
          <summary>
            Reasons ({v.reasons.length}){governing ? ' — governing case' : ''}
          </summary>
          <ol className="reasons" aria-label="Reasons">
            {v.reasons.map((r) => (
              <li key={r.rule} data-rule={r.rule}>
                {r.text} <span className="reason__meta">Threshold: {r.threshold}. Source: {r.source}.</span>
              </li>
            ))}
          </ol>
        </details>
      ) : null}
      {v ? <CautionList cautions={v.cautions.filter((k) => !skipCautions.has(k.id))} label={`Cautions for ${c.loadCase}`} /> : null}
      {c.warnings.length ? (
        <ul className="warnings" aria-label="Engine warnings">
          {c.warnings.map((w) => (
            <li key={`${w.code}|${w.field}`} className={`note note--${w.severity}`}>
              {w.message}
            </li>
          ))}
        </ul>
      ) : null}
    </section>
  );
}

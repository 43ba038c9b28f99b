import type { CautionSummary } from '../../../app/review/results';
import { inDisplayUnits } from '../../units/inText';
import type { UnitSystem } from '../../units/units';

const where = (k: CautionSummary) => {
  const cases = [...new Set(k.appliesTo.map((a) => a.loadCase))];
  const oils = [...new Set(k.appliesTo.map((a) => a.oil))];
  return `${cases.length} of the load cases (${cases.join(', ')}); oils: ${oils.join(', ')}`;
};

/** Every caution once: those the inputs trigger, with where they apply; the standing rest folded. */
export function CautionSummaryList({ cautions, caseCount, units = 'si' }: { readonly cautions: readonly CautionSummary[]; readonly caseCount: number; readonly units?: UnitSystem }) {
  const applying = cautions.filter((k) => k.applies);
  const standing = cautions.filter((k) => !k.applies);
  return (
    <section className="caution-summary" aria-label="Cautions" data-testid="cautions">
      <h3>Cautions</h3>
      <ul className="cautions">
        {applying.map((k) => (
          <li key={k.id} className="caution caution--triggered" data-caution={k.id}>
            <span aria-hidden="true" className="caution__icon">⚠</span>
            <span>
              {inDisplayUnits(k.text, units)}
              {k.id !== 'defer' && new Set(k.appliesTo.map((a) => a.loadCase)).size < caseCount ? <span className="caution__where"> Applies to {where(k)}.</span> : null}
            </span>
          </li>
        ))}
      </ul>
      {standing.length ? (
        <details className="caution-standing" data-testid="standing-cautions">
          <summary>Not triggered by these inputs ({standing.length})</summary>
          <ul className="cautions cautions--standing">
            {standing.map((k) => (
              <li key={k.id} className="caution caution--standing" data-caution={k.id}>
                <span>
                  <strong>{k.title}.</strong> {inDisplayUnits(k.text, units)}
                </span>
              </li>
            ))}
          </ul>
        </details>
      ) : null}
    </section>
  );
}

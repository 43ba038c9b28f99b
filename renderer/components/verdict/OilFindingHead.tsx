import type { OverallVerdict } from '../../../app/review/results';
import { SHORTFALL_ORDER, SHORTFALL_SHORT } from '../../../app/review/vocabulary';
import { CheckChip } from './CheckChip';

const stage = (s: number | '>12') => (s === '>12' || s > 12 ? 'above 12' : String(s));

/** An oil's plain finding against the need: meets it, or short on chemistry / FZG stage / film; its own stage and chemistry beside what is needed. */
export function OilFindingHead({ verdict: v }: { readonly verdict: OverallVerdict }) {
  const meets = v.oilFit === 'meets';
  const beyond = v.code === 'beyond-oil';
  const word = beyond ? 'No oil gives the margin' : meets ? 'Meets the need' : `Short on ${SHORTFALL_ORDER.filter((s) => v.shortfalls.includes(s)).map((s) => SHORTFALL_SHORT[s]).join(', ')}`;
  return (
    <div className="oil-finding">
      <span className={`fbadge fbadge--${beyond ? 'beyond' : meets ? 'meets' : 'short'}`} data-testid="oil-finding" data-fit={v.oilFit}>
        <span aria-hidden="true">{beyond ? '✗' : meets ? '✓' : '!'}</span> {word}
      </span>
      <dl className="oil-finding__facts">
        <dt>FZG stage</dt>
        <dd data-testid="oil-stage">
          {stage(v.oilFzgStage)} offered, {stage(v.neededFzgStage)} needed
        </dd>
        <dt>Chemistry</dt>
        <dd>{v.oilChemistry}</dd>
        <dt>Governing case</dt>
        <dd data-testid="governing-case">{v.governingLoadCase}</dd>
      </dl>
      <p className="oil-finding__checks" aria-label="Worst figures against their limits">
        {v.checks.map((k) => (
          <CheckChip key={k.quantity} check={k} suffix={k.loadCase} />
        ))}
      </p>
    </div>
  );
}

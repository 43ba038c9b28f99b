import type { DutyNeed } from '../../../app/review/results';
import { METHODS_WORDS } from '../../../app/review/vocabulary';
import { VerdictBadge } from '../VerdictBadge';

const CHEMISTRY_NEED_SHORT: Readonly<Record<DutyNeed['chemistry'], string>> = {
  'r-and-o': 'R&O is enough',
  'anti-wear': 'Anti-wear at least',
  'extreme-pressure': 'EP',
  'beyond-oil': 'No oil in scope gives the margin',
};
const stage = (s: number | '>12' | null) => (s === null ? '—' : s === '>12' ? 'above 12' : String(s));

/** What the duty needs, stated once, apart from what any oil offers. */
export function NeedCard({ need }: { readonly need: DutyNeed }) {
  return (
    <section className={`need band--${need.code}`} aria-label="What the duty needs" data-testid="duty-need">
      <header className="need__head">
        <h3>What the duty needs</h3>
        <VerdictBadge code={need.code} />
      </header>
      <dl className="need__facts">
        <dt>Chemistry</dt>
        <dd data-testid="need-chemistry" title={need.chemistryReason}>
          {CHEMISTRY_NEED_SHORT[need.chemistry]}
        </dd>
        {need.fzgStageFlash !== null ? (
          <>
            <dt>FZG stage, flash method</dt>
            <dd data-testid="need-fzg-flash">{stage(need.fzgStageFlash)}</dd>
          </>
        ) : null}
        {need.fzgStageIntegral !== null ? (
          <>
            <dt>FZG stage, integral method</dt>
            <dd data-testid="need-fzg-integral">{stage(need.fzgStageIntegral)}</dd>
          </>
        ) : null}
        <dt>Lowest ISO VG for the λ target</dt>
        <dd data-testid="need-vg">{need.isoVG === null ? 'none in range' : `VG ${need.isoVG}`}</dd>
        <dt>Governing case</dt>
        <dd data-testid="need-governing-case">{need.governingLoadCase}</dd>
        <dt>Methods</dt>
        <dd>{METHODS_WORDS[need.methods]}</dd>
      </dl>
      <p className="need__statement">{need.statement}</p>
    </section>
  );
}

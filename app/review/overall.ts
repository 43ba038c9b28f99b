import type { CaseResult, OverallVerdict, Shortfall, VerdictCode } from './results';
import type { Review } from './schema';
import { VERDICT_WORDS } from './vocabulary';

const SEVERITY: Record<VerdictCode, number> = { 'aw-suffices': 0, 'ep-warranted': 1, 'beyond-oil': 2 };
const WORDS = VERDICT_WORDS;
const SHORTFALL_ORDER: readonly Shortfall[] = ['chemistry', 'fzg-stage', 'film'];
const SHORTFALL_WORDS: Record<Shortfall, string> = {
  chemistry: 'chemistry',
  'fzg-stage': 'its FZG stage',
  film: 'film thickness (λ below target: a viscosity-grade matter)',
};

/**
 * The verdict per oil across the load cases. A safety decision is not averaged away: the code is
 * the most severe over the cases that run at all (time share > 0), and that case governs (ties:
 * the larger time share). The time shares weight how much of the duty the oil meets.
 */
export function overallVerdicts(review: Review, cases: readonly CaseResult[]): OverallVerdict[] {
  const out: OverallVerdict[] = [];
  for (const oil of review.oils) {
    const mine = cases
      .map((c, i) => ({ c, share: review.loadCases[Math.floor(i / review.oils.length)]?.timeShare ?? 0 }))
      .filter(({ c }) => c.oil === oil.name && c.verdict !== null);
    if (mine.length === 0) continue;
    let gov = mine[0] as (typeof mine)[number];
    for (const x of mine) {
      const a = SEVERITY[(x.c.verdict as NonNullable<CaseResult['verdict']>).code];
      const b = SEVERITY[(gov.c.verdict as NonNullable<CaseResult['verdict']>).code];
      if (a > b || (a === b && x.share > gov.share)) gov = x;
    }
    const total = mine.reduce((s, x) => s + x.share, 0);
    const met = mine.filter((x) => x.c.verdict?.oilFit === 'meets').reduce((s, x) => s + x.share, 0);
    const code = (gov.c.verdict as NonNullable<CaseResult['verdict']>).code;
    const fit = mine.every((x) => x.c.verdict?.oilFit === 'meets') ? 'meets' : 'falls-short';
    const shortfalls = SHORTFALL_ORDER.filter((s) => mine.some((x) => x.c.verdict?.shortfalls.includes(s)));
    const short = total > 0 ? 1 - met / total : 1;
    out.push({
      oil: oil.name,
      code,
      oilFit: fit,
      governingLoadCase: gov.c.loadCase,
      dutyShareMet: total > 0 ? met / total : 0,
      shortfalls,
      summary:
        code === 'beyond-oil'
          ? `${WORDS[code]} (governing case: ${gov.c.loadCase}): no oil in scope gives the margin; change the design or the duty.`
          : `${WORDS[code]} (governing case: ${gov.c.loadCase}); this oil ${fit === 'meets' ? 'meets the need' : `falls short on ${shortfalls.map((s) => SHORTFALL_WORDS[s]).join(', ')} for ${(100 * short).toFixed(0)} % of the duty by time share`}.`,
    });
  }
  return out;
}

import { CHEMISTRY_WORDS } from '../engine/verdict/words';
import { micropittingNeedWords, micropittingStageNumber, micropittingStageWords } from './micropittingResult';
import type { CaseResult, ChemistryNeed, FzgStageNeeded, LimitCheck, MicropittingFinding, MicropittingStageNeeded, OverallVerdict, Shortfall } from './results';
import type { Review } from './schema';
import { SHORTFALL_ORDER, VERDICT_WORDS } from './vocabulary';
import { governingCase } from './margin';

const WORDS = VERDICT_WORDS;
export const SHORTFALL_WORDS: Readonly<Record<Shortfall, string>> = {
  chemistry: 'chemistry',
  'fzg-stage': 'its FZG stage',
  film: 'film thickness (λ below target: a viscosity-grade matter)',
  micropitting: 'micropitting (a higher micropitting class is needed)',
};
const CHEMISTRY_NEED_ORDER: readonly ChemistryNeed[] = ['r-and-o', 'anti-wear', 'extreme-pressure', 'beyond-oil'];

export const stageNumber = (s: FzgStageNeeded | null): number => (s === null ? 0 : s === '>12' ? 13 : s);
export const stageOf = (n: number): FzgStageNeeded => (n > 12 ? '>12' : n);
export const stageWords = (s: FzgStageNeeded | number): string => (s === '>12' || (typeof s === 'number' && s > 12) ? 'above 12' : String(s));

/** The most demanding chemistry class among `needs`. */
export function mostDemandingChemistry(needs: readonly ChemistryNeed[]): ChemistryNeed {
  let k = 0;
  for (const n of needs) k = Math.max(k, CHEMISTRY_NEED_ORDER.indexOf(n));
  return CHEMISTRY_NEED_ORDER[k] as ChemistryNeed;
}

/** The load cases of `review` with one oil, with each case's time share. */
export function casesOfOil(review: Review, cases: readonly CaseResult[], oil: string): Array<{ c: CaseResult; share: number }> {
  return cases
    .map((c, i) => ({ c, share: review.loadCases[Math.floor(i / Math.max(1, review.oils.length))]?.timeShare ?? 0 }))
    .filter(({ c }) => c.oil === oil && c.verdict !== null);
}

const FINDING_SEVERITY: Readonly<Record<MicropittingFinding, number>> = { meets: 0, unknown: 1, short: 2 };

/** The worst micropitting finding over the cases (short, then unknown, then meets) and the highest stage needed. */
export function micropittingOverCases(mine: ReadonlyArray<{ c: CaseResult }>): { finding: MicropittingFinding; needed: MicropittingStageNeeded | null } {
  let finding: MicropittingFinding = 'meets';
  let needed = 0;
  for (const { c } of mine) {
    const f = c.verdict?.micropitting ?? 'unknown';
    if (FINDING_SEVERITY[f] > FINDING_SEVERITY[finding]) finding = f;
    needed = Math.max(needed, micropittingStageNumber(c.micropitting?.requiredFailureStage ?? null));
  }
  return { finding, needed: needed === 0 ? null : needed > 10 ? '>10' : needed };
}

/** The worst value of each limit check over the cases (the least value against its limit). */
function worstChecks(mine: ReadonlyArray<{ c: CaseResult }>): Array<LimitCheck & { loadCase: string }> {
  // The worst check and its case per quantity; the one object per quantity is made at the end.
  const worst = new Map<LimitCheck['quantity'], { k: LimitCheck; loadCase: string }>();
  for (const { c } of mine) {
    for (const k of c.verdict?.checks ?? []) {
      const prev = worst.get(k.quantity)?.k;
      const lower = prev === undefined || (k.value !== null && (prev.value === null || k.value < prev.value));
      if (lower) worst.set(k.quantity, { k, loadCase: c.loadCase });
    }
  }
  return [...worst.values()].map(({ k, loadCase }) => ({ ...k, loadCase }));
}

/**
 * The verdict per oil across the load cases. A safety decision is not averaged away: the code is
 * the most severe over the cases, and among the cases with that code the one with the least
 * scuffing margin (safety / policy minimum, over the methods in use) governs. The time shares
 * weight how much of the duty the oil meets.
 */
export function overallVerdicts(review: Review, cases: readonly CaseResult[]): OverallVerdict[] {
  const out: OverallVerdict[] = [];
  for (const oil of review.oils) {
    const mine = casesOfOil(review, cases, oil.name);
    const gov = governingCase(mine, review.policy);
    if (gov === null) continue;
    const gv = gov.c.verdict as NonNullable<CaseResult['verdict']>;
    const total = mine.reduce((s, x) => s + x.share, 0);
    const met = mine.filter((x) => x.c.verdict?.oilFit === 'meets').reduce((s, x) => s + x.share, 0);
    const code = gv.code;
    const fit = mine.every((x) => x.c.verdict?.oilFit === 'meets') ? 'meets' : 'falls-short';
    const shortfalls = SHORTFALL_ORDER.filter((s) => mine.some((x) => x.c.verdict?.shortfalls.includes(s)));
    const short = total > 0 ? 1 - met / total : 1;
    const needed = stageOf(Math.max(...mine.map((x) => stageNumber(x.c.verdict?.neededFzgStage ?? null))));
    const mp = micropittingOverCases(mine);
    const mpStage = oil.micropittingFailureStage ?? null;
    const mpWords =
      mp.finding === 'unknown'
        ? `; micropitting failure stage not given${mp.needed !== null ? ` (${micropittingNeedWords(mp.needed)} needed)` : ''}`
        : mp.finding === 'meets' && mpStage !== null && mp.needed !== null
          ? `, micropitting failure stage ${micropittingStageWords(mpStage)} against ${micropittingNeedWords(mp.needed)} needed`
          : '';
    out.push({
      oil: oil.name,
      code,
      oilFit: fit,
      governingLoadCase: gov.c.loadCase,
      governingMethod: gv.governingMethod,
      neededFzgStage: needed,
      oilFzgStage: oil.fzgFailureStage,
      chemistryNeed: mostDemandingChemistry(mine.map((x) => x.c.verdict?.chemistryNeed ?? 'r-and-o')),
      oilChemistry: CHEMISTRY_WORDS[oil.chemistry],
      micropitting: mp.finding,
      neededMicropittingStage: mp.needed,
      oilMicropittingStage: mpStage,
      checks: worstChecks(mine),
      dutyShareMet: total > 0 ? met / total : 0,
      shortfalls,
      summary:
        code === 'beyond-oil'
          ? `${WORDS[code]} (governing case: ${gov.c.loadCase}): no oil in scope gives the margin; change the design or the duty.`
          : fit === 'meets'
            ? `Meets the need in every load case: FZG stage ${stageWords(oil.fzgFailureStage)} against ${stageWords(needed)} needed, ${CHEMISTRY_WORDS[oil.chemistry]} chemistry${mpWords}.`
            : `Short on ${shortfalls.map((s) => SHORTFALL_WORDS[s]).join(', ')} for ${(100 * short).toFixed(0)} % of the duty by time share (governing case: ${gov.c.loadCase}).`,
    });
  }
  return out;
}

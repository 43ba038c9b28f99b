import { METHOD_WORDS } from '../engine/verdict/words';
import { governingCase } from './margin';
import { micropittingOverCases, mostDemandingChemistry, stageNumber, stageOf, stageWords } from './overall';
import { micropittingNeedWords } from './micropittingResult';
import type { CaseResult, ChemistryNeed, DutyNeed, GradeFinderResult } from './results';
import type { Review } from './schema';
import { CANDIDATE_GRADES } from './gradeFinder';

const capitalise = (s: string) => s.charAt(0).toUpperCase() + s.slice(1);

export const CHEMISTRY_NEED_WORDS: Readonly<Record<ChemistryNeed, string>> = {
  'r-and-o': 'R&O chemistry is enough',
  'anti-wear': 'anti-wear chemistry at least',
  'extreme-pressure': 'EP chemistry',
  'beyond-oil': 'a design or duty change: no oil in scope gives the margin',
};

/**
 * What the duty needs, stated once and apart from what any oil offers: the chemistry class, the
 * FZG A/8.3/90 stage by each method in use, the lowest ISO VG for the λ target, the micropitting
 * failure stage (ISO/TS 6336-22), and the governing
 * case and method. Friction and film depend a little on the oil, so each figure is the most
 * demanding over the oils reviewed (each oil's own need stands in its verdict).
 */
export function dutyNeed(review: Review, cases: readonly CaseResult[], grades: readonly GradeFinderResult[]): DutyNeed | null {
  const withVerdict = cases
    .map((c, i) => ({ c, share: review.loadCases[Math.floor(i / Math.max(1, review.oils.length))]?.timeShare ?? 0 }))
    .filter((x) => x.c.verdict !== null);
  const gov = governingCase(withVerdict, review.policy);
  if (gov === null) return null;
  const methods = review.policy.scuffingMethods;
  const maxStage = (pick: (c: CaseResult) => number) => stageOf(Math.max(...withVerdict.map((x) => pick(x.c))));
  const flash = methods === 'integral' ? null : maxStage((c) => stageNumber(c.requiredFzgStage));
  const integral = methods === 'flash' ? null : maxStage((c) => stageNumber(c.requiredFzgStageIntegral));
  const chemistry = mostDemandingChemistry(withVerdict.map((x) => x.c.verdict?.chemistryNeed ?? 'r-and-o'));
  const vgs = grades.map((g) => g.recommendedVG);
  const isoVG = vgs.length > 0 && vgs.every((v): v is number => v !== null) ? Math.max(...vgs) : null;
  const mp = micropittingOverCases(withVerdict).needed;
  const mpPart = mp !== null ? `; against micropitting, an oil of FVA 54 failure stage ${micropittingNeedWords(mp)} for Sλ ≥ ${review.policy.micropittingSafetyMin} (a matter of the additive system, not of EP)` : '';
  const gv = gov.c.verdict as NonNullable<CaseResult['verdict']>;
  const stagePart = [flash !== null ? `FZG stage ${stageWords(flash)} by the flash temperature method` : null, integral !== null ? `${stageWords(integral)} by the integral temperature method` : null]
    .filter((x): x is string => x !== null)
    .join(' and ');
  // The heaviest grade offered is the one the lubrication method can use at the cases' speeds.
  const topVG = Math.min(CANDIDATE_GRADES[CANDIDATE_GRADES.length - 1] ?? Infinity, ...grades.map((g) => g.usableMaxVG));
  const vgPart = isoVG !== null ? `ISO VG ${isoVG} at least for λmin ≥ ${review.policy.lambdaTarget}` : `no ISO VG up to ${topVG} (the heaviest the lubrication method can use) reaches λmin ≥ ${review.policy.lambdaTarget}`;
  const needed = Math.max(stageNumber(flash), stageNumber(integral));
  const p = review.policy;
  const chemistryReason =
    chemistry === 'beyond-oil'
      ? `the FZG stage needed, ${stageWords(needed)}, is above the EP floor of ${p.epOilFzgStage}, or the integral method fails even there`
      : chemistry === 'extreme-pressure'
        ? needed > p.antiWearOilFzgStage
          ? `FZG stage ${stageWords(needed)} is needed, above the anti-wear floor of ${p.antiWearOilFzgStage}`
          : `shock duty, KA at or above ${p.shockApplicationFactor}, in the boundary regime, whatever the scuffing margin, as common practice asks`
        : chemistry === 'anti-wear'
          ? 'boundary lubrication: a tribofilm must carry the asperity contacts'
          : 'neither the film nor the scuffing margin asks for more than an R&O oil';
  return {
    code: gv.code,
    chemistry,
    chemistryReason,
    fzgStageFlash: flash,
    fzgStageIntegral: integral,
    isoVG,
    micropittingStage: mp,
    governingLoadCase: gov.c.loadCase,
    governingMethod: gv.governingMethod,
    methods,
    statement:
      chemistry === 'beyond-oil'
        ? `No oil in scope gives the duty its scuffing margin: ${stagePart} needed against an EP floor of ${review.policy.epOilFzgStage}; change the design or the duty. Governed by "${gov.c.loadCase}" and the ${METHOD_WORDS[gv.governingMethod]}.`
        : `${capitalise(CHEMISTRY_NEED_WORDS[chemistry])}, because ${chemistryReason}; ${stagePart}; ${vgPart}${mpPart}. Governed by "${gov.c.loadCase}" and the ${METHOD_WORDS[gv.governingMethod]}.`,
  };
}

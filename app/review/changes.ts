import { casesOfOil, SHORTFALL_WORDS } from './overall';
import type { CaseResult, ChangeFinding, ChangeFindingCode, ChangeSide, Shortfall } from './results';
import type { Review } from './schema';

const sideOf = (c: CaseResult | undefined, oilStage: number | '>12'): ChangeSide => ({
  scuffingSafety: c?.scuffingSafety ?? null,
  integralSafety: c?.integralSafety ?? null,
  lambdaMin: c?.lambdaMin ?? null,
  scuffingProbability: c?.scuffingProbability ?? null,
  neededFzgStage: c?.verdict?.neededFzgStage ?? null,
  oilFzgStage: oilStage,
  meets: c?.verdict?.oilFit === 'meets',
});

const list = (xs: readonly string[]) => (xs.length <= 1 ? (xs[0] ?? '') : `${xs.slice(0, -1).join(', ')} and ${xs[xs.length - 1]}`);
const quoted = (xs: readonly string[]) => list(xs.map((x) => `"${x}"`));

/**
 * The change finding for each proposed oil against the oil in service:
 * - `not-supported`: the proposed oil falls short on chemistry or FZG stage in a case that runs
 *   (time share > 0), or no oil gives the margin at all;
 * - `supported-with-conditions`: it meets the chemistry and stage, but its film stays below the
 *   λ target somewhere (a grade, cooling or finish matter, which the conditions name);
 * - `supported`: it meets the need in every case.
 */
export function changeFindings(review: Review, cases: readonly CaseResult[]): ChangeFinding[] {
  const inService = review.oils.find((o) => o.role === 'in-service');
  if (!inService) return [];
  const before = new Map(casesOfOil(review, cases, inService.name).map((x) => [x.c.loadCase, x.c]));
  return review.oils
    .filter((o) => o.role === 'proposed')
    .map((to) => {
      const mine = casesOfOil(review, cases, to.name);
      const running = mine.filter((x) => x.share > 0);
      const shortIn = (s: Shortfall) => running.filter((x) => x.c.verdict?.shortfalls.includes(s)).map((x) => x.c.loadCase);
      const beyond = running.some((x) => x.c.verdict?.code === 'beyond-oil');
      const hardShort = (['chemistry', 'fzg-stage'] as const).filter((s) => shortIn(s).length > 0);
      const filmShort = shortIn('film');
      const finding: ChangeFindingCode = beyond || hardShort.length > 0 ? 'not-supported' : filmShort.length > 0 ? 'supported-with-conditions' : 'supported';
      const conditions =
        finding === 'supported-with-conditions'
          ? [`Raise the film towards the λ target (λmin ≥ ${review.policy.lambdaTarget}), or accept it knowingly: a heavier grade, a cooler sump or smoother flanks thicken the film; EP chemistry does not.`]
          : [];
      const statement =
        finding === 'supported'
          ? `Changing from "${inService.name}" to "${to.name}" is supported: the proposed oil meets the duty's need in every load case.`
          : finding === 'supported-with-conditions'
            ? `Changing from "${inService.name}" to "${to.name}" is supported with conditions: the proposed oil meets the chemistry and FZG stage the duty needs, but its film stays below the λ target in ${quoted(filmShort)}.`
            : beyond
              ? `Changing from "${inService.name}" to "${to.name}" is not supported: no oil in scope gives the duty its scuffing margin; the design or the duty must change.`
              : `Changing from "${inService.name}" to "${to.name}" is not supported: the proposed oil falls short on ${list(hardShort.map((s) => SHORTFALL_WORDS[s]))} in ${quoted([...new Set(hardShort.flatMap(shortIn))])}.`;
      return {
        from: inService.name,
        to: to.name,
        finding,
        statement,
        conditions,
        byCase: mine.map((x) => ({ loadCase: x.c.loadCase, before: sideOf(before.get(x.c.loadCase), inService.fzgFailureStage), after: sideOf(x.c, to.fzgFailureStage) })),
      };
    });
}

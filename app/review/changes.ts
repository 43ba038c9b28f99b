import { micropittingNeedWords, micropittingStageNumber as mpNumber } from './micropittingResult';
import { casesOfOil, SHORTFALL_WORDS } from './overall';
import type { CaseResult, ChangeFinding, ChangeFindingCode, ChangeSide, MicropittingStageNeeded, Shortfall } from './results';
import type { Review } from './schema';

const sideOf = (c: CaseResult | undefined, oilStage: number | '>12', mpStage: MicropittingStageNeeded | null): ChangeSide => ({
  scuffingSafety: c?.scuffingSafety ?? null,
  integralSafety: c?.integralSafety ?? null,
  lambdaMin: c?.lambdaMin ?? null,
  scuffingProbability: c?.scuffingProbability ?? null,
  neededFzgStage: c?.verdict?.neededFzgStage ?? null,
  oilFzgStage: oilStage,
  micropittingSafety: c?.micropitting?.safety ?? null,
  neededMicropittingStage: c?.micropitting?.requiredFailureStage ?? null,
  oilMicropittingStage: mpStage,
  micropitting: c?.verdict?.micropitting ?? null,
  meets: c?.verdict?.oilFit === 'meets',
});

const list = (xs: readonly string[]) => (xs.length <= 1 ? (xs[0] ?? '') : `${xs.slice(0, -1).join(', ')} and ${xs[xs.length - 1]}`);
const quoted = (xs: readonly string[]) => list(xs.map((x) => `"${x}"`));

/**
 * The change finding for each proposed oil against the oil in service:
 * - `not-supported`: the proposed oil falls short on chemistry, FZG stage or micropitting in a case
 *   that runs (time share > 0), or no oil gives the margin at all;
 * - `supported-with-conditions`: it meets the chemistry and stage, but its film stays below the
 *   λ target somewhere (a grade, cooling or finish matter, which the conditions name), or its
 *   micropitting failure stage is not given where micropitting is in play (the condition asks for it);
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
      const hardShort = (['chemistry', 'fzg-stage', 'micropitting'] as const).filter((s) => shortIn(s).length > 0);
      const filmShort = shortIn('film');
      // Unknown is a condition where micropitting is in play: the screen flags it (λGF,min < 1), or the
      // oil in service has a known stage, so there is a margin the change must hold.
      const mpUnknown = running.filter((x) => x.c.verdict?.micropitting === 'unknown' && ((x.c.micropitting?.lambdaGFMin ?? 0) < 1 || inService.micropittingFailureStage !== undefined));
      const mpNeeded = mpUnknown.reduce((n, x) => Math.max(n, mpNumber(x.c.micropitting?.requiredFailureStage ?? null)), 0);
      const softFindings = filmShort.length > 0 || mpUnknown.length > 0;
      const finding: ChangeFindingCode = beyond || hardShort.length > 0 ? 'not-supported' : softFindings ? 'supported-with-conditions' : 'supported';
      const conditions =
        finding === 'supported-with-conditions'
          ? [
              ...(filmShort.length > 0 ? [`Raise the film towards the λ target (λmin ≥ ${review.policy.lambdaTarget}) in ${quoted(filmShort)}, or accept it knowingly: a heavier grade, a cooler sump or smoother flanks thicken the film; EP chemistry does not.`] : []),
              ...(mpUnknown.length > 0
                ? [`The proposed oil's micropitting failure stage (FVA 54, C-GF gear) is not given: obtain it before the change; the duty needs stage ${micropittingNeedWords(mpNeeded > 10 ? '>10' : mpNeeded)} in ${quoted(mpUnknown.map((x) => x.c.loadCase))}. Some EP additive systems lower micropitting resistance.`]
                : []),
            ]
          : [];
      const lowerMargin = running
        .filter((x) => {
          const a = before.get(x.c.loadCase)?.micropitting?.safety;
          const b = x.c.micropitting?.safety;
          return a != null && b != null && b < a;
        })
        .map((x) => x.c.loadCase);
      const marginNote = lowerMargin.length > 0 ? ` Its micropitting margin Sλ is lower than the in-service oil's in ${quoted(lowerMargin)}.` : '';
      const statement =
        finding === 'supported'
          ? `Changing from "${inService.name}" to "${to.name}" is supported: the proposed oil meets the duty's need in every load case.`
          : finding === 'supported-with-conditions'
            ? `Changing from "${inService.name}" to "${to.name}" is supported with conditions: the proposed oil meets the chemistry and FZG stage the duty needs, but ${[filmShort.length > 0 ? `its film stays below the λ target in ${quoted(filmShort)}` : null, mpUnknown.length > 0 ? 'its micropitting failure stage is not given' : null].filter((x): x is string => x !== null).join(', and ')}.`
            : beyond
              ? `Changing from "${inService.name}" to "${to.name}" is not supported: no oil in scope gives the duty its scuffing margin; the design or the duty must change.`
              : `Changing from "${inService.name}" to "${to.name}" is not supported: the proposed oil falls short on ${list(hardShort.map((s) => SHORTFALL_WORDS[s]))} in ${quoted([...new Set(hardShort.flatMap(shortIn))])}.`;
      return {
        from: inService.name,
        to: to.name,
        finding,
        statement: statement + marginNote,
        conditions,
        byCase: mine.map((x) => ({ loadCase: x.c.loadCase, before: sideOf(before.get(x.c.loadCase), inService.fzgFailureStage, inService.micropittingFailureStage ?? null), after: sideOf(x.c, to.fzgFailureStage, to.micropittingFailureStage ?? null) })),
      };
    });
}

import { cautionsFor } from './cautions';
import { micropittingFinding, RULES, type RuleOutcome } from './rules';
import { governingMethod, neededStage, verdictCodeOf } from './code';
import { CHEMISTRY_WORDS } from './words';
import type { Reason, Shortfall, Verdict, VerdictCode, VerdictFacts, VerdictPolicy } from './types';

/**
 * The verdict for one load case with one oil:
 * - `beyond-oil`: the FZG stage needed is above the EP floor, or the integral method fails even at it;
 * - `ep-warranted`: the stage needed is above the anti-wear floor, or an escalation rule fires;
 * - `aw-suffices`: otherwise.
 * The oil's fit compares its chemistry, FZG stage and λ with what is needed; a boundary regime
 * rules out an R&O oil (anti-wear chemistry at least), and a λ shortfall asks for a grade, not EP.
 * Micropitting is a finding of its own (meets, short, unknown); it never moves the code.
 */
export function decideVerdict(f: VerdictFacts, p: VerdictPolicy): Verdict {
  const outcomes = RULES.map((r) => r(f, p)).filter((o): o is RuleOutcome => o !== null);
  const code: VerdictCode = verdictCodeOf(f, p);
  const reasons: Reason[] = outcomes.map((o) => o.reason);

  const needsAw = outcomes.some((o) => o.needsAntiWear);
  const chemistryOk =
    code === 'aw-suffices' ? !(needsAw && f.chemistry === 'r-and-o') : code === 'ep-warranted' ? f.chemistry === 'extreme-pressure' : false;
  const chemistryText =
    code === 'beyond-oil'
      ? 'No oil in scope gives the margin: change the design or the duty — lower load or speed, a cooler sump, smoother flanks (lower Ra), tip relief, or a flank treatment or material with a higher structural factor.'
      : chemistryOk
        ? `The oil's chemistry, ${CHEMISTRY_WORDS[f.chemistry]}, fits the need (${code === 'ep-warranted' ? 'EP' : needsAw ? 'anti-wear at least' : 'anti-wear or R&O'}).`
        : `The oil's chemistry, ${CHEMISTRY_WORDS[f.chemistry]}, falls short: ${code === 'ep-warranted' ? 'EP chemistry is warranted' : 'at least anti-wear chemistry is needed in the boundary regime'}.`;
  reasons.push({
    rule: code === 'beyond-oil' ? 'verdict.beyond-oil' : 'oil.chemistry',
    text: chemistryText,
    threshold: code === 'beyond-oil' ? `EP floor FZG ${p.epOilFzgStage} (policy)` : 'chemistry against need',
    source: 'common practice; gear-oil classes R&O (DIN 51517-2 CL) and EP (DIN 51517-3 CLP); anti-wear floor from the hydraulic-oil class DIN 51524-2 (HLP)',
  });
  const shortfalls: Shortfall[] = outcomes.flatMap((o) => (o.oilFallsShort ? [o.oilFallsShort] : []));
  if (!chemistryOk && code !== 'beyond-oil') shortfalls.push('chemistry');
  const oilFit = code !== 'beyond-oil' && shortfalls.length === 0 ? 'meets' : 'falls-short';
  const lambdaShort = f.lambdaMin < p.lambdaTarget;
  return {
    code,
    oilFit,
    shortfalls,
    governingMethod: governingMethod(f, p),
    chemistryNeed: code === 'beyond-oil' ? null : code === 'ep-warranted' ? 'extreme-pressure' : needsAw ? 'anti-wear' : 'r-and-o',
    neededStage: neededStage(f, p),
    micropitting: micropittingFinding(f, p),
    reasons,
    cautions: cautionsFor(f, code),
    gradeAdvice: lambdaShort ? `λmin ${f.lambdaMin.toFixed(2)} < ${p.lambdaTarget}: see the grade finder for the lowest ISO VG that meets it.` : null,
  };
}

import type { CaseResult, ChangeSide, LimitCheck, Results, Shortfall } from '../review/results';
import { decisionLine } from '../review/decisionSubject';
import { OIL_FIT_WORDS, REGIME_WORDS, SHORTFALL_SHORT, VERDICT_WORDS } from '../review/vocabulary';
import type { ReviewStatus } from '../review/results';
import type { Review } from '../review/schema';
import { STATUS_WORDS } from '../review/status';

const f = (x: number | null | undefined, d = 2) => (x === null || x === undefined ? '—' : x.toFixed(d));
const stage = (s: CaseResult['requiredFzgStage'] | number) => (s === null ? '—' : s === '>12' || s > 12 ? 'above 12' : String(s));
const pct = (x: number | null) => (x === null ? '—' : x < 1e-4 ? '< 0.01 %' : `${(100 * x).toFixed(x < 0.01 ? 2 : 1)} %`);

const ORDER: readonly Shortfall[] = ['chemistry', 'fzg-stage', 'film'];
const shortfallList = (xs: readonly Shortfall[]) => ORDER.filter((s) => xs.includes(s)).map((s) => SHORTFALL_SHORT[s]).join(', ');

/** A figure against its limit, with the word that says pass or fail (never colour alone). */
export function checkText(k: LimitCheck): string {
  const mark = k.pass === null ? 'not defined' : k.pass ? 'pass' : 'FAIL';
  return `${k.symbol} ${f(k.value)} ${k.pass === false ? '<' : '≥'} ${k.limit} ${mark}`;
}

const sideText = (s: ChangeSide) =>
  `SB ${f(s.scuffingSafety)}, SintS ${f(s.integralSafety)}, λmin ${f(s.lambdaMin)}, P(scuffing) ${pct(s.scuffingProbability)}, FZG ${stage(s.neededFzgStage)} needed / ${stage(s.oilFzgStage)} offered`;

/** The compact human-readable summary of `flankfilm review FILE`: the need, the change, each oil, then the cases. */
export function summaryText(r: Results, state?: { status: ReviewStatus; review: Review }): string {
  const g = r.gear;
  const so = state?.review.signoff;
  const lines = [
    `${r.title}`,
    `Flankfilm ${r.flankfilm}`,
    ...(state ? [`Status: ${STATUS_WORDS[state.status]}${so && state ? ` — ${decisionLine(so, state.review)}, by ${so.reviewer} (${so.role}) on ${so.signedAt.slice(0, 10)}` : ''}`] : []),
    '',
  ];
  if (r.need) lines.push(`What the duty needs — ${VERDICT_WORDS[r.need.code]}`, `  ${r.need.statement}`, '');
  for (const ch of r.changes) {
    lines.push(`Change: ${ch.statement}`);
    for (const c of ch.conditions) lines.push(`  Condition: ${c}`);
    for (const b of ch.byCase) lines.push(`  ${b.loadCase}: before ${sideText(b.before)}`, `  ${' '.repeat(b.loadCase.length)}  after  ${sideText(b.after)}`);
    lines.push('');
  }
  if (r.verdicts.length) {
    lines.push('Each oil against the need');
    for (const v of r.verdicts) {
      const short = v.shortfalls.length ? `short on ${shortfallList(v.shortfalls)}` : OIL_FIT_WORDS[v.oilFit];
      lines.push(`  ${v.oil}: ${v.code === 'beyond-oil' ? VERDICT_WORDS[v.code] : short}`);
      lines.push(`    FZG stage ${stage(v.oilFzgStage)} offered, ${stage(v.neededFzgStage)} needed; ${v.oilChemistry} chemistry; worst case: ${v.checks.map((k) => `${checkText(k)} (${k.loadCase})`).join('; ')}`);
    }
    lines.push('');
  }
  lines.push(
    `Gear pair: αwt ${f(g.workingPressureAngle_deg)}°, εα ${f(g.transverseContactRatio, 3)}, εβ ${f(g.overlapRatio, 3)}, a ${f(g.centerDistance_mm, 3)} mm, T1T2 ${f(g.lineOfAction_mm, 2)} mm`,
    `Path from T1 (mm): A ${f(g.points_mm.A)}  B ${f(g.points_mm.B)}  C ${f(g.points_mm.C)}  D ${f(g.points_mm.D)}  E ${f(g.points_mm.E)}`,
    ...g.checks.map((c) => `  ${c.severity === 'warning' ? 'Warning' : 'Note'}: ${c.message}`),
    '',
  );
  for (const c of r.cases) {
    lines.push(`${c.loadCase}${c.oil ? ` — ${c.oil}` : ''}`);
    lines.push(`  v ${f(c.pitchLineVelocity_mps)} m/s; σH ${f(c.nominalContactStress_MPa, 0)} MPa (${c.nominalContactStressEdition}); pH,max ${f(c.maxHertzStress_MPa, 0)} MPa; pC (whole load) ${f(c.pitchHertzStress_MPa, 0)} MPa`);
    if (c.oil) {
      lines.push(`  λmin ${f(c.lambdaMin)} (${c.regime ? REGIME_WORDS[c.regime] : '—'}); θB,max ${f(c.maxContactTemperature_C, 0)} °C against θS ${f(c.scuffingTemperature_C, 0)} °C; FZG stage needed ${stage(c.verdict?.neededFzgStage ?? null)}`);
      if (c.verdict) {
        lines.push(`  ${c.verdict.checks.map(checkText).join('; ')}`);
        lines.push(`  → ${VERDICT_WORDS[c.verdict.code]}; the oil ${c.verdict.shortfalls.length ? `is short on ${shortfallList(c.verdict.shortfalls)}` : 'meets the need'}`);
      }
    }
  }
  for (const gf of r.gradeFinder) lines.push(`  Grade finder, ${gf.oil}: ${gf.note}`);
  const applying = r.cautions.filter((k) => k.applies);
  const standing = r.cautions.filter((k) => !k.applies);
  if (applying.length) {
    lines.push('', 'Cautions');
    for (const k of applying) lines.push(`  • ${k.text}`);
  }
  if (standing.length) lines.push('', `Not triggered by these inputs: ${standing.map((k) => k.title).join('; ')}.`);
  if (!applying.some((k) => k.id === 'defer')) lines.push('', "This review is an engineering aid, not an approval: follow the gearbox maker's lubricant list, local codes and the judgement of a licensed engineer.");
  lines.push('');
  return lines.join('\n');
}

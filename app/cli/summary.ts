import type { CaseResult, Results } from '../review/results';
import { VERDICT_WORDS } from '../review/vocabulary';
import type { ReviewStatus } from '../review/results';
import type { Review } from '../review/schema';
import { STATUS_WORDS } from '../review/status';

const f = (x: number | null | undefined, d = 2) => (x === null || x === undefined ? '—' : x.toFixed(d));
const stage = (s: CaseResult['requiredFzgStage']) => (s === null ? '—' : String(s));

/** The compact human-readable summary of `flankfilm review FILE`. */
export function summaryText(r: Results, state?: { status: ReviewStatus; review: Review }): string {
  const g = r.gear;
  const so = state?.review.signoff;
  const lines = [
    `${r.title}`,
    `Flankfilm ${r.flankfilm}`,
    ...(state ? [`Status: ${STATUS_WORDS[state.status]}${so ? ` — ${so.decision} by ${so.reviewer} (${so.role}) at ${so.signedAt}` : ''}`] : []),
    '',
    `Gear pair: αwt ${f(g.workingPressureAngle_deg)}°, εα ${f(g.transverseContactRatio, 3)}, εβ ${f(g.overlapRatio, 3)}, a ${f(g.centerDistance_mm, 3)} mm, T1T2 ${f(g.lineOfAction_mm, 2)} mm`,
    `Path from T1 (mm): A ${f(g.points_mm.A)}  B ${f(g.points_mm.B)}  C ${f(g.points_mm.C)}  D ${f(g.points_mm.D)}  E ${f(g.points_mm.E)}`,
    ...g.checks.map((c) => `  ${c.severity}: ${c.message}`),
    '',
  ];
  for (const c of r.cases) {
    lines.push(`${c.loadCase}${c.oil ? ` — ${c.oil}` : ''}`);
    lines.push(`  v ${f(c.pitchLineVelocity_mps)} m/s; σH ${f(c.nominalContactStress_MPa, 0)} MPa (ISO 6336-2); pH,max ${f(c.maxHertzStress_MPa, 0)} MPa; pC (whole load) ${f(c.pitchHertzStress_MPa, 0)} MPa`);
    if (c.oil) {
      lines.push(`  λmin ${f(c.lambdaMin)} (${c.regime}); θB,max ${f(c.maxContactTemperature_C, 0)} °C vs θS ${f(c.scuffingTemperature_C, 0)} °C; SB ${f(c.scuffingSafety)}; SintS ${f(c.integralSafety)}; FZG stage needed ${stage(c.requiredFzgStage)}`);
      if (c.micropitting) lines.push(`  Micropitting (ISO/TS 6336-22): ${c.micropitting.note}`);
      if (c.verdict) lines.push(`  → ${VERDICT_WORDS[c.verdict.code]}; oil ${c.verdict.oilFit}`);
    }
  }
  if (r.verdicts.length) {
    lines.push('', 'Overall, per oil:');
    for (const v of r.verdicts) lines.push(`  ${v.oil}: ${v.summary}`);
  }
  for (const gf of r.gradeFinder) lines.push(`  Grade finder, ${gf.oil}: ${gf.note}`);
  lines.push('', 'Follow the gearbox maker\'s lubricant list, local codes and a licensed engineer\'s judgement; this review is an aid, not an approval.', '');
  return lines.join('\n');
}

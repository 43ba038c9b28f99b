import type { CaseResult, ChangeSide, GearResult, LimitCheck, PlanetaryResult, Results, Shortfall } from '../review/results';
import { SHORTFALL_ORDER, HELD_WORDS, MESH_WORDS, OIL_FIT_WORDS, REGIME_WORDS, SHORTFALL_SHORT, VERDICT_WORDS } from '../review/vocabulary';
import { decisionLine } from '../review/decisionSubject';
import type { ReviewStatus } from '../review/results';
import type { Review } from '../review/schema';
import { STATUS_WORDS } from '../review/status';

const f = (x: number | null | undefined, d = 2) => (x === null || x === undefined ? '—' : x.toFixed(d));
const stage = (s: CaseResult['requiredFzgStage'] | number) => (s === null ? '—' : s === '>12' || s > 12 ? 'above 12' : String(s));
const pct = (x: number | null) => (x === null ? '—' : x < 1e-4 ? '< 0.01 %' : `${(100 * x).toFixed(x < 0.01 ? 2 : 1)} %`);

const shortfallList = (xs: readonly Shortfall[]) => SHORTFALL_ORDER.filter((s) => xs.includes(s)).map((s) => SHORTFALL_SHORT[s]).join(', ');

/** A figure against its limit, with the word that says pass or fail (never colour alone). */
export function checkText(k: LimitCheck): string {
  if (k.value === null) return `${k.symbol} not defined (limit ${k.limit})`;
  const mark = k.pass === null ? 'not defined' : k.pass ? 'pass' : 'FAIL';
  return `${k.symbol} ${f(k.value)} ${k.pass === false ? '<' : '≥'} ${k.limit} ${mark}`;
}

const sideText = (s: ChangeSide) =>
  `SB ${f(s.scuffingSafety)}, SintS ${f(s.integralSafety)}, λmin ${f(s.lambdaMin)}, P(scuffing) ${pct(s.scuffingProbability)}, FZG ${stage(s.neededFzgStage)} needed / ${stage(s.oilFzgStage)} offered`;

/** The compact human-readable summary of `flankfilm review FILE`: the need, the change, each oil, then the cases. */
export function summaryText(r: Results, state?: { status: ReviewStatus; review: Review }): string {
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
    lines.push(r.planetary ? 'Each oil against the need, across both meshes' : 'Each oil against the need');
    for (const v of r.verdicts) {
      const short = v.shortfalls.length ? `short on ${shortfallList(v.shortfalls)}` : OIL_FIT_WORDS[v.oilFit];
      lines.push(`  ${v.oil}: ${v.code === 'beyond-oil' ? VERDICT_WORDS[v.code] : short}`);
      lines.push(`    FZG stage ${stage(v.oilFzgStage)} offered, ${stage(v.neededFzgStage)} needed; ${v.oilChemistry} chemistry; worst case: ${v.checks.map((k) => `${checkText(k)} (${k.loadCase})`).join('; ')}`);
    }
    lines.push('');
  }
  if (r.planetary && r.meshes) {
    lines.push(...stageLines(r.planetary), '');
    for (const m of r.meshes) {
      lines.push(`${MESH_WORDS[m.mesh].replace(/^./, (c) => c.toUpperCase())} mesh (${m.mesh === 'sun-planet' ? 'external' : 'internal'}; speeds and torques of its pinion in the carrier frame)`);
      lines.push(...gearLines(m.gear, '  ', 'Mesh geometry'), '', ...caseLines(m.cases, '  '), '');
    }
  } else {
    const internal = state?.review.gearPair?.kind === 'internal';
    lines.push(...gearLines(r.gear, '', internal ? 'Internal gear pair (pinion in a ring)' : 'Gear pair'), '', ...caseLines(r.cases, ''));
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

function gearLines(g: GearResult, indent: string, title: string): string[] {
  return [
    `${indent}${title}: αwt ${f(g.workingPressureAngle_deg)}°, εα ${f(g.transverseContactRatio, 3)}, εβ ${f(g.overlapRatio, 3)}, a ${f(g.centerDistance_mm, 3)} mm, T1T2 ${f(g.lineOfAction_mm, 2)} mm`,
    `${indent}Path from T1 (mm): A ${f(g.points_mm.A)}  B ${f(g.points_mm.B)}  C ${f(g.points_mm.C)}  D ${f(g.points_mm.D)}  E ${f(g.points_mm.E)}`,
    ...g.checks.map((c) => `${indent}  ${c.severity === 'warning' ? 'Warning' : 'Note'}: ${c.message}`),
  ];
}

function caseLines(cases: readonly CaseResult[], indent: string): string[] {
  const lines: string[] = [];
  for (const c of cases) {
    lines.push(`${indent}${c.loadCase}${c.oil ? ` — ${c.oil}` : ''}`);
    lines.push(`${indent}  v ${f(c.pitchLineVelocity_mps)} m/s; σH ${f(c.nominalContactStress_MPa, 0)} MPa (${c.nominalContactStressEdition}); pH,max ${f(c.maxHertzStress_MPa, 0)} MPa; pC (whole load) ${f(c.pitchHertzStress_MPa, 0)} MPa`);
    if (c.oil) {
      lines.push(`${indent}  λmin ${f(c.lambdaMin)} (${c.regime ? REGIME_WORDS[c.regime] : '—'}); θB,max ${f(c.maxContactTemperature_C, 0)} °C against θS ${f(c.scuffingTemperature_C, 0)} °C; FZG stage needed ${stage(c.verdict?.neededFzgStage ?? null)}`);
      if (c.micropitting) lines.push(`${indent}  Micropitting (ISO/TS 6336-22): ${c.micropitting.note}`);
      if (c.verdict) {
        lines.push(`${indent}  ${c.verdict.checks.map(checkText).join('; ')}`);
        lines.push(`${indent}  → ${VERDICT_WORDS[c.verdict.code]}; the oil ${c.verdict.shortfalls.length ? `is short on ${shortfallList(c.verdict.shortfalls)}` : 'meets the need'}`);
      }
    }
  }
  return lines;
}

function stageLines(p: PlanetaryResult): string[] {
  const lines = [
    `Planetary stage: sun/planet/ring ${p.teeth.sun}/${p.teeth.planet}/${p.teeth.ring} teeth, ${p.planets} planet${p.planets === 1 ? '' : 's'}, ${HELD_WORDS[p.held]}, Kγ ${f(p.meshLoadFactorKgamma)}`,
    `  Ratio ${f(p.ratio, 4)} (${p.driving} to ${p.driven}); centre distance ${f(p.centerDistance_mm, 3)} mm; gap between planet tips ${p.planetTipGap_mm === null ? '— (one planet)' : `${f(p.planetTipGap_mm)} mm`}; Xmp sun–planet ${f(p.multipleMeshFactor['sun-planet'])}, planet–ring ${f(p.multipleMeshFactor['planet-ring'])}`,
  ];
  for (const k of p.loadCases) {
    lines.push(
      `  ${k.loadCase}: sun ${f(k.sunSpeed_rpm, 1)} rpm, carrier ${f(k.carrierSpeed_rpm, 1)} rpm, ring ${f(k.ringSpeed_rpm, 1)} rpm; relative to the carrier sun ${f(k.sunRelativeSpeed_rpm, 1)}, planet ${f(k.planetRelativeSpeed_rpm, 1)} rpm; sun torque ${f(k.sunTorque_Nm, 0)} N·m, per planet mesh ${f(k.meshTorque_Nm['sun-planet'], 0)} N·m on the sun, ${f(k.meshTorque_Nm['planet-ring'], 0)} N·m on the planet into the ring`,
    );
  }
  for (const g of p.governingMesh) lines.push(`  Governing mesh for ${g.oil}: ${MESH_WORDS[g.mesh]}`);
  for (const c of p.checks) lines.push(`  ${c.severity === 'warning' ? 'Warning' : 'Note'}: ${c.message}`);
  return lines;
}

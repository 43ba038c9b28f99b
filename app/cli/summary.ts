import type { CaseResult, GearResult, PlanetaryResult, Results } from '../review/results';
import { HELD_WORDS, MESH_WORDS, OIL_FIT_WORDS, REGIME_WORDS, VERDICT_WORDS } from '../review/vocabulary';
import type { ReviewStatus } from '../review/results';
import type { Review } from '../review/schema';
import { STATUS_WORDS } from '../review/status';

const f = (x: number | null | undefined, d = 2) => (x === null || x === undefined ? '—' : x.toFixed(d));
const stage = (s: CaseResult['requiredFzgStage']) => (s === null ? '—' : String(s));

/** The compact human-readable summary of `flankfilm review FILE`. */
export function summaryText(r: Results, state?: { status: ReviewStatus; review: Review }): string {
  const so = state?.review.signoff;
  const lines = [
    `${r.title}`,
    `Flankfilm ${r.flankfilm}`,
    ...(state ? [`Status: ${STATUS_WORDS[state.status]}${so ? ` — ${so.decision} by ${so.reviewer} (${so.role}) at ${so.signedAt}` : ''}`] : []),
    '',
  ];
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
  if (r.verdicts.length) {
    lines.push('', r.planetary ? 'Overall, per oil, across both meshes:' : 'Overall, per oil:');
    for (const v of r.verdicts) lines.push(`  ${v.oil}: ${v.summary}`);
  }
  for (const gf of r.gradeFinder) lines.push(`  Grade finder, ${gf.oil}: ${gf.note}`);
  lines.push('', 'Follow the gearbox maker\'s lubricant list, local codes and a licensed engineer\'s judgement; this review is an aid, not an approval.', '');
  return lines.join('\n');
}

function gearLines(g: GearResult, indent: string, title: string): string[] {
  return [
    `${indent}${title}: αwt ${f(g.workingPressureAngle_deg)}°, εα ${f(g.transverseContactRatio, 3)}, εβ ${f(g.overlapRatio, 3)}, a ${f(g.centerDistance_mm, 3)} mm, T1T2 ${f(g.lineOfAction_mm, 2)} mm`,
    `${indent}Path from T1 (mm): A ${f(g.points_mm.A)}  B ${f(g.points_mm.B)}  C ${f(g.points_mm.C)}  D ${f(g.points_mm.D)}  E ${f(g.points_mm.E)}`,
    ...g.checks.map((c) => `${indent}  ${c.severity}: ${c.message}`),
  ];
}

function caseLines(cases: readonly CaseResult[], indent: string): string[] {
  const lines: string[] = [];
  for (const c of cases) {
    lines.push(`${indent}${c.loadCase}${c.oil ? ` — ${c.oil}` : ''}`);
    lines.push(`${indent}  v ${f(c.pitchLineVelocity_mps)} m/s; σH ${f(c.nominalContactStress_MPa, 0)} MPa (ISO 6336-2); pH,max ${f(c.maxHertzStress_MPa, 0)} MPa; pC (whole load) ${f(c.pitchHertzStress_MPa, 0)} MPa`);
    if (c.oil) {
      lines.push(`${indent}  λmin ${f(c.lambdaMin)} (${c.regime ? REGIME_WORDS[c.regime] : '—'}); θB,max ${f(c.maxContactTemperature_C, 0)} °C vs θS ${f(c.scuffingTemperature_C, 0)} °C; SB ${f(c.scuffingSafety)}; SintS ${f(c.integralSafety)}; FZG stage needed ${stage(c.requiredFzgStage)}`);
      if (c.verdict) lines.push(`${indent}  → ${VERDICT_WORDS[c.verdict.code]}${c.verdict.oilFit ? `; ${OIL_FIT_WORDS[c.verdict.oilFit]}` : ''}`);
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
  for (const c of p.checks) lines.push(`  ${c.severity}: ${c.message}`);
  return lines;
}

import type { GearPair, Review } from '../../review/schema';
import type { RecordContext } from '../context';
import { drawPlanetaryInputs } from './planetaryInputs';
import { materialName, materialRow, shift, tip } from './inputHelpers';
import { formatNumber, type Units } from '../units';
import { BASE_OIL_WORDS, ROLE_WORDS } from '../../review/vocabulary';

const CHEMISTRY_WORDS: Readonly<Record<Review['oils'][number]['chemistry'], string>> = { 'r-and-o': 'R&O', 'anti-wear': 'AW', 'extreme-pressure': 'EP' };

const yesNo = (b: boolean): string => (b ? 'yes' : 'no');

/** Inputs: gear pair, materials, duty, oils and policy, in the review's unit system. */
export function drawInputs(ctx: RecordContext): void {
  const { layout: L, review, units: u } = ctx;
  L.newPage();
  L.heading(`Inputs (${u.system === 'us' ? 'US customary units' : 'SI units'})`);
  if (review.gearPair) drawPairInputs(ctx, review.gearPair);
  else if (review.planetary) drawPlanetaryInputs(ctx, review.planetary);

  L.heading('Duty', 2);
  const planetary = review.planetary;
  const speedHeader = planetary ? (planetary.held === 'sun' ? 'n carrier' : 'n sun') : 'n1';
  L.table(
    [
      { header: 'Load case', width: 0.27 },
      { header: speedHeader, width: 0.09, align: 'right' },
      { header: planetary ? 'T sun or P (input)' : 'T1 or P (input)', width: 0.16, align: 'right' },
      { header: 'KA', width: 0.07, align: 'right' },
      { header: 'θoil', width: 0.11, align: 'right' },
      { header: 'Lubrication', width: 0.12 },
      { header: 'Time share', width: 0.1, align: 'right' },
    ],
    review.loadCases.map((c) => [
      c.name,
      u.fmt((planetary ? (planetary.held === 'sun' ? c.carrierSpeed_rpm : c.sunSpeed_rpm) : c.pinionSpeed_rpm) ?? null, 'speed'),
      c.pinionTorque_Nm !== undefined ? `T1 = ${u.fmt(c.pinionTorque_Nm, 'torque')}` : c.sunTorque_Nm !== undefined ? `T sun = ${u.fmt(c.sunTorque_Nm, 'torque')}` : `P = ${u.fmt(c.power_kW, 'power')}`,
      formatNumber(c.applicationFactor, 3),
      u.fmt(c.oilTemperature_C, 'temperature'),
      c.lubrication === 'dip' ? 'dip' : 'spray',
      `${formatNumber(c.timeShare * 100, 3)} %`,
    ]),
    { zebra: true, fontSize: 8 },
  );
  drawOils(ctx);
}

function drawPairInputs(ctx: RecordContext, gp: GearPair): void {
  const { layout: L, results, units: u } = ctx;
  const g = results.gear;
  const wheel = gp.kind === 'internal' ? 'Ring' : 'Wheel';

  L.heading(gp.kind === 'internal' ? 'Gear pair (internal: the wheel is a ring)' : 'Gear pair', 2);
  L.table(
    [
      { header: 'Quantity', width: 0.46 },
      { header: 'Pinion', width: 0.27, align: 'right' },
      { header: wheel, width: 0.27, align: 'right' },
    ],
    [
      ['Number of teeth z', String(gp.pinion.teeth), String(gp.wheel.teeth)],
      ['Profile shift coefficient x (input → used)', shift(gp.pinion.profileShift, g.profileShift.pinion), shift(gp.wheel.profileShift, g.profileShift.wheel)],
      [gp.kind === 'internal' ? 'Tip diameter da, ring: inner (input → used)' : 'Tip diameter da (input → used)', tip(u, gp.pinion.tipDiameter_mm, g.tipDiameter_mm.pinion), tip(u, gp.wheel.tipDiameter_mm, g.tipDiameter_mm.wheel)],
      ['Flank roughness Ra', u.fmt(gp.pinion.roughnessRa_um, 'roughness'), u.fmt(gp.wheel.roughnessRa_um, 'roughness')],
      ['Material', materialName(gp.pinion.material), materialName(gp.wheel.material)],
      ['Reference diameter d (computed)', u.fmt(g.referenceDiameter_mm.pinion, 'length'), u.fmt(g.referenceDiameter_mm.wheel, 'length')],
      ['Base diameter db (computed)', u.fmt(g.baseDiameter_mm.pinion, 'length'), u.fmt(g.baseDiameter_mm.wheel, 'length')],
      ['Working pitch diameter dw (computed)', u.fmt(g.workingDiameter_mm.pinion, 'length'), u.fmt(g.workingDiameter_mm.wheel, 'length')],
    ],
    { zebra: true, fontSize: 8 },
  );
  L.keyValues(pairRows(u, gp, results), { pairs: 2, labelShare: 0.56, size: 7.5, header: ['Pair', 'Value'], valueAlign: 'right' });

  L.heading('Materials', 2);
  L.table(
    [
      { header: 'Member', width: 0.26 },
      { header: 'E', width: 0.11, align: 'right' },
      { header: 'ν', width: 0.07, align: 'right' },
      { header: 'k', width: 0.16, align: 'right' },
      { header: 'ρ', width: 0.13, align: 'right' },
      { header: 'c', width: 0.19, align: 'right' },
      { header: 'XW / WW', width: 0.08, align: 'right' },
    ],
    (['pinion', 'wheel'] as const).map((m) => materialRow(u, m, gp[m].material)),
    { zebra: true, fontSize: 8 },
  );

}

function drawOils(ctx: RecordContext): void {
  const { layout: L, review, results, units: u } = ctx;
  L.heading('Oils', 2);
  if (review.oils.length === 0) L.para('No oils in scope.', { size: 9 });
  else
    L.table(
      [
        { header: 'Oil', width: 0.23 },
        { header: 'Role', width: 0.09 },
        { header: 'KV40 / KV100', width: 0.15, align: 'right' },
        { header: 'VI', width: 0.11, align: 'right' },
        { header: 'ρ15', width: 0.1, align: 'right' },
        { header: 'Base, chemistry', width: 0.13 },
        { header: 'FZG / micro-pitting stage', width: 0.07, align: 'right' },
        { header: 'α', width: 0.12, align: 'right' },
      ],
      review.oils.map((o, i) => {
        const s = results.oils[i];
        return [
          o.name,
          ROLE_WORDS[o.role],
          `${formatNumber(o.kv40_mm2s, 4)} / ${formatNumber(o.kv100_mm2s, 4)} ${u.unit('kinematicViscosity')}`,
          s ? `${formatNumber(s.viscosityIndex, 3)} (${s.viscosityIndexSource})` : formatNumber(o.viscosityIndex ?? null),
          u.fmt(o.density15_kgm3, 'density'),
          `${BASE_OIL_WORDS[o.baseOil]}, ${CHEMISTRY_WORDS[o.chemistry]}${s?.isoVG ? `, ISO VG ${s.isoVG}` : ''}`,
          `${String(o.fzgFailureStage)} / ${o.micropittingFailureStage === undefined ? 'not given' : String(o.micropittingFailureStage)}`,
          o.pressureViscosity_1perGPa !== undefined ? u.fmt(o.pressureViscosity_1perGPa, 'pressureViscosity') : 'from ISO/TR 15144-1',
        ];
      }),
      { zebra: true, fontSize: 7.5 },
    );

  L.heading('Policy', 2);
  L.keyValues(policyRows(u, review), { pairs: 2, labelShare: 0.64, size: 7.5, valueAlign: 'right' });
}

function pairRows(u: Units, gp: GearPair, results: RecordContext['results']): Array<[string, string]> {
  const g = results.gear;
  const p = g.points_mm;
  return [
    ['Normal module mn', u.fmt(gp.normalModule_mm, 'length')],
    ['Normal pressure angle αn', u.fmt(gp.normalPressureAngle_deg, 'angle')],
    ['Helix angle β', u.fmt(gp.helixAngle_deg, 'angle')],
    ['Face width b', u.fmt(gp.faceWidth_mm, 'length')],
    ['Centre distance a (in → used)', `${gp.centerDistance_mm === undefined ? '(derived)' : u.fmt(gp.centerDistance_mm, 'length', 6)} → ${u.fmt(g.centerDistance_mm, 'length', 6)}`],
    ['Gear ratio u = z2/z1', formatNumber(g.gearRatio, 4)],
    ['Pressure angles αwt / αt', `${u.fmt(g.workingPressureAngle_deg, 'angle')} / ${u.fmt(g.transversePressureAngle_deg, 'angle')}`],
    ['Base helix angle βb', u.fmt(g.baseHelixAngle_deg, 'angle')],
    ['Contact ratios εα / εβ / εγ', `${formatNumber(g.transverseContactRatio, 4)} / ${formatNumber(g.overlapRatio, 4)} / ${formatNumber(g.totalContactRatio, 4)}`],
    ['Line of action T1T2', u.fmt(g.lineOfAction_mm, 'length')],
    [`A / B / C / D / E from T1 (${u.unit('length')})`, [p.A, p.B, p.C, p.D, p.E].map((x) => u.num(x, 'length')).join(' / ')],
    ['Meshes of the pinion np', String(gp.pinionMeshes)],
    ['Components in the oil', gp.components.length ? gp.components.join(', ') : 'none declared'],
    ['Kv / KHβ / KHα (inputs)', `${formatNumber(gp.dynamicFactorKv, 3)} / ${formatNumber(gp.faceLoadFactorKHbeta, 3)} / ${formatNumber(gp.transverseLoadFactorKHalpha, 3)}`],
  ];
}

function policyRows(u: Units, review: Review): Array<[string, string]> {
  const p = review.policy;
  return [
    ['λ target', formatNumber(p.lambdaTarget, 3)],
    ['Scuffing safety SB,min', formatNumber(p.scuffingSafetyMin, 3)],
    ['Integral safety SintS,min', formatNumber(p.integralSafetyMin, 3)],
    ['Micropitting safety Sλ,min', formatNumber(p.micropittingSafetyMin, 3)],
    ['FZG floor, anti-wear oils', `stage ${p.antiWearOilFzgStage}`],
    ['FZG floor, EP oils', `stage ${p.epOilFzgStage}`],
    ['Temperature range', `${u.fmt(p.temperatureRange_C[0], 'temperature')} to ${u.fmt(p.temperatureRange_C[1], 'temperature')}`],
    ['Points along the path', String(p.pathPoints)],
    ['Film formula', p.filmFormula === 'pan-hamrock' ? 'Pan–Hamrock (1989)' : 'Dowson–Higginson'],
    ['Inlet-shear film correction', yesNo(p.thermalFilmCorrection)],
    ['Regime limits λ (boundary / full film)', `${formatNumber(p.boundaryBelowLambda, 3)} / ${formatNumber(p.fullFilmFromLambda, 3)}`],
    ['Friction coefficient', p.frictionCoefficient === undefined ? 'ISO/TS 6336-20' : `${formatNumber(p.frictionCoefficient, 3)} (given)`],
    ['Scuffing-temperature spread σ/θS', formatNumber(p.scuffingTemperatureSpread, 3)],
    ['Shock duty from KA', formatNumber(p.shockApplicationFactor, 3)],
  ];
}

import type { CaseResult } from '../../review/results';
import { drawChart, type ChartSpec } from '../chart';
import type { RecordContext } from '../context';
import { drawVerdictIcon } from '../icons';
import { formatNumber, formatPercent, DASH, type Units } from '../units';
import { GREY, OIL_FIT_WORDS, OKABE_ITO, REGIME_COLOURS, REGIME_WORDS, VERDICT_WORDS } from '../words';
import { pathPoints } from '../../review/pathSeries';
import type { PointResult } from '../../review/results';

/** One page per load case × oil: the key figures, then one strip of four charts on a shared A–E axis with their figures beside them. */
export function drawCaseResults(ctx: RecordContext): void {
  ctx.results.cases.forEach((c, i) => drawCase(ctx, c, i));
}

export function caseTitle(c: CaseResult): string {
  return c.oil ? `${c.loadCase} × ${c.oil}` : `${c.loadCase} (no oil)`;
}

function drawCase(ctx: RecordContext, c: CaseResult, index: number): void {
  const { layout: L, units: u } = ctx;
  const doc = L.doc;
  L.newPage();
  L.heading(`${ctx.meshLabel ? `${ctx.meshLabel.replace(/^./, (x) => x.toUpperCase())}, results` : 'Results'} ${index + 1} of ${ctx.results.cases.length}: ${caseTitle(c)}`);
  if (c.verdict) {
    const top = L.y;
    drawVerdictIcon(doc, c.verdict.code, L.left, top, 13);
    const fit = c.verdict.oilFit ? `; ${OIL_FIT_WORDS[c.verdict.oilFit]}` : '';
    L.font(true, 10).text(`${VERDICT_WORDS[c.verdict.code]}${fit}`, L.left + 19, top + 1, { width: L.width - 19 });
    L.y += 4;
  } else {
    L.para('No verdict: no oil in scope for this case.', { size: 9, color: GREY });
  }

  const k = keyFigures(u, c);
  const rows: string[][] = [];
  const half = Math.ceil(k.length / 2);
  for (let r = 0; r < half; r++) {
    const a = k[r];
    const b = k[r + half];
    rows.push([a?.[0] ?? '', a?.[1] ?? '', b?.[0] ?? '', b?.[1] ?? '']);
  }
  L.table(
    [
      { header: 'Key figure', width: 0.3 },
      { header: 'Value', width: 0.2, align: 'right' },
      { header: 'Key figure', width: 0.3 },
      { header: 'Value', width: 0.2, align: 'right' },
    ],
    rows,
    { zebra: true, fontSize: 7.5 },
  );
  for (const note of [c.filmNote, c.micropittingAdvisory]) if (note) L.para(note, { size: 7.5, color: GREY, gap: 2 });

  // One stacked strip: the four charts share one position axis A–E (same box left and width, the
  // axis title under the last only), each with the figures that matter beside it.
  if (L.room < 440) L.newPage();
  const gap = 8;
  const side = 132;
  const w = L.width - side - 10;
  const specs = chartsOf(ctx, c);
  const h = Math.min(165, (L.room - gap * (specs.length - 1) - 4) / specs.length);
  const top = L.y + 4;
  const figures = stripFigures(u, c);
  specs.forEach((spec, i) => {
    const y = top + i * (h + gap);
    drawChart(doc, { x: L.left, y, w, h }, i === specs.length - 1 ? spec : { ...spec, xLabel: '' });
    let fy = y + 22;
    for (const [label, value] of figures[i] ?? []) {
      L.font(false, 7.5, GREY).text(label, L.left + w + 10, fy, { width: side, lineBreak: false });
      L.font(true, 8.5).text(value, L.left + w + 10, fy + 9, { width: side, lineBreak: false });
      fy += 24;
    }
  });
  L.y = top + specs.length * (h + gap);
}

/** Beside each chart of the strip, in its order: the figures a reader looks for there. */
function stripFigures(u: Units, c: CaseResult): Row[][] {
  const hmin = c.path.film?.filmThicknessMin_um;
  const hminAtMin = hmin && hmin.length ? Math.min(...hmin) : null;
  return [
    [['σH,max', u.fmt(c.maxHertzStress_MPa, 'stress')], ['σH at C', u.fmt(c.pitch.hertzStress_MPa, 'stress')]],
    [['v on the pitch line', u.fmt(c.pitchLineVelocity_mps, 'velocity')]],
    [['λmin', formatNumber(c.lambdaMin, 3)], ['regime at λmin', c.regime ? REGIME_WORDS[c.regime] : DASH], ['least hmin', u.fmt(hminAtMin, 'film', 3)]],
    [
      ['θB,max', u.fmt(c.maxContactTemperature_C, 'temperature')],
      c.scuffingTemperatureAtLeast ? ['θS (oil above stage 12)', 'not limiting'] : ['θS', u.fmt(c.scuffingTemperature_C, 'temperature')],
      ['θfl,max (a rise)', u.fmt(c.maxFlashTemperature_K, 'temperatureRise')],
      ['SB', formatNumber(c.scuffingSafety, 3)],
    ],
  ];
}

type Row = [string, string];

function keyFigures(u: Units, c: CaseResult): Row[] {
  const at = (x: number | null): string => (x === null ? '' : ` at ${u.num(x, 'length')} ${u.unit('length')}`);
  const o = c.oilAtTemperature;
  const st = (x: CaseResult['requiredFzgStage']) => (x === null ? DASH : x === '>12' ? 'above 12' : `stage ${x}`);
  const stage = c.requiredFzgStage === null ? DASH : `${st(c.requiredFzgStage)} (flash), ${st(c.requiredFzgStageIntegral)} (integral)`;
  return [
    ['Pinion speed n1', u.fmt(c.pinionSpeed_rpm, 'speed', 5)],
    ['Pinion torque T1', u.fmt(c.pinionTorque_Nm, 'torque')],
    ['Application factor KA', formatNumber(c.applicationFactor, 3)],
    ['Oil temperature θoil', u.fmt(c.oilTemperature_C, 'temperature')],
    ['Pitch-line velocity v (on dw1)', u.fmt(c.pitchLineVelocity_mps, 'velocity')],
    ['σH nominal, ISO 6336-2 (σH0)', `${u.fmt(c.nominalContactStress_MPa, 'stress')} (${u.num(c.nominalContactStressBasic_MPa, 'stress')})`],
    ['σH,max along the path', `${u.fmt(c.maxHertzStress_MPa, 'stress')}${at(c.maxHertzStressPosition_mm)}`],
    ['σH at C, one pair / shared', `${u.num(c.pitchHertzStress_MPa, 'stress')} / ${u.fmt(c.pitch.hertzStress_MPa, 'stress')}`],
    ['Oil viscosity in the film ν / η', o ? `${u.num(o.viscosity_mm2s, 'kinematicViscosity')} ${u.unit('kinematicViscosity')} / ${u.fmt(o.dynamicViscosity_mPas, 'dynamicViscosity')}` : DASH],
    ['Pressure–viscosity α', o ? u.fmt(o.pressureViscosity_1perGPa, 'pressureViscosity') : DASH],
    ['Film formula, thermal factor φT', c.filmFormula ? `${c.filmFormula}, ${formatNumber(c.thermalFilmFactor, 3)}` : DASH],
    ['hmin at C', u.fmt(c.pitch.filmThicknessMin_um, 'film', 3)],
    ['λmin', `${formatNumber(c.lambdaMin, 3)}${at(c.lambdaMinPosition_mm)}`],
    ['Regime (at λmin)', c.regime ? REGIME_WORDS[c.regime] : DASH],
    ['λGF,min (ISO/TS 6336-22)', formatNumber(c.lambdaGFMin, 3)],
    ['Micropitting Sλ (ISO/TS 6336-22)', c.micropitting ? (c.micropitting.safety === null ? 'stage not given' : `${c.micropitting.safetyAtLeast ? '≥ ' : ''}${formatNumber(c.micropitting.safety, 3)}`) : DASH],
    ['Friction coefficient μm', c.frictionCoefficient === null ? DASH : `${formatNumber(c.frictionCoefficient, 3)} (${c.frictionSource ?? DASH})`],
    ['Bulk temperature θM', u.fmt(c.bulkTemperature_C, 'temperature')],
    ['Flash temperature θfl,max', u.fmt(c.maxFlashTemperature_K, 'temperatureRise')],
    ['Contact temperature θB,max', `${u.fmt(c.maxContactTemperature_C, 'temperature')}${at(c.maxContactTemperaturePosition_mm)}`],
    // An oil that passed stage 12 has no measured θS: the stage-12 value is a floor, not a limit.
    ['Scuffing temperature θS', c.scuffingTemperatureAtLeast ? 'above stage 12: not limiting' : u.fmt(c.scuffingTemperature_C, 'temperature')],
    ['Scuffing safety SB', formatNumber(c.scuffingSafety, 3)],
    ['Integral temperature θint / θintS', `${u.num(c.integralTemperature_C, 'temperature')} / ${u.fmt(c.integralScuffingTemperature_C, 'temperature')}`],
    ['Integral safety SintS', formatNumber(c.integralSafety, 3)],
    ['FZG A/8.3/90 stage needed', stage],
    ['Scuffing probability', formatPercent(c.scuffingProbability, 2)],
  ];
}

function chartsOf(ctx: RecordContext, c: CaseResult): ChartSpec[] {
  const { units: u, results, review } = ctx;
  const X = (mm: number): number => u.value(mm, 'length');
  const p = results.gear.points_mm;
  const markers = (['A', 'B', 'C', 'D', 'E'] as const).map((k) => ({ x: X(p[k]), label: k }));
  const xLabel = `position on the line of action from T1 (${u.unit('length')})`;
  const path = pathPoints(c.path);
  const series = (get: (pt: PointResult) => number | null, q: Parameters<Units['value']>[1]): Array<[number, number | null]> =>
    path.map((pt) => {
      const v = get(pt);
      return [X(pt.position_mm), v === null ? null : u.value(v, q)];
    });

  const hertz: ChartSpec = {
    title: 'Hertz contact stress σH',
    xLabel,
    yLabel: `σH (${u.unit('stress')})`,
    series: [{ label: 'σH with load sharing', points: series((pt) => pt.hertzStress_MPa, 'stress'), color: OKABE_ITO.blue }],
    xMarkers: markers,
    yInclude: [0],
  };

  const velocity: ChartSpec = {
    title: 'Sliding and sum velocity',
    xLabel,
    yLabel: `velocity (${u.unit('velocity')})`,
    series: [
      { label: 'sliding vg', points: series((pt) => pt.slidingVelocity_mps, 'velocity'), color: OKABE_ITO.vermillion },
      { label: 'sum vΣ', points: series((pt) => pt.sumVelocity_mps, 'velocity'), color: OKABE_ITO.blue, dash: [5, 2.5] },
    ],
    xMarkers: markers,
    yInclude: [0],
  };

  const lo = review.policy.boundaryBelowLambda;
  const hi = review.policy.fullFilmFromLambda;
  const film: ChartSpec = {
    title: 'Specific film thickness λ, with the regimes',
    xLabel,
    yLabel: 'λ (–)',
    series: [{ label: 'λ', points: path.map((pt) => [X(pt.position_mm), pt.lambda]), color: OKABE_ITO.black }],
    xMarkers: markers,
    bands: [
      { from: 0, to: lo, color: REGIME_COLOURS.boundary, opacity: 0.14, label: REGIME_WORDS.boundary, hatch: true },
      { from: lo, to: hi, color: REGIME_COLOURS.mixed, opacity: 0.16, label: REGIME_WORDS.mixed },
      { from: hi, to: 1e9, color: REGIME_COLOURS['full-film'], opacity: 0.16, label: REGIME_WORDS['full-film'] },
    ],
    yInclude: [0, lo * 1.15],
    emptyText: 'no film: no oil in scope',
  };

  const temps: ChartSpec = {
    title: 'Contact temperature θB against θS',
    xLabel,
    yLabel: `temperature (${u.unit('temperature')})`,
    series: [{ label: 'θB = θM + θfl', points: series((pt) => pt.contactTemperature_C, 'temperature'), color: OKABE_ITO.vermillion }],
    refLines: [
      // An oil above stage 12 has no limiting θS: no line is drawn (the figure beside says so).
      ...(c.scuffingTemperature_C !== null && !c.scuffingTemperatureAtLeast
        ? [{ y: u.value(c.scuffingTemperature_C, 'temperature'), label: 'θS', color: OKABE_ITO.blue, dash: [6, 3] as [number, number] }]
        : []),
      ...(c.bulkTemperature_C !== null ? [{ y: u.value(c.bulkTemperature_C, 'temperature'), label: 'θM bulk', color: GREY, dash: [1.5, 2] as [number, number] }] : []),
    ],
    xMarkers: markers,
    yInclude: [u.value(c.oilTemperature_C, 'temperature')],
    emptyText: 'no temperatures: no oil in scope',
  };
  return [hertz, velocity, film, temps];
}


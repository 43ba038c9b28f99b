import { contourSegments } from '../../engine/sweep/contour';
import type { OperatingMapResult } from '../../review/operatingMaps';
import type { RecordContext } from '../context';
import { FONT_BOLD, FONT_REGULAR } from '../layout';
import { niceTicks } from '../niceTicks';
import { formatNumber } from '../units';
import { GREY, INK, OKABE_ITO, VERDICT_COLOURS, VERDICT_WORDS } from '../words';
import { drawVerdictIcon } from '../icons';
import type { VerdictCode } from '../../review/results';

const CODES: readonly VerdictCode[] = ['aw-suffices', 'ep-warranted', 'beyond-oil'];
const MAP_HEIGHT = 180;

/** A pale, opaque tint of a colour (mixed with white), so touching cells leave no seams. */
function tint(hex: string, amount = 0.5): string {
  const n = Number.parseInt(hex.slice(1), 16);
  const mix = (c: number) => Math.round(c + (255 - c) * amount);
  const [r, g, b] = [(n >> 16) & 255, (n >> 8) & 255, n & 255].map(mix) as [number, number, number];
  return `#${((1 << 24) | (r << 16) | (g << 8) | b).toString(16).slice(1)}`;
}

/**
 * The operating map: one heat map per oil (for its governing load case) of the verdict over oil
 * temperature × load, with the SB = SB,min and λ = target lines and the duty point. Vector cells,
 * merged into runs along each row, so the page stays small.
 */
export function drawOperatingMaps(ctx: RecordContext, maps: readonly OperatingMapResult[]): void {
  const { layout: L, results, review, units } = ctx;
  if (maps.length === 0 || results.verdicts.length === 0) return;
  L.newPage();
  L.heading('Operating map: oil temperature × load');
  L.para(
    `Each map sweeps the oil temperature over ${units.fmt(review.policy.temperatureRange_C[0], 'temperature')}…${units.fmt(review.policy.temperatureRange_C[1], 'temperature')} and the load over 10–150 % of the governing case's torque, with the same models as the case results. The solid line is SB = ${formatNumber(review.policy.scuffingSafetyMin, 3)} (below and right of it the flash-temperature margin is short); the dashed line is λ = ${formatNumber(review.policy.lambdaTarget, 3)} (above it the film is thinner than the target). The ring marks the case itself.`,
    { size: 8.5 },
  );
  for (const v of results.verdicts) {
    const map = maps.find((m) => m.oil === v.oil && m.loadCase === v.governingLoadCase);
    if (!map) continue;
    L.ensure(250);
    L.heading(`${v.oil} — governing case: ${v.governingLoadCase}`, 3);
    const top = L.y + 4;
    drawMap(ctx, map, L.left + 40, top, L.width - 170, MAP_HEIGHT);
    L.y = top + MAP_HEIGHT + 30; // drawing text moves the cursor; set it below the axis title
    L.doc.x = L.left;
  }
  legend(ctx);
}

function drawMap(ctx: RecordContext, m: OperatingMapResult, x: number, y: number, w: number, h: number): void {
  const doc = ctx.layout.doc;
  const rows = m.temperatures_C.length;
  const cols = m.loadPercent.length;
  const cw = w / cols;
  const rh = h / rows;
  // Rows: the lowest temperature at the bottom.
  const cellY = (r: number) => y + h - (r + 1) * rh;
  doc.save();
  for (let r = 0; r < rows; r++) {
    let c = 0;
    while (c < cols) {
      const code = m.verdict[r]?.[c] as VerdictCode;
      let end = c + 1;
      while (end < cols && m.verdict[r]?.[end] === code) end++;
      doc.rect(x + c * cw, cellY(r), (end - c) * cw + 0.3, rh + 0.3).fillColor(tint(VERDICT_COLOURS[code])).fill();
      c = end;
    }
  }
  const toXY = (c: number, r: number): [number, number] => [x + (c + 0.5) * cw, y + h - (r + 0.5) * rh];
  const line = (segs: ReturnType<typeof contourSegments>, colour: string, dash: boolean) => {
    doc.save().lineWidth(1.3).strokeColor(colour);
    if (dash) doc.dash(4, { space: 2.5 });
    for (const s of segs) {
      const [x0, y0] = toXY(s.c0, s.r0);
      const [x1, y1] = toXY(s.c1, s.r1);
      doc.moveTo(x0, y0).lineTo(x1, y1);
    }
    doc.stroke().undash().restore();
  };
  const policy = ctx.review.policy;
  line(contourSegments(rows, cols, (r, c) => m.scuffingSafety[r]?.[c] ?? Infinity, policy.scuffingSafetyMin), INK, false);
  line(contourSegments(rows, cols, (r, c) => m.lambdaMin[r]?.[c] ?? 0, policy.lambdaTarget), OKABE_ITO.blue, true);
  doc.rect(x, y, w, h).lineWidth(0.6).strokeColor(INK).stroke();

  // Axes
  doc.font(FONT_REGULAR).fontSize(6.5).fillColor(INK);
  const [l0, l1] = [m.loadPercent[0] as number, m.loadPercent[cols - 1] as number];
  const [t0, t1] = [m.temperatures_C[0] as number, m.temperatures_C[rows - 1] as number];
  const px = (load: number) => x + (0.5 + ((load - l0) / (l1 - l0)) * (cols - 1)) * cw;
  const py = (temp: number) => y + h - (0.5 + ((temp - t0) / (t1 - t0)) * (rows - 1)) * rh;
  for (const load of niceTicks(l0, l1, 7).values) {
    if (load < l0 || load > l1) continue;
    doc.moveTo(px(load), y + h).lineTo(px(load), y + h + 3).strokeColor(INK).lineWidth(0.5).stroke();
    doc.text(formatNumber(load, 3), px(load) - 12, y + h + 4, { width: 24, align: 'center' });
  }
  const units = ctx.units;
  for (const temp of niceTicks(units.value(t0, 'temperature'), units.value(t1, 'temperature'), 6).values) {
    const tc = units.system === 'us' ? ((temp - 32) * 5) / 9 : temp;
    if (tc < t0 - 1e-9 || tc > t1 + 1e-9) continue;
    doc.moveTo(x - 3, py(tc)).lineTo(x, py(tc)).strokeColor(INK).lineWidth(0.5).stroke();
    doc.text(formatNumber(temp, 3), x - 30, py(tc) - 3, { width: 26, align: 'right' });
  }
  doc.text('load (% of the case torque)', x, y + h + 13, { width: w, align: 'center' });
  doc.save().rotate(-90, { origin: [x - 34, y + h / 2] }).text(`oil temperature (${units.unit('temperature')})`, x - 34 - h / 2, y + h / 2 - 4, { width: h, align: 'center' }).restore();
  // The case itself: 100 % at its oil temperature.
  const lc = ctx.review.loadCases.find((c) => c.name === m.loadCase);
  if (lc && lc.oilTemperature_C >= t0 && lc.oilTemperature_C <= t1) {
    doc.circle(px(100), py(lc.oilTemperature_C), 4).lineWidth(1.4).strokeColor(INK).stroke();
  }
  doc.restore();
}

function legend(ctx: RecordContext): void {
  const { layout: L } = ctx;
  const doc = L.doc;
  L.ensure(60);
  let yy = L.y + 4;
  for (const code of CODES) {
    doc.save().rect(L.left, yy, 14, 9).fillColor(tint(VERDICT_COLOURS[code])).fill().restore();
    drawVerdictIcon(doc, code, L.left + 18, yy, 9);
    doc.font(FONT_REGULAR).fontSize(8).fillColor(INK).text(VERDICT_WORDS[code], L.left + 32, yy, { lineBreak: false });
    yy += 13;
  }
  doc.font(FONT_BOLD).fontSize(7.5).fillColor(GREY);
  L.y = yy + 4;
  L.para('Solid line: SB = SB,min. Dashed line: λ = λ target. Colour is always paired with the word and the icon above.', { size: 7.5, color: GREY });
}

/**
 * Vector line charts drawn with pdfkit paths (no raster): axes with units and nice ticks,
 * A–E markers along the line of action, horizontal bands and reference lines, and an optional
 * right axis that is a fixed multiple of the left one.
 */
import { niceTicks, tickLabel, type Ticks } from './niceTicks';
import { FONT_BOLD, FONT_REGULAR } from './layout';
import { GREY, INK, RULE } from './words';

type Doc = PDFKit.PDFDocument;

export interface Box {
  x: number;
  y: number;
  w: number;
  h: number;
}

export interface Series {
  label: string;
  /** [x, y]; a null y leaves a gap. */
  points: ReadonlyArray<readonly [number, number | null]>;
  color: string;
  dash?: [number, number];
  width?: number;
}

export interface Band {
  from: number;
  to: number;
  color: string;
  opacity: number;
  label: string;
  /** Diagonal hatching as well as the tint, so the band reads without colour. */
  hatch?: boolean;
}

export interface RefLine {
  y: number;
  label: string;
  color: string;
  dash?: [number, number];
}

export interface ChartSpec {
  title: string;
  xLabel: string;
  yLabel: string;
  series: Series[];
  xMarkers?: ReadonlyArray<{ x: number; label: string }>;
  bands?: Band[];
  refLines?: RefLine[];
  /** Values the y axis must include besides the data (0, a threshold …). */
  yInclude?: number[];
  /** Right axis showing `factor` × the left value, with its own label. */
  rightAxis?: { label: string; factor: number };
  /** Shown in the plot area when no series has a point. */
  emptyText?: string;
}

const TICK_FONT = 6.5;
const LABEL_FONT = 7;

function dataRange(values: number[]): [number, number] {
  let lo = Infinity;
  let hi = -Infinity;
  for (const v of values) {
    if (!Number.isFinite(v)) continue;
    if (v < lo) lo = v;
    if (v > hi) hi = v;
  }
  return [lo, hi];
}

export function drawChart(doc: Doc, box: Box, spec: ChartSpec): void {
  const saveX = doc.x;
  const saveY = doc.y;
  doc.save();

  const xs: number[] = [];
  const ys: number[] = [];
  for (const s of spec.series) {
    for (const [x, y] of s.points) {
      xs.push(x);
      if (y !== null && Number.isFinite(y)) ys.push(y);
    }
  }
  for (const m of spec.xMarkers ?? []) xs.push(m.x);
  for (const r of spec.refLines ?? []) ys.push(r.y);
  const hasData = ys.length > 0;
  for (const v of spec.yInclude ?? []) ys.push(v);

  // Title and legend
  doc.font(FONT_BOLD).fontSize(8).fillColor(INK);
  const titleH = doc.heightOfString(spec.title, { width: box.w });
  doc.text(spec.title, box.x, box.y, { width: box.w });
  let legendY = box.y + titleH + 2;
  let lx = box.x;
  doc.font(FONT_REGULAR).fontSize(LABEL_FONT);
  const legendItems: Array<{ label: string; color: string; dash?: [number, number]; width?: number }> = [...spec.series, ...(spec.refLines ?? [])];
  for (const it of legendItems) {
    const w = 16 + doc.widthOfString(it.label) + 10;
    if (lx + w > box.x + box.w && lx > box.x) {
      lx = box.x;
      legendY += 9;
    }
    doc.save();
    doc.moveTo(lx, legendY + 3.5).lineTo(lx + 13, legendY + 3.5).lineWidth(it.width ?? 1.4).strokeColor(it.color);
    if (it.dash) doc.dash(it.dash[0], { space: it.dash[1] });
    doc.stroke();
    doc.restore();
    doc.font(FONT_REGULAR).fontSize(LABEL_FONT).fillColor(INK).text(it.label, lx + 16, legendY, { lineBreak: false });
    lx += w;
  }

  const rightGutter = spec.rightAxis ? 34 : 8;
  const plot: Box = { x: box.x + 36, y: legendY + 21, w: 0, h: 0 };
  plot.w = box.x + box.w - rightGutter - plot.x;
  plot.h = box.y + box.h - 26 - plot.y;

  const [x0, x1] = dataRange(xs);
  const xt: Ticks = niceTicks(x0, x1, Math.max(3, Math.floor(plot.w / 45)));
  const [y0, y1] = dataRange(ys);
  const yt: Ticks = niceTicks(y0, y1, Math.max(3, Math.floor(plot.h / 28)));
  // The x axis spans the data exactly (A to E); ticks outside it are dropped.
  const xmin = Number.isFinite(x0) ? x0 : xt.min;
  const xmax = Number.isFinite(x1) && x1 > xmin ? x1 : xmin + 1;
  const X = (x: number): number => plot.x + ((x - xmin) / (xmax - xmin)) * plot.w;
  const Y = (y: number): number => plot.y + plot.h - ((y - yt.min) / (yt.max - yt.min)) * plot.h;

  // Bands
  doc.save();
  doc.rect(plot.x, plot.y, plot.w, plot.h).clip();
  for (const b of spec.bands ?? []) {
    const top = Y(Math.min(b.to, yt.max));
    const bot = Y(Math.max(b.from, yt.min));
    if (bot - top <= 0.2) continue;
    doc.rect(plot.x, top, plot.w, bot - top).fillOpacity(b.opacity).fillColor(b.color).fill();
    doc.fillOpacity(1);
    if (b.hatch) {
      doc.save();
      doc.rect(plot.x, top, plot.w, bot - top).clip();
      for (let d = -plot.h; d < plot.w; d += 7) {
        doc.moveTo(plot.x + d, bot).lineTo(plot.x + d + (bot - top), top);
      }
      doc.lineWidth(0.35).strokeOpacity(0.45).strokeColor(b.color).stroke();
      doc.restore();
    }
  }
  doc.restore();
  doc.fillOpacity(1).strokeOpacity(1);

  // Grid and ticks
  doc.font(FONT_REGULAR).fontSize(TICK_FONT);
  for (const v of yt.values) {
    const y = Y(v);
    doc.moveTo(plot.x, y).lineTo(plot.x + plot.w, y).lineWidth(0.3).strokeColor('#d9d9d9').stroke();
    doc.fillColor(INK).text(tickLabel(v, yt.step), box.x, y - 3, { width: plot.x - box.x - 3, align: 'right', lineBreak: false });
  }
  if (spec.rightAxis) {
    // The right axis gets its own nice ticks, placed where they fall on the left scale.
    const f = spec.rightAxis.factor;
    const rt = niceTicks(yt.min * f, yt.max * f, Math.max(3, Math.floor(plot.h / 28)));
    for (const r of rt.values) {
      const v = r / f;
      if (v < yt.min - 1e-9 || v > yt.max + 1e-9) continue;
      const y = Y(v);
      doc.moveTo(plot.x + plot.w, y).lineTo(plot.x + plot.w + 2.5, y).lineWidth(0.5).strokeColor(INK).stroke();
      doc.fillColor(INK).text(tickLabel(r, rt.step), plot.x + plot.w + 4, y - 3, { width: rightGutter - 4, align: 'left', lineBreak: false });
    }
  }
  for (const v of xt.values) {
    if (v < xmin - 1e-9 || v > xmax + 1e-9) continue;
    const x = X(v);
    doc.moveTo(x, plot.y + plot.h).lineTo(x, plot.y + plot.h + 2.5).lineWidth(0.5).strokeColor(INK).stroke();
    doc.fillColor(INK).text(tickLabel(v, xt.step), x - 20, plot.y + plot.h + 4, { width: 40, align: 'center', lineBreak: false });
  }

  // Band labels, in words
  doc.font(FONT_REGULAR).fontSize(6.5);
  for (const b of spec.bands ?? []) {
    const top = Y(Math.min(b.to, yt.max));
    const bot = Y(Math.max(b.from, yt.min));
    if (bot - top < 8) continue;
    doc.fillColor(INK).text(b.label, plot.x + plot.w - 90, top + 2, { width: 87, align: 'right', lineBreak: false });
  }

  // A–E markers
  const markers = [...(spec.xMarkers ?? [])].sort((a, b) => a.x - b.x);
  let lastLabelX = -Infinity;
  let lift = 0;
  for (const m of markers) {
    const x = X(m.x);
    doc.save();
    doc.moveTo(x, plot.y).lineTo(x, plot.y + plot.h).lineWidth(0.5).strokeColor(GREY).dash(2, { space: 2 }).stroke();
    doc.restore();
    lift = x - lastLabelX < 9 ? (lift === 0 ? 7 : 0) : 0;
    doc.font(FONT_BOLD).fontSize(6.5).fillColor(INK).text(m.label, x - 5, plot.y - 8 - lift, { width: 10, align: 'center', lineBreak: false });
    lastLabelX = x;
  }

  // Reference lines
  for (const r of spec.refLines ?? []) {
    if (r.y < yt.min || r.y > yt.max) continue;
    const y = Y(r.y);
    doc.save();
    doc.moveTo(plot.x, y).lineTo(plot.x + plot.w, y).lineWidth(1.2).strokeColor(r.color);
    if (r.dash) doc.dash(r.dash[0], { space: r.dash[1] });
    doc.stroke();
    doc.restore();
  }

  // Series
  doc.save();
  doc.rect(plot.x - 1, plot.y - 1, plot.w + 2, plot.h + 2).clip();
  for (const s of spec.series) {
    let pen = false;
    for (const [x, y] of s.points) {
      if (y === null || !Number.isFinite(y) || !Number.isFinite(x)) {
        pen = false;
        continue;
      }
      if (pen) doc.lineTo(X(x), Y(y));
      else doc.moveTo(X(x), Y(y));
      pen = true;
    }
    doc.lineWidth(s.width ?? 1.4).strokeColor(s.color).lineJoin('round');
    if (s.dash) doc.dash(s.dash[0], { space: s.dash[1] });
    else doc.undash();
    doc.stroke();
  }
  doc.undash();
  doc.restore();

  // Frame and axis labels
  doc.rect(plot.x, plot.y, plot.w, plot.h).lineWidth(0.6).strokeColor(RULE).stroke();
  if (!hasData && spec.emptyText) {
    doc.font(FONT_REGULAR).fontSize(7.5);
    const tw = doc.widthOfString(spec.emptyText) + 10;
    doc.rect(plot.x + (plot.w - tw) / 2, plot.y + plot.h / 2 - 7, tw, 15).fillColor('#ffffff').fill();
    doc.fillColor(GREY).text(spec.emptyText, plot.x + 6, plot.y + plot.h / 2 - 4, { width: plot.w - 12, align: 'center', lineBreak: false });
  }
  doc.font(FONT_REGULAR).fontSize(LABEL_FONT).fillColor(INK);
  doc.text(spec.xLabel, plot.x, plot.y + plot.h + 13, { width: plot.w, align: 'center', lineBreak: false });
  verticalText(doc, spec.yLabel, box.x + 1, plot.y + plot.h / 2);
  if (spec.rightAxis) verticalText(doc, spec.rightAxis.label, box.x + box.w - 8, plot.y + plot.h / 2);

  doc.restore();
  doc.x = saveX;
  doc.y = saveY;
}

function verticalText(doc: Doc, text: string, x: number, cy: number): void {
  doc.font(FONT_REGULAR).fontSize(LABEL_FONT);
  const w = doc.widthOfString(text);
  doc.save();
  doc.rotate(-90, { origin: [x, cy] });
  doc.fillColor(INK).text(text, x - w / 2, cy - 1, { lineBreak: false });
  doc.restore();
}

import type { OperatingMapResult } from '../../../app/review/operatingMaps';
import type { VerdictCode } from '../../../app/review/results';
import { VERDICT_COLOURS } from '../../../app/review/vocabulary';
import { formatResult } from '../../units/format';
import { fromDisplay, toDisplay, unitLabel, type UnitSystem } from '../../units/units';
import { colsOf, fractionalIndex, niceTicks, rowsOf, type Cell, type GridPoint } from './mapView';

export interface Palette {
  readonly fg: string;
  readonly muted: string;
  readonly surface: string;
  readonly line: string;
  /** The λ line's colour (Okabe–Ito blue, or sky blue on a dark sheet). */
  readonly lambda: string;
  readonly dark: boolean;
}

export interface HeatMapDrawing {
  readonly map: OperatingMapResult;
  readonly width: number;
  readonly height: number;
  readonly units: UnitSystem;
  readonly palette: Palette;
  /** The SB = SB,min and λ = target lines as polylines in grid indices (chainSegments). */
  readonly contours: { readonly sb: readonly GridPoint[][]; readonly lambda: readonly GridPoint[][]; readonly micropitting?: readonly GridPoint[][] };
  /** The case's own point as fractional indices. */
  readonly point: { readonly r: number; readonly c: number; readonly inside: boolean };
  readonly cursor: Cell | null;
}

/** Plot area inside the canvas, CSS pixels. */
export const MARGIN = { left: 58, right: 14, top: 12, bottom: 44 } as const;

/** The cell under a point of the canvas (CSS pixels), or null outside the plot. */
export function cellAt(map: OperatingMapResult, width: number, height: number, x: number, y: number): Cell | null {
  const w = width - MARGIN.left - MARGIN.right;
  const h = height - MARGIN.top - MARGIN.bottom;
  const c = Math.floor(((x - MARGIN.left) / w) * colsOf(map));
  const r = Math.floor(((MARGIN.top + h - y) / h) * rowsOf(map));
  return r >= 0 && r < rowsOf(map) && c >= 0 && c < colsOf(map) ? { r, c } : null;
}

/** a over b with opacity t; a itself if either is not an opaque colour. The canvas normalises any CSS colour to #rrggbb. */
function tint(ctx: CanvasRenderingContext2D, a: string, b: string, t: number): string {
  const rgb = (s: string) => {
    ctx.fillStyle = s;
    const n = String(ctx.fillStyle);
    return /^#[0-9a-f]{6}$/i.test(n) ? [1, 3, 5].map((i) => parseInt(n.slice(i, i + 2), 16)) : null;
  };
  const x = rgb(a);
  const y = rgb(b);
  if (!x || !y) return a;
  return `rgb(${x.map((v, i) => Math.round(t * v + (1 - t) * (y[i] ?? 0))).join(',')})`;
}

/** The verdict's shape (as on its badge): circle, triangle, octagon. */
function glyph(ctx: CanvasRenderingContext2D, code: VerdictCode, x: number, y: number, s: number): void {
  ctx.beginPath();
  if (code === 'aw-suffices') ctx.arc(x, y, s, 0, 2 * Math.PI);
  else if (code === 'ep-warranted') {
    ctx.moveTo(x, y - s * 1.1);
    ctx.lineTo(x + s, y + s * 0.75);
    ctx.lineTo(x - s, y + s * 0.75);
  } else {
    for (let k = 0; k < 8; k++) {
      const a = Math.PI / 8 + (k * Math.PI) / 4;
      ctx[k ? 'lineTo' : 'moveTo'](x + s * Math.cos(a), y + s * Math.sin(a));
    }
  }
  ctx.closePath();
  ctx.fill();
}

/** One operating map: verdict cells (pale tint plus a sparse lattice of shapes), iso-lines, the case's ring, axes and the cell cursor. */
export function drawHeatMap(ctx: CanvasRenderingContext2D, d: HeatMapDrawing): void {
  const { map, palette: p } = d;
  const rows = rowsOf(map);
  const cols = colsOf(map);
  const left = MARGIN.left;
  const top = MARGIN.top;
  const w = d.width - MARGIN.left - MARGIN.right;
  const h = d.height - MARGIN.top - MARGIN.bottom;
  const cw = w / cols;
  const ch = h / rows;
  const px = (c: number) => left + (c + 0.5) * cw;
  const py = (r: number) => top + h - (r + 0.5) * ch;

  ctx.save();
  ctx.fillStyle = p.surface;
  ctx.fillRect(0, 0, d.width, d.height);

  const fills = Object.fromEntries(Object.entries(VERDICT_COLOURS).map(([k, v]) => [k, tint(ctx, v, p.surface, p.dark ? 0.42 : 0.3)])) as Record<VerdictCode, string>;
  for (let r = 0; r < rows; r++) {
    const y0 = Math.round(top + h - (r + 1) * ch);
    const y1 = Math.round(top + h - r * ch);
    for (let c = 0; c < cols; c++) {
      const x0 = Math.round(left + c * cw);
      ctx.fillStyle = fills[map.verdict[r]?.[c] ?? 'beyond-oil'];
      ctx.fillRect(x0, y0, Math.round(left + (c + 1) * cw) - x0, y1 - y0);
    }
  }
  // Shapes every few cells, so the regions read without colour.
  const step = Math.max(1, Math.round(Math.max(rows, cols) / 10));
  const size = Math.min(4.5, Math.max(2.5, Math.min(cw, ch) * step * 0.18));
  ctx.globalAlpha = p.dark ? 0.9 : 0.75;
  for (let r = Math.floor(step / 2); r < rows; r += step) {
    for (let c = Math.floor(step / 2); c < cols; c += step) {
      const code = map.verdict[r]?.[c] ?? 'beyond-oil';
      ctx.fillStyle = VERDICT_COLOURS[code];
      glyph(ctx, code, px(c), py(r), size);
    }
  }
  ctx.globalAlpha = 1;

  ctx.lineCap = 'round';
  ctx.lineJoin = 'round';
  const stroke = (lines: readonly GridPoint[][], colour: string, dash: number[]) => {
    ctx.strokeStyle = colour;
    ctx.setLineDash(dash);
    ctx.beginPath();
    for (const line of lines) line.forEach((q, i) => ctx[i ? 'lineTo' : 'moveTo'](px(q.c), py(q.r)));
    ctx.stroke();
  };
  // A halo in the sheet's colour keeps each line legible on any tint; the λ line's halo is dashed with it.
  ctx.lineWidth = 4.5;
  stroke(d.contours.sb, p.surface, []);
  stroke(d.contours.lambda, p.surface, [8, 5]);
  ctx.lineWidth = 2.5;
  stroke(d.contours.sb, p.fg, []);
  stroke(d.contours.lambda, p.lambda, [8, 5]);
  // λGF,min = λGFP (micropitting): dotted, in the foreground colour over its own halo.
  const mp = d.contours.micropitting ?? [];
  ctx.lineWidth = 4.5;
  stroke(mp, p.surface, [1, 5]);
  ctx.lineWidth = 2.5;
  stroke(mp, p.fg, [1, 5]);
  ctx.setLineDash([]);

  // The case's own point: a ring (dashed at the edge when its temperature is off the map).
  const rx = px(Math.min(cols - 0.5, Math.max(-0.5, d.point.c)));
  const ry = py(Math.min(rows - 0.5, Math.max(-0.5, d.point.r)));
  ctx.lineWidth = 5;
  ctx.strokeStyle = p.surface;
  ctx.beginPath();
  ctx.arc(rx, ry, 7, 0, 2 * Math.PI);
  ctx.stroke();
  ctx.lineWidth = 2.5;
  ctx.strokeStyle = p.fg;
  if (!d.point.inside) ctx.setLineDash([3, 3]);
  ctx.stroke();
  ctx.setLineDash([]);

  if (d.cursor) {
    const x0 = left + d.cursor.c * cw;
    const y0 = top + h - (d.cursor.r + 1) * ch;
    const pad = 2;
    ctx.lineWidth = 3;
    ctx.strokeStyle = p.surface;
    ctx.strokeRect(x0 - pad, y0 - pad, cw + 2 * pad, ch + 2 * pad);
    ctx.lineWidth = 1.5;
    ctx.strokeStyle = p.fg;
    ctx.strokeRect(x0 - pad, y0 - pad, cw + 2 * pad, ch + 2 * pad);
  }

  drawAxes(ctx, d, { left, top, w, h, px, py });
  ctx.restore();
}

/** Tick values are round: no trailing zeros. */
const tickText = (v: number) => {
  const s = formatResult(v, 6);
  return s.includes('.') ? s.replace(/\.?0+$/, '') : s;
};

function drawAxes(ctx: CanvasRenderingContext2D, d: HeatMapDrawing, g: { left: number; top: number; w: number; h: number; px: (c: number) => number; py: (r: number) => number }): void {
  const { map, palette: p, units } = d;
  ctx.lineWidth = 1;
  ctx.strokeStyle = p.line;
  ctx.strokeRect(g.left + 0.5, g.top + 0.5, g.w, g.h);
  ctx.fillStyle = p.fg;
  ctx.strokeStyle = p.muted;
  ctx.font = '11px system-ui, sans-serif';

  const loads = map.loadPercent;
  ctx.textAlign = 'center';
  ctx.textBaseline = 'top';
  for (const l of niceTicks(loads[0] ?? 0, loads[loads.length - 1] ?? 100, 7)) {
    const x = g.px(fractionalIndex(loads, l));
    ctx.beginPath();
    ctx.moveTo(x, g.top + g.h);
    ctx.lineTo(x, g.top + g.h + 4);
    ctx.stroke();
    ctx.fillText(tickText(l), x, g.top + g.h + 6);
  }
  ctx.fillText('Load (% of the case torque)', g.left + g.w / 2, g.top + g.h + 24);

  const temps = map.temperatures_C;
  const shown = (c: number) => toDisplay('temperature', c, units);
  ctx.textAlign = 'right';
  ctx.textBaseline = 'middle';
  for (const t of niceTicks(shown(temps[0] ?? 0), shown(temps[temps.length - 1] ?? 100), 6)) {
    const y = g.py(fractionalIndex(temps, fromDisplay('temperature', t, units)));
    ctx.beginPath();
    ctx.moveTo(g.left - 4, y);
    ctx.lineTo(g.left, y);
    ctx.stroke();
    ctx.fillText(tickText(t), g.left - 6, y);
  }
  ctx.save();
  ctx.translate(14, g.top + g.h / 2);
  ctx.rotate(-Math.PI / 2);
  ctx.textAlign = 'center';
  ctx.fillText(`Oil temperature (${unitLabel('temperature', units)})`, 0, 0);
  ctx.restore();
}

import { Chart, Legend, LinearScale, LineController, LineElement, PointElement, Tooltip, type ChartType, type Plugin } from 'chart.js';
import type { Band } from './series';

/** Options of our two drawing plugins, read from `options.plugins`. */
export interface MarkerOptions {
  readonly markers: readonly { label: string; x: number }[];
  readonly color: string;
}
export interface BandOptions {
  readonly bands: readonly Band[];
  readonly textColor: string;
}
export interface CaptionOptions {
  readonly text: string;
  readonly color: string;
}
export interface BackgroundOptions {
  readonly color: string;
}

declare module 'chart.js' {
  // The merged interface must repeat chart.js's own type parameter, used or not.
  // eslint-disable-next-line @typescript-eslint/no-unused-vars
  interface PluginOptionsByType<TType extends ChartType> {
    flankMarkers?: MarkerOptions | false;
    regimeBands?: BandOptions | false;
    sheetBackground?: BackgroundOptions | false;
    axisCaption?: CaptionOptions | false;
  }
}

/** A–E: vertical lines across the plot with the letter at the top. */
const markersPlugin: Plugin<'line', MarkerOptions> = {
  id: 'flankMarkers',
  afterDatasetsDraw(chart, _args, opts) {
    if (!opts || !opts.markers) return;
    const { ctx, chartArea: area, scales } = chart;
    const x = scales.x;
    if (!x) return;
    ctx.save();
    ctx.strokeStyle = opts.color;
    ctx.fillStyle = opts.color;
    ctx.setLineDash([3, 3]);
    ctx.lineWidth = 1;
    ctx.font = '600 11px system-ui, sans-serif';
    ctx.textAlign = 'center';
    for (const m of opts.markers) {
      const px = x.getPixelForValue(m.x);
      if (px < area.left - 1 || px > area.right + 1) continue;
      ctx.beginPath();
      ctx.moveTo(px, area.top + 12);
      ctx.lineTo(px, area.bottom);
      ctx.stroke();
      ctx.fillText(m.label, px, area.top + 9);
    }
    ctx.restore();
  },
};

/** The y axis's title, upright above the axis (a rotated λ reads as γ). */
const captionPlugin: Plugin<'line', CaptionOptions> = {
  id: 'axisCaption',
  afterDraw(chart, _args, opts) {
    if (!opts || !opts.text) return;
    const { ctx, chartArea: area } = chart;
    ctx.save();
    ctx.fillStyle = opts.color;
    ctx.font = '12px system-ui, sans-serif';
    ctx.textAlign = 'left';
    ctx.textBaseline = 'bottom';
    ctx.fillText(opts.text, Math.max(2, area.left - 28), area.top - 3);
    ctx.restore();
  },
};

/** Regime bands on the λ axis: a pale fill with the regime's word in it (colour never alone). */
const bandsPlugin: Plugin<'line', BandOptions> = {
  id: 'regimeBands',
  beforeDatasetsDraw(chart, _args, opts) {
    if (!opts || !opts.bands) return;
    const { ctx, chartArea: area, scales } = chart;
    const y2 = scales.y;
    if (!y2) return;
    ctx.save();
    ctx.font = '11px system-ui, sans-serif';
    ctx.textAlign = 'left';
    for (const b of opts.bands) {
      const top = Math.max(area.top, y2.getPixelForValue(b.to));
      const bottom = Math.min(area.bottom, y2.getPixelForValue(b.from));
      if (bottom <= top) continue;
      ctx.globalAlpha = 0.14;
      ctx.fillStyle = b.color;
      ctx.fillRect(area.left, top, area.right - area.left, bottom - top);
      ctx.globalAlpha = 1;
      if (bottom - top > 12) {
        ctx.fillStyle = opts.textColor;
        ctx.fillText(b.label, area.left + 4, bottom - 4);
      }
    }
    ctx.restore();
  },
};

/** Paints the sheet's colour behind the chart, so an exported PNG is not transparent. */
const backgroundPlugin: Plugin<'line', BackgroundOptions> = {
  id: 'sheetBackground',
  beforeDraw(chart, _args, opts) {
    if (!opts || !opts.color) return;
    const { ctx, width, height } = chart;
    ctx.save();
    ctx.globalCompositeOperation = 'destination-over';
    ctx.fillStyle = opts.color;
    ctx.fillRect(0, 0, width, height);
    ctx.restore();
  },
};

/** Mirrors the tooltip's text on the canvas element (data-tooltip), for readers and tests. */
const tooltipMirrorPlugin: Plugin<'line'> = {
  id: 'tooltipMirror',
  afterDraw(chart) {
    const t = chart.tooltip;
    const text = t && t.opacity > 0 ? [...(t.title ?? []), ...(t.body ?? []).flatMap((b) => b.lines)].join(' | ') : '';
    if (chart.canvas.dataset.tooltip !== text) chart.canvas.dataset.tooltip = text;
  },
};

let registered = false;

/** Register only what the Mesh charts use (tree-shaken chart.js). */
export function registerCharts(): void {
  if (registered) return;
  Chart.register(LineController, LineElement, PointElement, LinearScale, Tooltip, Legend, markersPlugin, bandsPlugin, backgroundPlugin, tooltipMirrorPlugin, captionPlugin);
  registered = true;
}

export { Chart };

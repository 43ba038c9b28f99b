import { memo, useLayoutEffect, useRef, useState } from 'react';
import type { ChartConfiguration } from 'chart.js';
import { cssVar, useColorScheme } from '../../hooks/useColorScheme';
import { formatResult } from '../../units/format';
import { Chart, registerCharts } from './chartSetup';
import { updateInPlace } from './chartUpdate';
import { summarise, type ChartSpec } from './series';
import { toDisplay, unitLabel, type UnitSystem } from '../../units/units';

registerCharts();

const Y_AXIS_PX = 56;

function configOf(spec: ChartSpec): ChartConfiguration<'line', { x: number; y: number | null }[]> {
  const fg = cssVar('--fg') || '#1b1b1b';
  const grid = cssVar('--grid') || 'rgba(0,0,0,0.1)';
  const surface = cssVar('--surface') || '#ffffff';
  // The y title is drawn upright above the axis (axisCaption), so λ never reads as a rotated γ.
  const scale = (title: string, position: 'left' | 'bottom') => ({
    type: 'linear' as const,
    position,
    // bounds 'ticks' (chart.js's default for linear scales) ends each axis on a round tick.
    bounds: 'ticks' as const,
    title: { display: position === 'bottom', text: title, color: fg },
    ticks: { color: fg, maxTicksLimit: 8 },
    grid: { color: grid },
  });
  const lows = spec.series.flatMap((s) => s.points.map((p) => p.y)).filter((y): y is number => y !== null);
  const startAtZero = spec.bands !== undefined || (lows.length > 0 && Math.min(...lows) >= 0 && spec.id !== 'temperature');
  return {
    type: 'line',
    data: {
      datasets: spec.series.map((s) => ({
        label: s.label,
        data: s.points.map((p) => ({ x: p.x, y: p.y })),
        yAxisID: s.axis,
        borderColor: s.color,
        backgroundColor: s.color,
        borderDash: s.dash ? [...s.dash] : [],
        borderWidth: 2,
        pointRadius: 0,
        pointHitRadius: 6,
        spanGaps: false,
      })),
    },
    options: {
      animation: false,
      responsive: true,
      maintainAspectRatio: false,
      parsing: false,
      normalized: true,
      interaction: { mode: 'index', intersect: false },
      scales: {
        x: { ...scale(spec.xLabel, 'bottom'), suggestedMin: spec.markers[0]?.x, suggestedMax: spec.markers[spec.markers.length - 1]?.x },
        // A fixed width for the y axis: every chart of the strip puts A…E at the same place.
        y: { ...scale(spec.yLabel, 'left'), afterFit: (s: { width: number }) => { s.width = Y_AXIS_PX; }, ...(startAtZero ? { min: 0 } : {}), ...(spec.yMax !== undefined ? { suggestedMax: spec.yMax } : {}) },
      },
      layout: { padding: { top: 16 } },
      plugins: {
        // Line samples, dashed as the line is (a filled box would hide the dash).
        legend: {
          labels: {
            color: fg,
            usePointStyle: true,
            pointStyle: 'line',
            pointStyleWidth: 30,
            // chart.js takes a point-style sample's dash from the point, which has none: give it the line's.
            generateLabels: (chart) =>
              Chart.defaults.plugins.legend.labels.generateLabels(chart).map((item) => ({ ...item, lineDash: [...(((chart.data.datasets[item.datasetIndex ?? 0] as { borderDash?: number[] } | undefined)?.borderDash) ?? [])] })),
          },
        },
        axisCaption: { text: spec.yLabel, color: fg },
        tooltip: {
          callbacks: {
            title: (items) => (items[0] ? `${spec.xLabel.replace(/^Position along the path of contact/, 'Position')}: ${formatResult(items[0].parsed.x, 4)}` : ''),
            label: (item) => `${item.dataset.label ?? ''}: ${formatResult(item.parsed.y, 4)}`,
          },
        },
        flankMarkers: { markers: spec.markers, color: fg },
        regimeBands: spec.bands ? { bands: spec.bands, textColor: fg } : false,
        sheetBackground: { color: surface },
      },
    },
  };
}

/** Runs `job` after the browser has painted the frame in progress (a task queued from the frame's animation callback). */
function afterPaint(job: () => void): () => void {
  let timer: ReturnType<typeof setTimeout> | undefined;
  const frame = requestAnimationFrame(() => {
    timer = setTimeout(job, 0);
  });
  return () => {
    cancelAnimationFrame(frame);
    if (timer !== undefined) clearTimeout(timer);
  };
}

interface Props {
  readonly spec: ChartSpec;
  readonly fileStem: string;
  readonly units: UnitSystem;
  /** Told when the canvas shows `spec` (drawn now, or already showing the same numbers). */
  readonly onDrawn?: (spec: ChartSpec) => void;
}

/**
 * One Mesh chart, with its data summary on the element and a PNG export. Its first drawing (the
 * chart.js set-up, the costly part) waits until the browser has painted the sheet, so the sheet and
 * its verdict reach the screen first; afterwards new data is drawn with the commit that brings it,
 * in the same frame as the figures.
 */
function MeshChartView({ spec, fileStem, units, onDrawn }: Props) {
  const canvas = useRef<HTMLCanvasElement>(null);
  const chart = useRef<Chart<'line', { x: number; y: number | null }[]> | null>(null);
  const scheme = useColorScheme();
  const [png, setPng] = useState<string | null>(null);
  // What the canvas shows: new results with the same numbers here (the velocities, after a torque edit) need no redraw.
  const drawn = useRef<string | null>(null);
  // What the last commit asks to be drawn, for a first drawing that runs after paint.
  const wanted = useRef({ spec, scheme, onDrawn });
  const firstDraw = useRef<(() => void) | null>(null);

  useLayoutEffect(() => {
    wanted.current = { spec, scheme, onDrawn };
    const draw = () => {
      const { spec: s, scheme: sc, onDrawn: told } = wanted.current;
      if (!canvas.current) return;
      const key = `${sc}|${JSON.stringify(s)}`;
      if (!chart.current || drawn.current !== key) {
        drawn.current = key;
        const config = configOf(s);
        if (!chart.current) chart.current = new Chart(canvas.current, config);
        else updateInPlace(chart.current, config);
        setPng(null);
      }
      told?.(s);
    };
    if (chart.current) draw();
    else if (!firstDraw.current) {
      firstDraw.current = afterPaint(() => {
        firstDraw.current = null;
        draw();
      });
    }
  }, [spec, scheme, onDrawn]);

  useLayoutEffect(
    () => () => {
      firstDraw.current?.();
      firstDraw.current = null;
      chart.current?.destroy();
      chart.current = null;
    },
    [],
  );

  const summary = summarise(spec);
  const described = summary.map((s) => `${s.label} from ${formatResult(s.min, 3)} to ${formatResult(s.max, 3)}`).join('; ');
  return (
    <figure className="mesh-chart" data-chart={spec.id} data-summary={JSON.stringify(summary)}>
      <figcaption>
        <span>{spec.title}</span>
        <span className="mesh-chart__actions">
          <button type="button" onClick={() => setPng(canvas.current?.toDataURL('image/png') ?? null)}>
            PNG…
          </button>
          {png ? (
            <a href={png} download={`${fileStem}-${spec.id}.png`} className="download" data-testid={`png-${spec.id}`}>
              Save {spec.id}.png
            </a>
          ) : null}
        </span>
      </figcaption>
      <div className="mesh-chart__body">
        <div className="mesh-chart__plot">
          <canvas ref={canvas} role="img" aria-label={`${spec.title}: ${described}. A to E marked.`} />
        </div>
        <dl className="mesh-chart__figures" data-testid={`figures-${spec.id}`}>
          {spec.figures.map((f) => (
            <div key={f.label}>
              <dt>{f.label}</dt>
              <dd>{f.text ?? (f.value === null ? '—' : `${formatResult(toDisplay(f.kind, f.value, units), 4)}${unitLabel(f.kind, units) ? ` ${unitLabel(f.kind, units)}` : ''}`)}</dd>
            </div>
          ))}
        </dl>
      </div>
    </figure>
  );
}

/** Re-renders with new specs or units, not when the panel does for an edit (the review it passes to Film detail). */
export const MeshChart = memo(MeshChartView);

import { useEffect, useRef, useState } from 'react';
import type { ChartConfiguration } from 'chart.js';
import { cssVar, useColorScheme } from '../../hooks/useColorScheme';
import { formatResult } from '../../units/format';
import { Chart, registerCharts } from './chartSetup';
import { summarise, type ChartSpec } from './series';

registerCharts();

function configOf(spec: ChartSpec): ChartConfiguration<'line', { x: number; y: number | null }[]> {
  const fg = cssVar('--fg') || '#1b1b1b';
  const grid = cssVar('--grid') || 'rgba(0,0,0,0.1)';
  const surface = cssVar('--surface') || '#ffffff';
  const scale = (title: string, position: 'left' | 'right' | 'bottom') => ({
    type: 'linear' as const,
    position,
    title: { display: true, text: title, color: fg },
    ticks: { color: fg, maxTicksLimit: 8 },
    grid: { color: grid, drawOnChartArea: position !== 'right' },
  });
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
        x: { ...scale(spec.xLabel, 'bottom'), min: spec.markers[0]?.x, max: spec.markers[spec.markers.length - 1]?.x },
        y: scale(spec.yLabel, 'left'),
        ...(spec.y2Label ? { y2: { ...scale(spec.y2Label, 'right'), ...(spec.bands ? { min: 0, max: spec.y2Max } : {}) } } : {}),
      },
      plugins: {
        legend: { labels: { color: fg, boxHeight: 2 } },
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

/** One Mesh chart, with its data summary on the element and a PNG export. */
export function MeshChart({ spec, fileStem }: { readonly spec: ChartSpec; readonly fileStem: string }) {
  const canvas = useRef<HTMLCanvasElement>(null);
  const chart = useRef<Chart<'line', { x: number; y: number | null }[]> | null>(null);
  const scheme = useColorScheme();
  const [png, setPng] = useState<string | null>(null);

  useEffect(() => {
    if (!canvas.current) return;
    const config = configOf(spec);
    if (!chart.current) {
      chart.current = new Chart(canvas.current, config);
    } else {
      chart.current.data = config.data;
      chart.current.options = config.options ?? {};
      chart.current.update('none');
    }
    setPng(null);
  }, [spec, scheme]);

  useEffect(
    () => () => {
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
      <div className="mesh-chart__plot">
        <canvas ref={canvas} role="img" aria-label={`${spec.title}: ${described}. A to E marked.`} />
      </div>
    </figure>
  );
}

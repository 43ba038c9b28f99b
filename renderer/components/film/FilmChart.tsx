import { useEffect, useRef } from 'react';
import type { ChartConfiguration } from 'chart.js';
import { cssVar, useColorScheme } from '../../hooks/useColorScheme';
import { formatResult } from '../../units/format';
import { Chart, registerCharts } from '../mesh/chartSetup';
import type { FilmChartSpec } from './filmChart';

registerCharts();

function configOf(spec: FilmChartSpec): ChartConfiguration<'line', { x: number; y: number | null }[]> {
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
        x: { ...scale(spec.xLabel, 'bottom'), min: spec.xMin, max: spec.xMax },
        y: { ...scale(spec.yLabel, 'left'), min: 0 },
        y2: { ...scale(spec.y2Label, 'right'), min: 0, max: spec.y2Max },
      },
      plugins: {
        legend: { labels: { color: fg, boxHeight: 2 } },
        tooltip: { callbacks: { title: (items) => (items[0] ? `x/b: ${formatResult(items[0].parsed.x, 3)}` : ''), label: (item) => `${item.dataset.label ?? ''}: ${formatResult(item.parsed.y, 4)}` } },
        flankMarkers: { markers: spec.markers, color: fg },
        regimeBands: { bands: spec.bands, textColor: fg },
        sheetBackground: { color: surface },
      },
    },
  };
}

/** The Film detail chart: pressure and film across the contact, with the roughness and tribofilm bands. */
export function FilmChart({ spec, described }: { readonly spec: FilmChartSpec; readonly described: string }) {
  const canvas = useRef<HTMLCanvasElement>(null);
  const chart = useRef<Chart<'line', { x: number; y: number | null }[]> | null>(null);
  const scheme = useColorScheme();
  useEffect(() => {
    if (!canvas.current) return;
    const config = configOf(spec);
    if (!chart.current) chart.current = new Chart(canvas.current, config);
    else {
      chart.current.data = config.data;
      chart.current.options = config.options ?? {};
      chart.current.update('none');
    }
  }, [spec, scheme]);
  useEffect(
    () => () => {
      chart.current?.destroy();
      chart.current = null;
    },
    [],
  );
  return (
    <div className="film-chart__plot">
      <canvas ref={canvas} role="img" aria-label={described} data-testid="film-chart" />
    </div>
  );
}

import { useEffect, useRef } from 'react';
import type { GradeFinderResult } from '../../../app/review/results';
import { OKABE_ITO } from '../../../app/review/vocabulary';
import { cssVar } from '../../hooks/useColorScheme';
import { formatResult } from '../../units/format';
import { Chart, registerCharts } from '../mesh/chartSetup';
import { updateInPlace } from '../mesh/chartUpdate';

registerCharts();

type Pt = { x: number; y: number | null };

/**
 * λmin against the ISO VG as a curve, with the λ target as a line: the grades the lubrication
 * method can use solid, the heavier ones dotted and named as left out. x is the grade's place in
 * the ISO 3448 series (evenly spaced, as the series is geometric), labelled with the grade.
 */
export function GradeChart({ g, target }: { readonly g: GradeFinderResult; readonly target: number }) {
  const canvas = useRef<HTMLCanvasElement>(null);
  const chart = useRef<Chart<'line', Pt[]> | null>(null);
  // Redrawn after the browser has painted the new results (a passive effect): the Mesh charts,
  // drawn with the commit, come first; this one follows in the next task.
  useEffect(() => {
    if (!canvas.current) return;
    const fg = cssVar('--fg') || '#1b1b1b';
    const grades = g.table.map((r) => r.isoVG);
    const usable = g.table.map((r, i): Pt => ({ x: i, y: r.usable ? r.lambdaMin : null }));
    const lastUsable = g.table.reduce((last, r, i) => (r.usable ? i : last), -1);
    const beyond = g.table.map((r, i): Pt => ({ x: i, y: i >= lastUsable && lastUsable >= 0 ? r.lambdaMin : null }));
    const config = {
      type: 'line' as const,
      data: {
        datasets: [
          { label: 'λmin, usable grades', data: usable, borderColor: OKABE_ITO.blue, backgroundColor: OKABE_ITO.blue, borderWidth: 2, pointRadius: 3, borderDash: [] as number[] },
          { label: 'λmin, left out (see below)', data: beyond, borderColor: OKABE_ITO.blue, backgroundColor: OKABE_ITO.blue, borderWidth: 1, pointRadius: 2, borderDash: [2, 3] },
          { label: `λ target ${target}`, data: grades.map((_, i): Pt => ({ x: i, y: target })), borderColor: OKABE_ITO.vermillion, backgroundColor: OKABE_ITO.vermillion, borderWidth: 1.5, pointRadius: 0, borderDash: [7, 4] },
        ],
      },
      options: {
        animation: false as const,
        responsive: true,
        maintainAspectRatio: false,
        parsing: false as const,
        layout: { padding: { top: 16 } },
        scales: {
          x: { type: 'linear' as const, min: 0, max: Math.max(0, grades.length - 1), title: { display: true, text: 'ISO VG (ISO 3448)', color: fg }, ticks: { color: fg, stepSize: 1, callback: (v: number | string) => String(grades[Number(v)] ?? '') } },
          y: { type: 'linear' as const, min: 0, bounds: 'ticks' as const, title: { display: false, text: 'λmin' }, ticks: { color: fg } },
        },
        plugins: {
          legend: {
            labels: {
              color: fg,
              usePointStyle: true,
              pointStyle: 'line' as const,
              pointStyleWidth: 30,
              generateLabels: (c: Chart) => Chart.defaults.plugins.legend.labels.generateLabels(c).map((item) => ({ ...item, lineDash: [...((c.data.datasets[item.datasetIndex ?? 0] as { borderDash?: number[] } | undefined)?.borderDash ?? [])] })),
            },
          },
          axisCaption: { text: 'λmin', color: fg },
          tooltip: { callbacks: { title: (items: { parsed: { x: number } }[]) => `ISO VG ${grades[items[0]?.parsed.x ?? 0] ?? ''}`, label: (item: { parsed: { y: number } }) => `λmin ${formatResult(item.parsed.y, 3)}` } },
        },
      },
    };
    // New results redraw the same chart (chart.js recreated on every edit costs a layout of the page and a full set-up).
    if (chart.current) updateInPlace(chart.current, config as never);
    else chart.current = new Chart(canvas.current, config as never);
  }, [g, target]);
  useEffect(
    () => () => {
      chart.current?.destroy();
      chart.current = null;
    },
    [],
  );
  const points = g.table.map((r) => `VG ${r.isoVG}: ${formatResult(r.lambdaMin, 2)}${r.usable ? '' : ' (left out)'}`).join('; ');
  return (
    <div className="grade-chart" data-testid="grade-chart" data-usable={g.table.filter((r) => r.usable).map((r) => r.isoVG).join(',')}>
      <canvas ref={canvas} role="img" aria-label={`λmin by ISO VG for ${g.oil}, target ${target}: ${points}`} />
    </div>
  );
}

import type { ChartConfiguration } from 'chart.js';
import type { Chart } from './chartSetup';

type Pt = { x: number; y: number | null };

/**
 * Draw a new configuration on a chart already on screen, in place. With the same series (as many,
 * with the same keys) the dataset objects chart.js holds are kept, so it keeps their controllers
 * and elements and only the data and styles change; otherwise the datasets are swapped. The
 * options are replaced: chart.js resolves them afresh on every update anyway. The chart is never
 * destroyed and made again, which costs a canvas set-up and a forced layout of the page.
 */
export function updateInPlace(chart: Chart<'line', Pt[]>, config: ChartConfiguration<'line', Pt[]>): void {
  const next = config.data.datasets;
  const current = chart.data.datasets;
  const keys = (o: object) => Object.keys(o).sort().join('|');
  if (current.length === next.length && next.every((d, i) => keys(d) === keys(current[i] as object))) next.forEach((d, i) => Object.assign(current[i] as object, d));
  else chart.data.datasets = next;
  chart.options = config.options ?? {};
  chart.update('none');
}

import type { CaseResult, GearResult, PointResult } from '../../../app/review/results';
import { OKABE_ITO, REGIME_COLOURS, REGIME_WORDS } from '../../../app/review/vocabulary';
import { toDisplay, unitLabel, type QuantityKind, type UnitSystem } from '../../units/units';

export interface SeriesSpec {
  readonly label: string;
  readonly axis: 'y' | 'y2';
  readonly color: string;
  readonly dash?: readonly number[];
  readonly points: readonly { x: number; y: number | null }[];
}

export interface Band {
  readonly from: number;
  readonly to: number;
  readonly label: string;
  readonly color: string;
}

export interface ChartSpec {
  readonly id: 'hertz' | 'velocity' | 'film' | 'temperature';
  readonly title: string;
  readonly xLabel: string;
  readonly yLabel: string;
  readonly y2Label?: string;
  readonly series: readonly SeriesSpec[];
  /** A–E positions in display units. */
  readonly markers: readonly { label: string; x: number }[];
  /** Horizontal bands on the second axis (the regimes on λ). */
  readonly bands?: readonly Band[];
  /** y2 axis upper bound hint, so the bands stay readable. */
  readonly y2Max?: number;
}

export interface RegimeLimits {
  readonly boundaryBelow: number;
  readonly fullFilmFrom: number;
}

const along = (path: readonly PointResult[], units: UnitSystem, kind: QuantityKind, pick: (p: PointResult) => number | null) =>
  path.map((p) => {
    const v = pick(p);
    return { x: toDisplay('length', p.position_mm, units), y: v === null || !Number.isFinite(v) ? null : toDisplay(kind, v, units) };
  });

const axis = (name: string, kind: QuantityKind, units: UnitSystem) => {
  const u = unitLabel(kind, units);
  return u ? `${name} (${u})` : name;
};

/** The four Mesh charts of one case, in display units. Pure, so it is tested without a canvas. */
export function meshCharts(c: CaseResult, gear: GearResult, limits: RegimeLimits, units: UnitSystem): ChartSpec[] {
  const xLabel = axis('Position along the path of contact', 'length', units);
  const markers = (['A', 'B', 'C', 'D', 'E'] as const).map((k) => ({ label: k, x: toDisplay('length', gear.points_mm[k], units) }));
  const lambdas = c.path.map((p) => p.lambda).filter((l): l is number => l !== null);
  const lambdaTop = Math.max(limits.fullFilmFrom * 1.25, ...lambdas.map((l) => l * 1.1));
  const theta = c.scuffingTemperature_C;
  return [
    {
      id: 'hertz',
      title: 'Hertz stress σH',
      xLabel,
      yLabel: axis('σH', 'stress', units),
      markers,
      series: [{ label: 'σH', axis: 'y', color: OKABE_ITO.blue, points: along(c.path, units, 'stress', (p) => p.hertzStress_MPa) }],
    },
    {
      id: 'velocity',
      title: 'Sliding and sum velocity',
      xLabel,
      yLabel: axis('Velocity', 'velocity', units),
      markers,
      series: [
        { label: 'vg sliding', axis: 'y', color: OKABE_ITO.vermillion, points: along(c.path, units, 'velocity', (p) => p.slidingVelocity_mps) },
        { label: 'vΣ sum', axis: 'y', color: OKABE_ITO.blue, dash: [6, 3], points: along(c.path, units, 'velocity', (p) => p.sumVelocity_mps) },
      ],
    },
    {
      id: 'film',
      title: 'Film thickness hmin and λ',
      xLabel,
      yLabel: axis('hmin', 'film', units),
      y2Label: 'λ',
      markers,
      y2Max: lambdaTop,
      bands: [
        { from: 0, to: limits.boundaryBelow, label: REGIME_WORDS.boundary, color: REGIME_COLOURS.boundary },
        { from: limits.boundaryBelow, to: limits.fullFilmFrom, label: REGIME_WORDS.mixed, color: REGIME_COLOURS.mixed },
        { from: limits.fullFilmFrom, to: lambdaTop, label: REGIME_WORDS['full-film'], color: REGIME_COLOURS['full-film'] },
      ],
      series: [
        { label: 'hmin', axis: 'y', color: OKABE_ITO.blue, points: along(c.path, units, 'film', (p) => p.filmThicknessMin_um) },
        { label: 'λ', axis: 'y2', color: OKABE_ITO.reddishPurple, dash: [6, 3], points: along(c.path, units, 'none', (p) => p.lambda) },
      ],
    },
    {
      id: 'temperature',
      title: 'Contact and flash temperature against θS',
      xLabel,
      yLabel: axis('Temperature', 'temperature', units),
      y2Label: axis('θfl', 'temperatureDifference', units),
      markers,
      series: [
        { label: 'θB contact', axis: 'y', color: OKABE_ITO.vermillion, points: along(c.path, units, 'temperature', (p) => p.contactTemperature_C) },
        { label: 'θS scuffing', axis: 'y', color: OKABE_ITO.bluishGreen, dash: [2, 3], points: along(c.path, units, 'temperature', () => theta) },
        { label: 'θfl flash', axis: 'y2', color: OKABE_ITO.blue, dash: [6, 3], points: along(c.path, units, 'temperatureDifference', (p) => p.flashTemperature_K) },
      ],
    },
  ];
}

/** Per series: count, min and max of the plotted values (put on the chart's element for tests and readers). */
export function summarise(spec: ChartSpec): { label: string; n: number; min: number | null; max: number | null }[] {
  return spec.series.map((s) => {
    const ys = s.points.map((p) => p.y).filter((y): y is number => y !== null);
    return { label: s.label, n: ys.length, min: ys.length ? Math.min(...ys) : null, max: ys.length ? Math.max(...ys) : null };
  });
}

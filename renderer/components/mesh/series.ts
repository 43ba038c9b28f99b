import type { CaseResult, GearResult, PathSeries } from '../../../app/review/results';
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
  readonly id: 'hertz' | 'velocity' | 'film' | 'hmin' | 'temperature' | 'flash';
  readonly title: string;
  readonly xLabel: string;
  readonly yLabel: string;
  readonly series: readonly SeriesSpec[];
  /** A–E positions in display units. */
  readonly markers: readonly { label: string; x: number }[];
  /** Horizontal bands on the y axis (the regimes on λ). */
  readonly bands?: readonly Band[];
  /** Upper bound the axis must reach, the same for every case of the review, so switching compares like with like. */
  readonly yMax?: number;
  /** The figures that matter for this chart, shown beside it. */
  readonly figures: readonly { readonly label: string; readonly value: number | null; readonly kind: QuantityKind; readonly text?: string }[];
}

export interface RegimeLimits {
  readonly boundaryBelow: number;
  readonly fullFilmFrom: number;
}

/** A column of the path (null when the case has none, e.g. no oil), or one value along the whole path. */
type Column = (p: PathSeries) => ArrayLike<number> | null;

const along = (path: PathSeries, units: UnitSystem, kind: QuantityKind, pick: Column | number | null) => {
  const ys = typeof pick === 'function' ? pick(path) : null;
  const out: { x: number; y: number | null }[] = new Array(path.n);
  for (let i = 0; i < path.n; i++) {
    const v = typeof pick === 'function' ? (ys ? (ys[i] as number) : null) : pick;
    out[i] = { x: toDisplay('length', path.position_mm[i] as number, units), y: v === null || !Number.isFinite(v) ? null : toDisplay(kind, v, units) };
  }
  return out;
};

const axis = (name: string, kind: QuantityKind, units: UnitSystem) => {
  const u = unitLabel(kind, units);
  return u ? `${name} (${u})` : name;
};

/** Oil colours, in the order of the review's oils: the first (usually in service) solid, the others dashed. */
const OIL_COLOURS = [OKABE_ITO.vermillion, OKABE_ITO.blue, OKABE_ITO.bluishGreen, OKABE_ITO.reddishPurple, OKABE_ITO.orange, OKABE_ITO.skyBlue];
const oilStyle = (i: number) => ({ color: OIL_COLOURS[i % OIL_COLOURS.length] as string, ...(i === 0 ? {} : { dash: i === 1 ? [7, 4] : [2, 3] }) });

const maxOf = (cases: readonly CaseResult[], pick: Column, kind: QuantityKind, units: UnitSystem): number | undefined => {
  let m = -Infinity;
  for (const c of cases) {
    const ys = pick(c.path);
    if (ys) for (let i = 0; i < ys.length; i++) if (Number.isFinite(ys[i] as number) && (ys[i] as number) > m) m = ys[i] as number;
  }
  // The display conversions are increasing, so the largest value converts to the largest shown.
  return Number.isFinite(m) ? toDisplay(kind, m, units) : undefined;
};
const lambdaOf: Column = (p) => p.film?.lambda ?? null;
const hminOf: Column = (p) => p.film?.filmThicknessMin_um ?? null;
const contactOf: Column = (p) => p.heat?.contactTemperature_C ?? null;
const flashOf: Column = (p) => p.heat?.flashTemperature_K ?? null;
const speedOf: Column = (p) => Array.from(p.sumVelocity_mps, (v, i) => Math.max(v, Math.abs(p.slidingVelocity_mps[i] as number)));
const finite = (ys: ArrayLike<number> | null): number[] => (ys ? Array.from(ys).filter((y) => Number.isFinite(y)) : []);

/**
 * The Mesh charts of one load case, every oil of it drawn on the same chart, in display units:
 * one strip sharing the A–E position axis. λ is its own chart with the regime bands on its axis,
 * h_min apart; the contact temperature θB = θM + θfl is drawn against θS on one temperature axis
 * and the flash temperature θfl (a difference, K) on its own. `all` (every case of the review)
 * fixes the upper ends of the axes, so switching the case compares like with like. Pure.
 */
export function meshCharts(cases: CaseResult | readonly CaseResult[], gear: GearResult, limits: RegimeLimits, units: UnitSystem, all?: readonly CaseResult[]): ChartSpec[] {
  const list: readonly CaseResult[] = Array.isArray(cases) ? cases : [cases as CaseResult];
  const c = list[0] as CaseResult;
  const every = all ?? list;
  const xLabel = axis('Position along the path of contact', 'length', units);
  const markers = (['A', 'B', 'C', 'D', 'E'] as const).map((k) => ({ label: k, x: toDisplay('length', gear.points_mm[k], units) }));
  const lambdaAll = every.flatMap((x) => finite(lambdaOf(x.path)));
  const lambdaTop = Math.max(limits.fullFilmFrom * 1.25, ...lambdaAll.map((l) => l * 1.1));
  const oilName = (x: CaseResult) => x.oil ?? 'no oil';
  const many = list.length > 1;
  const named = (sym: string, x: CaseResult) => (many ? `${sym} ${oilName(x)}` : sym);
  const minOf = (pick: (x: CaseResult) => number | null) => {
    const v = list.map(pick).filter((y): y is number => y !== null && Number.isFinite(y));
    return v.length ? Math.min(...v) : null;
  };
  // θS of an oil above stage 12 is only a floor (not limiting): it is neither drawn nor sets the axis.
  const limiting = (x: CaseResult) => x.scuffingTemperature_C !== null && !x.scuffingTemperatureAtLeast;
  const tempMax = Math.max(maxOf(every, contactOf, 'temperature', units) ?? -Infinity, ...every.map((x) => (limiting(x) ? toDisplay('temperature', x.scuffingTemperature_C as number, units) : -Infinity)));
  return [
    {
      id: 'hertz',
      title: 'Hertz stress σH',
      xLabel,
      yLabel: axis('σH', 'stress', units),
      markers,
      yMax: maxOf(every, (p) => p.hertzStress_MPa, 'stress', units),
      series: [{ label: 'σH', axis: 'y', color: OKABE_ITO.blue, points: along(c.path, units, 'stress', (p) => p.hertzStress_MPa) }],
      figures: [{ label: 'σH,max', value: c.maxHertzStress_MPa, kind: 'stress' }],
    },
    {
      id: 'velocity',
      title: 'Sliding and sum velocity',
      xLabel,
      yLabel: axis('v', 'velocity', units),
      markers,
      yMax: maxOf(every, speedOf, 'velocity', units),
      series: [
        { label: 'vg sliding', axis: 'y', color: OKABE_ITO.vermillion, points: along(c.path, units, 'velocity', (p) => p.slidingVelocity_mps) },
        { label: 'vΣ sum', axis: 'y', color: OKABE_ITO.blue, dash: [7, 4], points: along(c.path, units, 'velocity', (p) => p.sumVelocity_mps) },
      ],
      figures: [{ label: 'v at the pitch line', value: c.pitchLineVelocity_mps, kind: 'velocity' }],
    },
    {
      id: 'film',
      title: 'Specific film λ, with the regimes',
      xLabel,
      yLabel: 'λ',
      markers,
      yMax: lambdaTop,
      bands: [
        { from: 0, to: limits.boundaryBelow, label: REGIME_WORDS.boundary, color: REGIME_COLOURS.boundary },
        { from: limits.boundaryBelow, to: limits.fullFilmFrom, label: REGIME_WORDS.mixed, color: REGIME_COLOURS.mixed },
        { from: limits.fullFilmFrom, to: lambdaTop, label: REGIME_WORDS['full-film'], color: REGIME_COLOURS['full-film'] },
      ],
      series: list.map((x, i) => ({ label: named('λ', x), axis: 'y' as const, ...oilStyle(i), points: along(x.path, units, 'none', lambdaOf) })),
      figures: list.map((x) => ({ label: named('λmin', x), value: x.lambdaMin, kind: 'none' as const })),
    },
    {
      id: 'hmin',
      title: 'Minimum film thickness hmin',
      xLabel,
      yLabel: axis('hmin', 'film', units),
      markers,
      yMax: maxOf(every, hminOf, 'film', units),
      series: list.map((x, i) => ({ label: named('hmin', x), axis: 'y' as const, ...oilStyle(i), points: along(x.path, units, 'film', hminOf) })),
      figures: [{ label: 'least hmin', value: minOf((x) => Math.min(...finite(hminOf(x.path)))), kind: 'film' }],
    },
    {
      id: 'temperature',
      title: 'Contact temperature θB = θM + θfl against θS',
      xLabel,
      yLabel: axis('θ', 'temperature', units),
      markers,
      ...(Number.isFinite(tempMax) ? { yMax: tempMax } : {}),
      series: list.flatMap((x, i) => [
        { label: named('θB', x), axis: 'y' as const, ...oilStyle(i), points: along(x.path, units, 'temperature', contactOf) },
        ...(limiting(x) ? [{ label: named('θS', x), axis: 'y' as const, color: OIL_COLOURS[i % OIL_COLOURS.length] as string, dash: [2, 3], points: along(x.path, units, 'temperature', x.scuffingTemperature_C) }] : []),
      ]),
      figures: list.flatMap((x) => [
        { label: named('θB,max', x), value: x.maxContactTemperature_C, kind: 'temperature' as const },
        limiting(x) ? { label: named('θS', x), value: x.scuffingTemperature_C, kind: 'temperature' as const } : { label: named('θS', x), value: null, kind: 'temperature' as const, text: 'above stage 12: not limiting' },
      ]),
    },
    {
      id: 'flash',
      title: 'Flash temperature θfl (a rise above θM)',
      xLabel,
      yLabel: axis('θfl', 'temperatureDifference', units),
      markers,
      yMax: maxOf(every, flashOf, 'temperatureDifference', units),
      series: list.map((x, i) => ({ label: named('θfl', x), axis: 'y' as const, ...oilStyle(i), points: along(x.path, units, 'temperatureDifference', flashOf) })),
      figures: list.map((x) => ({ label: named('θfl,max', x), value: x.maxFlashTemperature_K, kind: 'temperatureDifference' as const })),
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

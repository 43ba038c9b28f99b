import type { EhlPointResult } from '../../../app/review/ehlAtPoint';
import { OKABE_ITO } from '../../../app/review/vocabulary';
import { toDisplay, unitLabel, type UnitSystem } from '../../units/units';
import type { Band, SeriesSpec } from '../mesh/series';

export interface FilmChartSpec {
  readonly title: string;
  readonly xLabel: string;
  readonly yLabel: string;
  readonly y2Label: string;
  readonly series: readonly SeriesSpec[];
  /** On the film axis: the composite roughness and the tribofilm range. */
  readonly bands: readonly Band[];
  readonly y2Max: number;
  /** The Hertz zone's edges, x/b = ±1. */
  readonly markers: readonly { label: string; x: number }[];
  readonly xMin: number;
  readonly xMax: number;
}

export const TRIBOFILM_LABEL = 'anti-wear tribofilm 50–150 nm (common practice)';
export const ROUGHNESS_LABEL = 'composite roughness';

/**
 * The Film detail chart of one solved point, in display units: pressure (left axis), film (right
 * axis), the Hertz ellipse, the formula's h_min as a line, and the roughness and tribofilm bands.
 * Pure, so it is tested without a canvas. The film axis is cut at a few times the central film so
 * the exit constriction stays readable (the inlet gap grows far above it).
 */
export function filmChartSpec(r: EhlPointResult, units: UnitSystem): FilmChartSpec {
  const p = (mpa: number) => toDisplay('stress', mpa, units);
  const h = (um: number) => toDisplay('film', um, units);
  const x0 = r.profile[0]?.x_over_b ?? -4.5;
  const x1 = r.profile[r.profile.length - 1]?.x_over_b ?? 1.5;
  const hertz: { x: number; y: number | null }[] = [];
  for (const q of r.profile) hertz.push({ x: q.x_over_b, y: Math.abs(q.x_over_b) < 1 ? p(r.hertzP0_MPa * Math.sqrt(1 - q.x_over_b * q.x_over_b)) : null }); // Hertz: p = p0 √(1 − x²/b²)
  const sigma = h(r.compositeRoughness_um);
  const top = Math.max(2.5 * h(r.hCentral_um), 1.3 * sigma, 1.3 * h(r.tribofilm_um.max), 1.3 * h(r.formulaHMin_um));
  const pu = unitLabel('stress', units);
  const hu = unitLabel('film', units);
  return {
    title: `Film and pressure at ${r.point}`,
    xLabel: 'Across the contact, x/b (Hertz half-widths; oil enters from the left)',
    yLabel: `Pressure (${pu})`,
    y2Label: `Film (${hu})`,
    series: [
      { label: 'Pressure, numerical', axis: 'y', color: OKABE_ITO.blue, points: r.profile.map((q) => ({ x: q.x_over_b, y: p(q.p_MPa) })) },
      { label: 'Pressure, Hertz', axis: 'y', color: OKABE_ITO.skyBlue, dash: [2, 3], points: hertz },
      { label: 'Film, numerical', axis: 'y2', color: OKABE_ITO.black, points: r.profile.map((q) => ({ x: q.x_over_b, y: h(q.h_um) <= top ? h(q.h_um) : null })) },
      { label: `h_min, ${r.formulaName}`, axis: 'y2', color: OKABE_ITO.vermillion, dash: [6, 4], points: [{ x: x0, y: h(r.formulaHMin_um) }, { x: x1, y: h(r.formulaHMin_um) }] },
    ],
    bands: [
      { from: 0, to: sigma, label: ROUGHNESS_LABEL, color: OKABE_ITO.orange },
      { from: h(r.tribofilm_um.min), to: h(r.tribofilm_um.max), label: TRIBOFILM_LABEL, color: OKABE_ITO.reddishPurple },
    ],
    y2Max: top,
    markers: [{ label: '−b', x: -1 }, { label: '+b', x: 1 }],
    xMin: x0,
    xMax: x1,
  };
}

import type { EhlPointResult } from '../../review/ehlAtPoint';
import { drawChart, type Box, type ChartSpec } from '../chart';
import type { RecordContext } from '../context';
import { formatNumber } from '../units';
import { GREY, OKABE_ITO } from '../words';
import { pathsInWords } from '../../review/pathWords';

/**
 * Film detail, when asked: the numerical film and pressure at the point of least λ, with the
 * composite roughness and the anti-wear tribofilm range (common practice) as bands and the
 * formula's h_min as a line, then the same sentence in words the screen shows. Drawn from the
 * solved result (app/review/ehlAtPoint.ts); the record solves nothing itself.
 */
export function drawFilmDetail(ctx: RecordContext, films: readonly EhlPointResult[]): void {
  const { layout: L, units: u } = ctx;
  if (films.length === 0) return;
  L.newPage();
  L.heading('Film detail: the numerical film at the point of least λ');
  L.para(
    'An isothermal line-contact EHL solution (Reynolds equation with the elastic deformation of the flanks, Roelands viscosity, Dowson–Higginson density, Newton–Raphson after Houpert & Hamrock) at one point: a cross-check and a picture, not a replacement for the path calculation. The gearbox maker\'s lubricant list and licensed engineering judgement decide.',
    { size: 8.5 },
  );
  for (const f of films) {
    L.ensure(330);
    L.heading(`${f.loadCase} × ${f.oil} — ${f.point}`, 3);
    L.para(
      f.converged
        ? `Converged in ${f.iterations} iterations on ${f.nodes} nodes; oil at the bulk temperature ${u.fmt(f.filmTemperature_C, 'temperature')}.`
        : `Did not converge after ${f.iterations} iterations (last residual ${f.residual.toExponential(1)}): the figures are provisional.`,
      { size: 8, color: GREY },
    );
    const gap = 14;
    const w = (L.width - gap) / 2;
    const h = 190;
    const top = L.y + 4;
    const [pressure, film] = chartsOf(ctx, f);
    drawChart(L.doc, { x: L.left, y: top, w, h } satisfies Box, pressure);
    drawChart(L.doc, { x: L.left + w + gap, y: top, w, h } satisfies Box, film);
    L.y = top + h + 6;
    L.doc.x = L.left;
    L.keyValues(
      [
        ['Minimum film, numerical', u.fmt(f.hMin_um, 'film', 3)],
        [`Minimum film, ${f.formulaName}`, u.fmt(f.formulaHMin_um, 'film', 3)],
        ['Central film, numerical', u.fmt(f.hCentral_um, 'film', 3)],
        ['Composite roughness', u.fmt(f.compositeRoughness_um, 'film', 3)],
        ['Peak pressure / Hertz', `${u.num(f.pMax_MPa, 'stress')} / ${u.fmt(f.hertzP0_MPa, 'stress')}`],
        ['Inlet shear-heating factor in the formula', formatNumber(f.thermalFactor, 3)],
      ],
      { pairs: 2, size: 7.5 },
    );
    L.para(f.inWords, { size: 8.5 });
    for (const w2 of f.warnings) L.para(pathsInWords(w2.message), { size: 7.5, color: GREY, gap: 2 });
  }
}

function chartsOf(ctx: RecordContext, f: EhlPointResult): [ChartSpec, ChartSpec] {
  const u = ctx.units;
  const xLabel = 'across the contact, x/b (oil enters from the left)';
  const markers = [{ x: -1, label: 'b' }, { x: 1, label: 'b' }]; // the Hertz zone's edges, x = ±b (the markers hold one letter)
  const H = (um: number) => u.value(um, 'film');
  const top = Math.max(2.5 * H(f.hCentral_um), 1.3 * H(f.compositeRoughness_um), 1.3 * H(f.tribofilm_um.max), 1.3 * H(f.formulaHMin_um));
  const pressure: ChartSpec = {
    title: 'Pressure across the contact',
    xLabel,
    yLabel: `p (${u.unit('stress')})`,
    series: [
      { label: 'numerical', points: f.profile.map((q) => [q.x_over_b, u.value(q.p_MPa, 'stress')] as const), color: OKABE_ITO.blue },
      // Hertz: p = p0 √(1 − x²/b²)
      { label: 'Hertz', points: f.profile.map((q) => [q.x_over_b, Math.abs(q.x_over_b) < 1 ? u.value(f.hertzP0_MPa * Math.sqrt(1 - q.x_over_b ** 2), 'stress') : null] as const), color: OKABE_ITO.skyBlue, dash: [2, 2] },
    ],
    xMarkers: markers,
    yInclude: [0],
  };
  const film: ChartSpec = {
    title: 'Film across the contact',
    xLabel,
    yLabel: `h (${u.unit('film')})`,
    series: [{ label: 'numerical', points: f.profile.map((q) => [q.x_over_b, H(q.h_um) <= top ? H(q.h_um) : null] as const), color: OKABE_ITO.black }],
    bands: [
      { from: 0, to: H(f.compositeRoughness_um), color: OKABE_ITO.orange, opacity: 0.15, label: 'composite roughness' },
      { from: H(f.tribofilm_um.min), to: H(f.tribofilm_um.max), color: OKABE_ITO.reddishPurple, opacity: 0.2, label: 'anti-wear tribofilm (common practice)', hatch: true },
    ],
    refLines: [{ y: H(f.formulaHMin_um), label: `h_min, ${f.formulaName}`, color: OKABE_ITO.vermillion, dash: [4, 2] }],
    xMarkers: markers,
    yInclude: [0, top],
  };
  return [pressure, film];
}

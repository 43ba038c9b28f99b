import { micropittingNeedWords, micropittingStageWords } from '../../review/micropittingResult';
import type { CaseResult, MicropittingResult } from '../../review/results';
import { MICROPITTING_LABELS } from '../../review/vocabulary';
import { drawChart, type ChartSpec } from '../chart';
import type { RecordContext } from '../context';
import type { Cell } from '../layout';
import { formatNumber, DASH } from '../units';
import { GREY, OKABE_ITO } from '../words';
import { caseTitle } from './caseResults';
import { pathPoints } from '../../review/pathSeries';

/**
 * Micropitting by ISO/TS 6336-22: a table of λGF,min, λGFT, λGFP and Sλ per case × oil, then per case
 * the chart of λGF along the path with the λGFP line and the area at risk (A…B, D…E) named.
 */
export function drawMicropitting(ctx: RecordContext): void {
  const { layout: L, results, review } = ctx;
  const withMp = results.cases.filter((c): c is CaseResult & { micropitting: MicropittingResult } => c.micropitting !== null);
  if (withMp.length === 0) return;
  L.newPage();
  L.heading('Micropitting (ISO/TS 6336-22)');
  L.para(
    `Sλ = λGF,min / λGFP with λGFP = 1.4 · WW · λGFT. λGF,min is the least λGF = hY/Ra,avg in the area at risk (A to B and D to E); λGFT is λGF,min of the C-GF test gear with the same oil at its FVA 54 failure stage (90 °C, 8.3 m/s), computed by the same chain. Minimum Sλ,min = ${formatNumber(review.policy.micropittingSafetyMin, 3)} (policy). Micropitting is a finding of its own: it is no reason for EP chemistry, and some EP additive systems lower micropitting resistance, so an EP oil must show its micropitting class too.`,
    { size: 8.5 },
  );
  L.para('Test gear C-GF: the FZG type C geometry of ISO 14635-1 (z 16/24, mn 4.5 mm, a 91.5 mm, b 14 mm, x 0.1817 / 0.1715, da 82.46 / 118.36 mm; Höhn et al. 2008, Table 1), ground to Ra 0.5 µm, case-carburized, dip-lubricated, at the ISO 14635-1 load-stage torques (stage 5: 94.1 N·m … stage 10: 372.6 N·m) [memory].', { size: 7.5, color: GREY });
  const rows: Cell[][] = withMp.map((c) => {
    const m = c.micropitting;
    return [
      { text: caseTitle(c), bold: true },
      formatNumber(m.lambdaGFMin, 3),
      m.failureStage === null ? 'not given' : micropittingStageWords(m.failureStage),
      formatNumber(m.lambdaGFT, 3),
      formatNumber(m.lambdaGFP, 3),
      m.safety === null ? DASH : `${m.safetyAtLeast ? '≥ ' : ''}${formatNumber(m.safety, 3)}`,
      micropittingNeedWords(m.requiredFailureStage),
      MICROPITTING_LABELS[m.finding],
    ];
  });
  L.table(
    [
      { header: 'Case × oil', width: 0.25 },
      { header: 'λGF,min', width: 0.08, align: 'right' },
      { header: 'Failure stage', width: 0.09, align: 'right' },
      { header: 'λGFT', width: 0.08, align: 'right' },
      { header: 'λGFP', width: 0.08, align: 'right' },
      { header: 'Sλ', width: 0.08, align: 'right' },
      { header: 'Stage needed', width: 0.12 },
      { header: 'Finding', width: 0.22 },
    ],
    rows,
    { fontSize: 7.5, zebra: true },
  );
  for (const c of withMp) L.para(`${caseTitle(c)}: ${c.micropitting.note}`, { size: 7.5, color: GREY, gap: 2 });

  const gap = 14;
  const w = (L.width - gap) / 2;
  const h = 190;
  withMp.forEach((c, i) => {
    if (i % 2 === 0) {
      if (L.room < h + 8) L.newPage();
      L.y += 4;
    }
    const top = L.y;
    drawChart(L.doc, { x: L.left + (i % 2) * (w + gap), y: top, w, h }, chartOf(ctx, c));
    if (i % 2 === 1 || i === withMp.length - 1) L.y = top + h + gap;
  });
}

function chartOf(ctx: RecordContext, c: CaseResult & { micropitting: MicropittingResult }): ChartSpec {
  const { units: u, results } = ctx;
  const X = (mm: number): number => u.value(mm, 'length');
  const p = results.gear.points_mm;
  const m = c.micropitting;
  return {
    title: `λGF along the path: ${caseTitle(c)}`,
    xLabel: `position on the line of action from T1 (${u.unit('length')})`,
    yLabel: 'λGF (–)',
    series: [{ label: 'λGF = hY / Ra,avg', points: pathPoints(c.path).map((pt) => [X(pt.position_mm), pt.lambdaGF]), color: OKABE_ITO.blue }],
    xMarkers: (['A', 'B', 'C', 'D', 'E'] as const).map((k) => ({ x: X(p[k]), label: k })),
    refLines: m.lambdaGFP === null ? [] : [{ y: m.lambdaGFP, label: `λGFP = ${formatNumber(m.lambdaGFP, 3)} (stage ${micropittingStageWords(m.failureStage ?? '>10')})`, color: OKABE_ITO.vermillion, dash: [6, 3] }],
    yInclude: [0, ...(m.lambdaGFP === null ? [] : [m.lambdaGFP * 1.15])],
    emptyText: 'no film: no oil in scope',
  };
}

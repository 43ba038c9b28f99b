import type { CaseResult } from '../../review/results';
import type { RecordContext } from '../context';
import type { Cell } from '../layout';
import { formatNumber, formatPercent, DASH } from '../units';
import { GREY, VERDICT_WORDS } from '../words';

/** Side by side: oils × load cases, then the grade finder. */
export function drawComparison(ctx: RecordContext): void {
  const { layout: L, review, results } = ctx;
  L.newPage();
  L.heading(`Side by side: oils × load cases${ctx.meshLabel ? `, ${ctx.meshLabel}` : ''}`);
  if (results.verdicts.length === 0) {
    L.para('No oils in scope.', { size: 9 });
  } else {
    const cases = review.loadCases.map((c) => c.name);
    const share = 0.62 / Math.max(1, cases.length);
    const columns = [
      { header: 'Oil', width: 0.22 },
      ...cases.map((name, i) => ({ header: `${name} (${formatNumber((review.loadCases[i]?.timeShare ?? 0) * 100, 3)} % of time)`, width: share })),
      { header: 'Overall', width: 0.16 },
    ];
    const rows: Cell[][] = results.verdicts.map((v) => [
      { text: v.oil, bold: true },
      ...cases.map((name): Cell => cellOf(results.cases.find((c) => c.loadCase === name && c.oil === v.oil))),
      { text: `${VERDICT_WORDS[v.code]}\nmeets ${formatPercent(v.dutyShareMet)} of duty`, icon: v.code, bold: false },
    ]);
    L.table(columns, rows, { fontSize: 7.5 });
    L.para('Each cell: the verdict for that case and oil, then SB (flash temperature) / SintS (integral temperature) / λmin, the FZG A/8.3/90 stage the case needs, and the micropitting safety Sλ with the FVA 54 micropitting stage needed (ISO/TS 6336-22). Icons: circle with tick — anti-wear chemistry suffices; triangle — EP chemistry warranted; octagon with cross — beyond oil chemistry.', {
      size: 7.5,
      color: GREY,
    });
  }

  L.heading('Grade finder', 2);
  if (results.gradeFinder.length === 0) {
    L.para('No oils in scope.', { size: 9 });
    return;
  }
  L.para(`λmin over every load case, up to ${ctx.units.fmt(review.policy.temperatureRange_C[1], 'temperature')}, if the oil were made in another ISO VG grade (same base oil and VI); target λ ≥ ${formatNumber(review.policy.lambdaTarget, 3)}.`, { size: 8.5 });
  const grades = [...new Set(results.gradeFinder.flatMap((g) => g.table.map((r) => r.isoVG)))].sort((a, b) => a - b);
  L.table(
    [{ header: 'ISO VG', width: 0.14 }, ...results.gradeFinder.map((g) => ({ header: g.oil, width: 0.86 / results.gradeFinder.length, align: 'right' as const }))],
    grades.map((vg) => [
      { text: `VG ${vg}`, bold: true },
      ...results.gradeFinder.map((g): Cell => {
        const row = g.table.find((r) => r.isoVG === vg);
        const marks = [vg === g.currentVG ? 'current' : '', vg === g.recommendedVG ? 'recommended' : '', row && !row.usable ? 'left out' : ''].filter(Boolean).join(', ');
        const text = `${row ? formatNumber(row.lambdaMin, 3) : DASH}${marks ? ` (${marks})` : ''}`;
        return vg === g.recommendedVG ? { text, bold: true } : text;
      }),
    ]),
    { fontSize: 7.5, zebra: true },
  );
  for (const g of results.gradeFinder) {
    const rec = g.recommendedVG === null ? 'no grade in the table reaches the target' : `recommended ISO VG ${g.recommendedVG}`;
    L.bullet(`${g.oil}: current ${g.currentVG === null ? 'grade not an ISO VG' : `ISO VG ${g.currentVG}`}; ${rec}. ${g.note}`, { size: 8.5 });
  }
  // Said once: the left-out grades follow from the duty, the same for every oil.
  const leftOut = results.gradeFinder.find((g) => g.leftOut)?.leftOut;
  if (leftOut) L.para(leftOut, { size: 8.5 });
}

function cellOf(c: CaseResult | undefined): Cell {
  if (!c) return DASH;
  const fig = `SB ${formatNumber(c.scuffingSafety, 3)} / SintS ${formatNumber(c.integralSafety, 3)} / λmin ${formatNumber(c.lambdaMin, 2)}`;
  const st = (x: CaseResult['requiredFzgStage']) => (x === '>12' ? 'above 12' : String(x));
  const stage = c.requiredFzgStage === null ? '' : `\nneeds FZG ${st(c.requiredFzgStage)} (flash) / ${st(c.requiredFzgStageIntegral)} (integral)`;
  const mp = c.micropitting;
  const micro = mp ? `\nmicropitting Sλ ${mp.safety === null ? 'unknown' : `${mp.safetyAtLeast ? '≥ ' : ''}${formatNumber(mp.safety, 3)}`}, needs stage ${mp.requiredFailureStage === '>10' ? 'above 10' : mp.requiredFailureStage}` : '';
  if (!c.verdict) return `${DASH}\n${fig}${stage}${micro}`;
  return { text: `${VERDICT_WORDS[c.verdict.code]}\n${fig}${stage}${micro}`, icon: c.verdict.code };
}


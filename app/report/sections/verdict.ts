import type { Caution } from '../../review/results';
import type { RecordContext } from '../context';
import { drawVerdictIcon } from '../icons';
import { cautionBox } from './cover';
import { caseTitle } from './caseResults';
import { DEFER_TEXT, GREY, OIL_FIT_WORDS, VERDICT_WORDS } from '../words';

/** The verdict: per oil, then per load case its reasons (each with its source) and the cautions. */
export function drawVerdict(ctx: RecordContext): void {
  const { layout: L, results } = ctx;
  const doc = L.doc;
  L.newPage();
  L.heading('Verdict');
  if (results.verdicts.length === 0) L.para('No oils in scope, so no verdict.', { size: 9 });

  for (const v of results.verdicts) {
    L.ensure(60);
    const top = L.y;
    drawVerdictIcon(doc, v.code, L.left, top, 14);
    L.font(true, 11).text(`${VERDICT_WORDS[v.code]} — ${v.oil}`, L.left + 21, top + 1, { width: L.width - 21 });
    L.y += 2;
    L.para(v.summary, { size: 9 });

    for (const c of governingCases(ctx, v.oil).filter((x) => x.oil === v.oil)) {
      if (!c.verdict) continue;
      L.ensure(50);
      const t = L.y + 3;
      drawVerdictIcon(doc, c.verdict.code, L.left + 8, t, 10);
      const fit = c.verdict.oilFit ? ` (${OIL_FIT_WORDS[c.verdict.oilFit]})` : '';
      L.font(true, 9).text(`${c.loadCase}: ${VERDICT_WORDS[c.verdict.code]}${fit}`, L.left + 23, t, { width: L.width - 23 });
      L.y += 2;
      c.verdict.reasons.forEach((r, i) => {
        L.para(`${i + 1}. ${r.text}`, { size: 8.5, indent: 23, gap: 1 });
        L.para(`Threshold: ${r.threshold}. Source: ${r.source}. Rule: ${r.rule}.`, { size: 7.5, indent: 34, color: GREY, gap: 3 });
      });
      const triggered = c.verdict.cautions.filter((k) => k.kind === 'triggered');
      if (triggered.length) L.para(`Cautions raised by this case’s inputs: ${triggered.map((k) => k.id).join(', ')} (written out below).`, { size: 7.5, indent: 23, color: GREY });
    }
    L.y += 4;
  }

  const cautions = uniqueCautions(ctx);
  if (cautions.length) {
    L.heading('Cautions', 2);
    const all = results.cases.filter((c) => c.verdict).length;
    for (const { caution, cases } of cautions) {
      const where = cases.length === all ? 'every verdict' : cases.join('; ');
      L.bullet(`${caution.text} (${caution.kind}; applies to ${where}.)`, { size: 8.5 });
    }
  }
  L.y += 4;
  cautionBox(ctx, DEFER_TEXT);
}

/** The cases behind an oil's verdict: a pair's, or those of the planetary mesh that governs for the oil. */
function governingCases(ctx: RecordContext, oil: string): RecordContext['results']['cases'] {
  const mesh = ctx.results.planetary?.governingMesh.find((g) => g.oil === oil)?.mesh;
  return ctx.results.meshes?.find((m) => m.mesh === mesh)?.cases ?? ctx.results.cases;
}

function uniqueCautions(ctx: RecordContext): Array<{ caution: Caution; cases: string[] }> {
  const map = new Map<string, { caution: Caution; cases: string[] }>();
  for (const c of ctx.results.cases) {
    for (const k of c.verdict?.cautions ?? []) {
      const key = `${k.id}\u0000${k.text}`;
      const entry = map.get(key) ?? { caution: k, cases: [] };
      entry.cases.push(caseTitle(c));
      map.set(key, entry);
    }
  }
  return [...map.values()];
}

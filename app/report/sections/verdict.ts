import type { RecordContext } from '../context';
import { drawVerdictIcon } from '../icons';
import { cautionBox } from './cover';
import { checkWords } from './decision';
import { DEFER_TEXT, GREY, VERDICT_WORDS } from '../words';

/** The verdict: per oil its finding, then per load case what the case needs, its figures against their limits and the reasons with their sources; every caution once. */
export function drawVerdict(ctx: RecordContext): void {
  const { layout: L, results } = ctx;
  const doc = L.doc;
  L.newPage();
  L.heading('Verdict');
  if (results.verdicts.length === 0) L.para('No oils in scope, so no verdict.', { size: 9 });

  for (const v of results.verdicts) {
    L.ensure(60);
    L.font(true, 11).text(v.oil, L.left, L.y, { width: L.width });
    L.y += 2;
    L.para(v.summary, { size: 9 });

    for (const c of governingCases(ctx, v.oil).filter((x) => x.oil === v.oil)) {
      if (!c.verdict) continue;
      L.ensure(50);
      const t = L.y + 3;
      drawVerdictIcon(doc, c.verdict.code, L.left + 8, t, 10);
      const governing = c.loadCase === v.governingLoadCase ? ' — governing case' : '';
      L.font(true, 9).text(`${c.loadCase}: the case needs “${VERDICT_WORDS[c.verdict.code]}”${governing}`, L.left + 23, t, { width: L.width - 23 });
      L.y += 2;
      L.para(c.verdict.checks.map((k) => `${k.symbol} ${checkWords(k)} (limit ${k.limit})`).join(' · '), { size: 8, indent: 23, gap: 2 });
      c.verdict.reasons.forEach((r, i) => {
        L.para(`${i + 1}. ${r.text}`, { size: 8.5, indent: 23, gap: 1 });
        L.para(`Threshold: ${r.threshold}. Source: ${r.source}.`, { size: 7.5, indent: 34, color: GREY, gap: 3 });
      });
    }
    L.y += 4;
  }

  const applying = results.cautions.filter((k) => k.applies);
  const standing = results.cautions.filter((k) => !k.applies);
  if (applying.length) {
    L.heading('Cautions', 2);
    const caseCount = new Set(results.cases.map((c) => c.loadCase)).size;
    for (const k of applying) {
      if (k.id === 'defer') continue; // in the box below
      const cases = [...new Set(k.appliesTo.map((a) => a.loadCase))];
      const where = cases.length === caseCount ? '' : ` Applies to: ${cases.join('; ')}.`;
      L.bullet(`${k.text}${where}`, { size: 8.5 });
    }
  }
  if (standing.length) L.para(`Standing cautions not triggered by these inputs: ${standing.map((k) => k.title).join('; ')}.`, { size: 8, color: GREY });
  L.y += 4;
  cautionBox(ctx, DEFER_TEXT);
}

/** The cases behind an oil's verdict: a pair's, or those of the planetary mesh that governs for the oil. */
function governingCases(ctx: RecordContext, oil: string): RecordContext['results']['cases'] {
  const mesh = ctx.results.planetary?.governingMesh.find((g) => g.oil === oil)?.mesh;
  return ctx.results.meshes?.find((m) => m.mesh === mesh)?.cases ?? ctx.results.cases;
}


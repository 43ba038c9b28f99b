import type { ChangeFindingCode, ChangeSide, LimitCheck, Results, VerdictCode } from '../../review/results';
import { CHANGE_WORDS, METHODS_WORDS, SHORTFALL_ORDER, SHORTFALL_SHORT } from '../../review/vocabulary';
import type { RecordContext } from '../context';
import { drawVerdictIcon } from '../icons';
import { FONT_REGULAR } from '../layout';
import { formatNumber } from '../units';
import { INK, VERDICT_WORDS } from '../words';

/** The change findings share the verdicts' shapes: circle with a tick, triangle with a bar, octagon with a cross. */
const CHANGE_ICON: Readonly<Record<ChangeFindingCode, VerdictCode>> = {
  supported: 'aw-suffices',
  'supported-with-conditions': 'ep-warranted',
  'not-supported': 'beyond-oil',
};
const stage = (s: number | '>12' | null) => (s === null ? '—' : s === '>12' || s > 12 ? 'above 12' : String(s));
const pct = (x: number | null) => (x === null ? '—' : x < 1e-4 ? '< 0.01 %' : `${formatNumber(100 * x, 2)} %`);
/** A figure against its limit, with the word pass or fail. */
export const checkWords = (k: LimitCheck | undefined) => (k === undefined ? '—' : `${formatNumber(k.value, 3)} ${k.pass === null ? '(not defined)' : k.pass ? 'pass' : 'FAIL'}`);

function iconLine(ctx: RecordContext, icon: VerdictCode, title: string, body: string): void {
  const { layout: L } = ctx;
  const doc = L.doc;
  L.font(true, 10.5);
  const h = doc.heightOfString(title, { width: L.width - 22 }) + doc.font(FONT_REGULAR).fontSize(9).heightOfString(body, { width: L.width - 22 }) + 8;
  L.ensure(h);
  const top = L.y;
  drawVerdictIcon(doc, icon, L.left, top, 14);
  L.font(true, 10.5).text(title, L.left + 22, top + 1, { width: L.width - 22 });
  L.font(false, 9, INK).text(body, L.left + 22, L.y + 1, { width: L.width - 22 });
  L.y += 6;
}

const sideRow = (label: string, s: ChangeSide) => [label, formatNumber(s.scuffingSafety, 3), formatNumber(s.integralSafety, 3), formatNumber(s.lambdaMin, 3), pct(s.scuffingProbability), `${stage(s.oilFzgStage)} / ${stage(s.neededFzgStage)}`];

/** The change findings, first on the cover: the finding, one sentence, its conditions, and before → after per case. */
export function drawChanges(ctx: RecordContext, results: Results): void {
  const { layout: L } = ctx;
  if (results.changes.length === 0) return;
  L.heading('The change of oil', 2);
  for (const ch of results.changes) {
    iconLine(ctx, CHANGE_ICON[ch.finding], CHANGE_WORDS[ch.finding], ch.statement);
    for (const c of ch.conditions) L.bullet(`Condition: ${c}`, { size: 8.5 });
    L.table(
      [
        { header: 'Load case', width: 2.6 },
        { header: 'Oil', width: 0.8 },
        { header: 'SB', width: 0.7, align: 'right' },
        { header: 'SintS', width: 0.7, align: 'right' },
        { header: 'λmin', width: 0.7, align: 'right' },
        { header: 'P(scuffing)', width: 1, align: 'right' },
        { header: 'FZG offered / needed', width: 1.4, align: 'right' },
      ],
      ch.byCase.flatMap((b) => [
        [b.loadCase, ...sideRow('before', b.before)],
        ['', ...sideRow('after', b.after)],
      ]),
      { fontSize: 7.5 },
    );
    L.y += 4;
  }
}

/** What the duty needs, once, apart from what any oil offers; then each oil's finding against it. */
export function drawNeedAndFindings(ctx: RecordContext, results: Results): void {
  const { layout: L } = ctx;
  const need = results.need;
  L.heading('What the duty needs', 2);
  if (!need) {
    L.para('No oils are in scope: the record gives the gear pair’s stresses and velocities only, with no film, temperature or verdict.', { size: 9 });
    return;
  }
  iconLine(ctx, need.code, VERDICT_WORDS[need.code], need.statement);
  L.keyValues(
    [
      ['FZG A/8.3/90 stage, flash method', need.fzgStageFlash === null ? 'not used' : stage(need.fzgStageFlash)],
      ['FZG A/8.3/90 stage, integral method', need.fzgStageIntegral === null ? 'not used' : stage(need.fzgStageIntegral)],
      ['Lowest ISO VG for the λ target', need.isoVG === null ? 'none in the range searched' : `VG ${need.isoVG}`],
      ['Governing load case', need.governingLoadCase],
      ['Scuffing methods', METHODS_WORDS[need.methods]],
    ],
    { labelShare: 0.4, size: 8.5 },
  );
  L.y += 4;
  L.heading('Each oil against the need', 2);
  const check = (v: (typeof results.verdicts)[number], q: LimitCheck['quantity']) => checkWords(v.checks.find((k) => k.quantity === q));
  L.table(
    [
      { header: 'Oil', width: 2.6 },
      { header: 'Finding', width: 1.8 },
      { header: 'FZG offered / needed', width: 1.1, align: 'right' },
      { header: 'SB (worst)', width: 0.9, align: 'right' },
      { header: 'SintS (worst)', width: 0.9, align: 'right' },
      { header: 'λmin (worst)', width: 0.9, align: 'right' },
    ],
    results.verdicts.map((v) => [
      `${v.oil} (${v.oilChemistry})`,
      v.code === 'beyond-oil' ? 'no oil gives the margin' : v.oilFit === 'meets' ? 'meets the need' : `short on ${SHORTFALL_ORDER.filter((s) => v.shortfalls.includes(s)).map((s) => SHORTFALL_SHORT[s]).join(', ')}`,
      `${stage(v.oilFzgStage)} / ${stage(v.neededFzgStage)}`,
      check(v, 'scuffingSafety'),
      check(v, 'integralSafety'),
      check(v, 'lambdaMin'),
    ]),
    { fontSize: 7.5 },
  );
  L.para(`Limits (policy): SB ≥ ${ctx.review.policy.scuffingSafetyMin}, SintS ≥ ${ctx.review.policy.integralSafetyMin}, λmin ≥ ${ctx.review.policy.lambdaTarget}.`, { size: 7.5 });
}

import { describe, expect, it } from 'vitest';
import { DEMO_REVIEWS } from '../../app/review/demo';
import { parseReviewValue } from '../../app/review/parse';
import { run } from '../../app/review/run';
import { summaryText } from '../../app/cli/summary';
import { status } from '../../app/review/status';
import { writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { renderRecord } from '../../app/report/record';
import { tempDir, tool } from '../report/helpers';

/** Every generated sentence a person reads, from both demos: summary, reasons, cautions, findings. */
function sentences(): string[] {
  const out: string[] = [];
  for (const raw of Object.values(DEMO_REVIEWS)) {
    const parsed = parseReviewValue(raw);
    if (!parsed.ok) throw new Error('demo');
    const r = run(parsed.review);
    out.push(summaryText(r, { status: status(parsed.review, r), review: parsed.review }));
    for (const c of r.cases) for (const x of [...(c.verdict?.reasons ?? []), ...(c.verdict?.cautions ?? [])]) out.push((x as { text: string }).text);
    out.push(...r.changes.flatMap((c) => [c.statement, ...c.conditions]));
  }
  return out;
}

describe('generated sentences, proofread', () => {
  const all = sentences();
  it('no doubled brackets, no empty brackets', () => {
    for (const s of all) {
      expect(s, s).not.toMatch(/\(\s*\)|\)\)|\(\(/);
      // a bracket opened inside another that closes at once: "(R&O (rust …))"
      expect(s, s).not.toMatch(/\([^()]*\([^()]*\)\)/);
    }
  });
  it('the record’s text: no doubled brackets either', async () => {
    const parsed = parseReviewValue(DEMO_REVIEWS['harrow-creek-crusher-hs-pair.flankfilm.json']);
    if (!parsed.ok) throw new Error('demo');
    const pdf = join(tempDir(), 'proof.pdf');
    writeFileSync(pdf, await renderRecord(parsed.review, run(parsed.review)));
    // Up to Methods and sources: its formulas nest brackets as mathematics does.
    const text = tool('pdftotext', [pdf, '-']).replace(/\s+/g, ' ').split('Every formula the computation uses')[0] ?? '';
    expect(text.length).toBeGreaterThan(5000);
    expect(text.match(/.{0,40}\([^()]*\([^()]*\)\).{0,20}/)?.[0] ?? null).toBeNull();
  });
  it('no word left out before "the stage" ("enough the stage 1")', () => {
    for (const s of all) expect(s, s).not.toMatch(/\b(enough|than|above|below) the stage\b/);
  });
});

/**
 * The record's "The job" says what was computed and what was not: micropitting (ISO/TS 6336-22) is
 * assessed for an oil whose FVA 54 failure stage is given, and is in "Not assessed" only for the
 * oils without one (they get the λGF screen). Read back with poppler's pdftotext.
 */
import { describe, expect, it } from 'vitest';
import { writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { renderRecord } from '../../app/report/record';
import { run } from '../../app/review/run';
import type { Review } from '../../app/review/schema';
import { loadDemo, tempDir, tool } from './helpers';

async function jobText(review: Review): Promise<string> {
  const path = join(tempDir('flankfilm-scope-'), 'record.pdf');
  writeFileSync(path, await renderRecord(review, run(review)));
  // (a line may break after a slash: "ISO/ TS")
  const text = tool('pdftotext', ['-raw', '-f', '1', '-l', '3', path, '-']).replace(/\s+/g, ' ').replace(/\/ /g, '/');
  return text.slice(text.indexOf('The job'), text.indexOf('Not assessed') + 1200);
}

describe('the record says what it assessed', () => {
  const demo = loadDemo().review;
  const withStages: Review = { ...demo, oils: demo.oils.map((o) => ({ ...o, micropittingFailureStage: 9 })) };
  const without: Review = { ...demo, oils: demo.oils.map(({ micropittingFailureStage: _x, ...o }) => o) };
  const mixed: Review = { ...demo, oils: demo.oils.map(({ micropittingFailureStage: _x, ...o }, i) => (i === 0 ? { ...o, micropittingFailureStage: 9 } : o)) };

  it('every oil with its micropitting stage: Sλ is computed, and micropitting is not among what was not assessed', async () => {
    const job = await jobText(withStages);
    expect(job).toContain('the micropitting safety Sλ (ISO/TS 6336-22)');
    expect(job.slice(job.indexOf('Not assessed'))).not.toMatch(/micropitting/);
  }, 120_000);

  it('no oil with a stage: only the λGF screen, and it says so', async () => {
    const job = await jobText(without);
    expect(job).toMatch(/Not assessed:.*the micropitting safety Sλ \(no oil gives its FVA 54 micropitting failure stage, so only the λGF screen is given; ISO\/TS 6336-22\)/);
  }, 120_000);

  it('some oils without: those are named', async () => {
    const job = await jobText(mixed);
    const others = demo.oils.slice(1).map((o) => `“${o.name}”`).join(', ');
    expect(job).toContain(`the micropitting safety Sλ of ${others} (no FVA 54 micropitting failure stage given, so only the λGF screen)`);
    expect(job).not.toContain(`“${demo.oils[0]?.name}”, ${others} (no FVA 54`);
  }, 120_000);
});

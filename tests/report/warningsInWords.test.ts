/**
 * The record's warnings read as words: where, how serious, and the engine's sentence with any field
 * path in it given by its label; the machine codes and paths stay in `--json`. Read back with
 * poppler's pdftotext.
 */
import { describe, expect, it } from 'vitest';
import { writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { renderRecord } from '../../app/report/record';
import { run } from '../../app/review/run';
import type { Review } from '../../app/review/schema';
import { loadDemo, tempDir, tool } from './helpers';

describe('the record’s warnings and validity notes', () => {
  it('a data-sheet VI that disagrees with ASTM D2270 is said in words, without its code or its field path', async () => {
    const demo = loadDemo().review;
    const review: Review = { ...demo, oils: demo.oils.map((o, i) => (i === 0 ? { ...o, viscosityIndex: 150 } : o)) };
    const results = run(review);
    // The engine's own warning names the field by path and has a code (kept in the JSON) …
    const w = results.oils[0]?.warnings.find((x) => x.code === 'oil.vi-mismatch');
    expect(w?.message).toContain('oils[0].viscosityIndex');
    const path = join(tempDir('flankfilm-warnings-'), 'record.pdf');
    writeFileSync(path, await renderRecord(review, results));
    const text = tool('pdftotext', ['-raw', path, '-']).replace(/\s+/g, ' ');
    const section = text.slice(text.indexOf('Warnings and validity notes'), text.indexOf('Sign-off', text.indexOf('Warnings and validity notes')));
    // … the record gives it in words.
    expect(section).toMatch(/Oil: ISO VG 220 R&O mineral warning Viscosity index VI = 150 differs from \d+ computed by ASTM D2270/);
    expect(section).not.toMatch(/oils\[|viscosityIndex|oil\.vi-mismatch|Code \(field\)/);
  }, 120_000);
});

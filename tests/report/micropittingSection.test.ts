/**
 * The record's micropitting section (ISO/TS 6336-22), read back with poppler's pdftotext; the page
 * with the λGF chart is rendered to test-output/record/ for a human to look at.
 */
import { describe, expect, it, beforeAll } from 'vitest';
import { writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { renderRecord } from '../../app/report/record';
import { run } from '../../app/review/run';
import type { Review } from '../../app/review/schema';
import { loadDemo, outputDir, parseOrThrow, tempDir, tool } from './helpers';

// The invented demo, with an invented micropitting stage on the proposed oil only.
function demoWithStage(): Review {
  const { text } = loadDemo();
  const raw = JSON.parse(text);
  raw.oils[1].micropittingFailureStage = 9;
  return parseOrThrow(JSON.stringify(raw));
}

describe('record: micropitting section', () => {
  let text: string;
  let path: string;
  let review: Review;
  beforeAll(async () => {
    review = demoWithStage();
    const bytes = await renderRecord(review, run(review));
    path = join(tempDir(), 'micropitting.pdf');
    writeFileSync(path, bytes);
    text = tool('pdftotext', ['-enc', 'UTF-8', path, '-']);
  }, 180_000);

  it('has its own section with λGF,min, λGFT, λGFP and Sλ, and the EP caveat', () => {
    expect(text).toMatch(/Micropitting \(ISO\/TS 6336-22\)/);
    for (const h of ['λGF,min', 'λGFT', 'λGFP', 'Stage', 'Finding']) expect(text).toContain(h);
    expect(text).toMatch(/some EP additive\s+systems lower micropitting\s+resistance/);
    expect(text).toMatch(/not given/); // the in-service oil has no stage
    expect(text).toMatch(/Test gear C-GF/); // the geometry used, with its source
  });
  it('draws the λGF chart per case with the λGFP line of the oil that has a stage', () => {
    expect(text).toMatch(/λGF along the path/);
    const r = run(review);
    const lgfp = r.cases.find((c) => c.micropitting?.lambdaGFP !== null)?.micropitting?.lambdaGFP ?? 0;
    expect(text).toContain(`λGFP = ${lgfp.toPrecision(3).replace(/0+$/, '').replace(/\.$/, '')}`);
  });
  it('renders the section page for a human to check', () => {
    const out = outputDir('record');
    const pageOf = text.split('\f').findIndex((p) => p.includes('Micropitting (ISO/TS 6336-22)')) + 1;
    expect(pageOf).toBeGreaterThan(0);
    tool('pdftoppm', ['-png', '-r', '60', '-f', String(pageOf), '-l', String(pageOf + 1), path, join(out, 'micropitting')]);
  });
});

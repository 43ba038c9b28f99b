import { describe, expect, it, beforeAll } from 'vitest';
import fc from 'fast-check';
import { readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import PDFDocument from 'pdfkit';
import { renderRecord } from '../../app/report/record';
import { operatingMaps } from '../../app/review/operatingMaps';
import { fingerprintParts } from '../../app/review/fingerprint';
import { run } from '../../app/review/run';
import { signReview } from '../../app/review/signoff';
import type { Review } from '../../app/review/schema';
import { editableLeaves, editLeaf, loadDemo, tempDir } from '../report/helpers';
import { cli } from './cliHarness';

const T = 300_000;
let dir: string;
let review: Review;
let pdf: string;

beforeAll(async () => {
  dir = tempDir('flankfilm-verify-');
  const demo = loadDemo();
  const s = signReview(demo.review, demo.results, { reviewer: 'Dana Okafor (invented)', role: 'Reliability engineer', decision: 'approved', organisation: 'Harrow Creek (invented)', conditions: 'none', signedAt: '2026-12-01T09:30:00Z' });
  if (!s.ok) throw new Error('sign failed');
  review = s.review;
  pdf = join(dir, 'record.pdf');
  writeFileSync(pdf, await renderRecord(review, run(review), { maps: operatingMaps(review) ?? [] })); // as `review --pdf` makes it
}, T);

function writeReview(r: Review, name: string): string {
  const p = join(dir, name);
  writeFileSync(p, JSON.stringify(r, null, 2));
  return p;
}

/** The record with one document-information value replaced by another of the same length (offsets stay valid). */
function patchInfo(value: string, replacement: string, name: string): string {
  expect(replacement.length).toBe(value.length);
  const bytes = readFileSync(pdf);
  const at = bytes.indexOf(`(${value})`);
  expect(at).toBeGreaterThan(0);
  const out = Buffer.from(bytes);
  out.write(replacement, at + 1, 'latin1');
  const p = join(dir, name);
  writeFileSync(p, out);
  return p;
}

const flip = (hex: string): string => (hex[0] === '0' ? '1' : '0') + hex.slice(1);

describe('flankfilm verify', () => {
  it('exit 0: the record matches its attached review', async () => {
    const r = await cli('verify', pdf);
    expect(r.code, r.out + r.err).toBe(0);
    expect(r.out).toContain(fingerprintParts(review, run(review)).combined);
    expect(r.out).toContain('state: signed');
  }, T);

  it('exit 0: the record matches the same review given with --review', async () => {
    const r = await cli('verify', pdf, '--review', writeReview(review, 'same.flankfilm.json'));
    expect(r.code, r.out + r.err).toBe(0);
  }, T);

  it('exit 3 naming the inputs when the given review differs', async () => {
    const hotter = { ...review, loadCases: review.loadCases.map((c, i) => (i === 1 ? { ...c, oilTemperature_C: c.oilTemperature_C + 5 } : c)) };
    const r = await cli('verify', pdf, '--review', writeReview(hotter, 'hotter.flankfilm.json'));
    expect(r.code).toBe(3);
    expect(r.out).toContain('differs: inputs');
    expect(r.out).toContain('differs: results'); // a hotter sump changes the film and temperatures too
    expect(r.out).not.toContain('differs: engine');
  }, T);

  it('exit 3 naming the results, or the engine version, when the record says otherwise', async () => {
    const parts = fingerprintParts(review, run(review));
    const res = await cli('verify', patchInfo(parts.results, flip(parts.results), 'results.pdf'));
    expect(res.code).toBe(3);
    expect(res.out).toMatch(/differs: results/);
    expect(res.out).not.toMatch(/differs: inputs|differs: engine/);
    const eng = await cli('verify', patchInfo(parts.engine, flip(parts.engine), 'engine.pdf'));
    expect(eng.code).toBe(3);
    expect(eng.out).toMatch(/differs: engine version/);
    expect(eng.out).not.toMatch(/differs: inputs|differs: results/);
    const comb = await cli('verify', patchInfo(parts.combined, flip(parts.combined), 'combined.pdf'));
    expect(comb.code).toBe(3);
  }, T);

  it('exit 1 for a missing file, a file that is not a PDF, and a PDF that is not a record', async () => {
    expect((await cli('verify', join(dir, 'missing.pdf'))).code).toBe(1);
    const junk = join(dir, 'junk.pdf');
    writeFileSync(junk, 'this is not a pdf');
    const j = await cli('verify', junk);
    expect(j.code).toBe(1);
    expect(j.err).toContain('not a readable Flankfilm record');
    const truncated = join(dir, 'truncated.pdf');
    writeFileSync(truncated, readFileSync(pdf).subarray(0, 5000));
    expect((await cli('verify', truncated)).code).toBe(1);
    const plain = join(dir, 'plain.pdf');
    await new Promise<void>((resolve) => {
      const d = new PDFDocument();
      const chunks: Buffer[] = [];
      d.on('data', (c: Buffer) => chunks.push(c));
      d.on('end', () => {
        writeFileSync(plain, Buffer.concat(chunks));
        resolve();
      });
      d.text('hello');
      d.end();
    });
    const p = await cli('verify', plain);
    expect(p.code).toBe(1);
    expect(p.err).toContain('carries no fingerprint');
  }, T);

  it('exit 1 when --review is not a valid review', async () => {
    const bad = join(dir, 'bad.flankfilm.json');
    writeFileSync(bad, '{"format":"flankfilm.review","version":1}');
    expect((await cli('verify', pdf, '--review', bad)).code).toBe(1);
  }, T);

  it('catches a change of any single input field (property over the leaves of the signed demo review)', async () => {
    const leaves = editableLeaves(review);
    await fc.assert(
      fc.asyncProperty(fc.constantFrom(...leaves), async (path) => {
        const edited = editLeaf(review, path, true);
        if (edited === null) throw new Error(`no valid edit for ${path.join('.')}`);
        const r = await cli('verify', pdf, '--review', writeReview(edited, 'edited.flankfilm.json'));
        return r.code === 3 && r.out.includes('differs: inputs');
      }),
      { numRuns: 30, seed: 20261201 },
    );
  }, T);
});

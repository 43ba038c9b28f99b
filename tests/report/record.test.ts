/**
 * The record checked with tools that are not pdfkit: poppler's pdfinfo, pdftotext, pdftoppm,
 * pdfimages, pdffonts and pdfdetach. Rendered pages go to test-output/record/ for a human to read.
 */
import { describe, expect, it, beforeAll, vi } from 'vitest';
import { readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { readRecord } from '../../app/report/pdfRead';
import { INFO_KEYS, renderRecord } from '../../app/report/record';
import { VERDICT_WORDS } from '../../app/report/words';
import { fingerprintParts } from '../../app/review/fingerprint';
import { run } from '../../app/review/run';
import { signReview } from '../../app/review/signoff';
import type { Review } from '../../app/review/schema';
import { DEMOS, loadDemo, outputDir, parseOrThrow, pdfPages, tempDir, tool } from './helpers';

const T = 180_000;
const SIGN = { reviewer: 'Dana Okafor (invented)', role: 'Reliability engineer', decision: 'approved-with-conditions' as const, organisation: 'Harrow Creek (invented)', conditions: 'Check the backstop maker’s oil approval before the change.', signedAt: '2026-12-01T09:30:00Z' };

let dir: string;
beforeAll(() => {
  dir = tempDir();
});

function signedDemo(file: string = DEMOS[0]): Review {
  const { review, results } = loadDemo(file);
  const s = signReview(review, results, SIGN);
  if (!s.ok) throw new Error('sign failed');
  return s.review;
}

async function writeRecord(review: Review, name: string, paper: 'a4' | 'letter' = 'a4'): Promise<{ path: string; bytes: Buffer }> {
  const bytes = await renderRecord(review, run(review), { paper });
  const path = join(dir, name);
  writeFileSync(path, bytes);
  return { path, bytes };
}

describe.each(DEMOS.map((f) => [f]))('the record of %s', (file) => {
  let path: string;
  let text: string;
  let pages: number;
  let review: Review;
  beforeAll(async () => {
    review = signedDemo(file);
    ({ path } = await writeRecord(review, file.replace('.flankfilm.json', '.pdf')));
    text = tool('pdftotext', ['-enc', 'UTF-8', path, '-']);
    pages = pdfPages(path);
  }, T);

  it('has "page X of Y" on every page, Y being the page count pdfinfo reads', () => {
    expect(pages).toBeGreaterThanOrEqual(3 + run(review).cases.length); // cover, inputs, one per case, verdict …
    for (let i = 1; i <= pages; i++) expect(text).toContain(`page ${i} of ${pages}`);
    expect(text).not.toContain(`page ${pages + 1} of`);
  });

  it('contains the verdicts, σH, λmin, θB,max, the reviewer and the fingerprint, as real characters', () => {
    const results = run(review);
    for (const v of results.verdicts) expect(text).toContain(VERDICT_WORDS[v.code]);
    for (const s of ['σH', 'λmin', 'θB,max', 'θS', 'µm', '°C', SIGN.reviewer, 'Signed', fingerprintParts(review, results).combined]) expect(text).toContain(s);
    expect(text).toContain('Methods and sources');
    expect(text).toContain('[memory]');
    expect(text).toContain('common practice');
    expect(text).toMatch(/gearbox maker’s lubricant list/);
  });

  it('prints no NaN, undefined or [object Object]', () => {
    expect(text).not.toMatch(/NaN|undefined|\[object/);
  });

  it('renders every page with pdftoppm (PNGs kept in test-output/record/)', () => {
    const out = outputDir('record');
    const stem = file.replace('.flankfilm.json', '');
    for (const f of readdirSync(out).filter((f) => f.startsWith(`${stem}-`))) rmSync(join(out, f));
    tool('pdftoppm', ['-r', '60', '-png', path, join(out, stem)]);
    const pngs = readdirSync(out).filter((f) => f.startsWith(`${stem}-`) && f.endsWith('.png'));
    expect(pngs.length).toBe(pages);
    for (const p of pngs) expect(readFileSync(join(out, p)).subarray(1, 4).toString('latin1')).toBe('PNG');
  }, T);

  it('draws its charts as vectors (pdfimages finds no raster image) with the DejaVu subset embedded', () => {
    const images = tool('pdfimages', ['-list', path]).trim().split('\n');
    expect(images.length).toBe(2); // header and rule only
    const fonts = tool('pdffonts', [path]);
    expect(fonts).toMatch(/\+DejaVuSans\s+CID TrueType\s+Identity-H\s+yes\s+yes/);
    expect(fonts).toMatch(/\+DejaVuSans-Bold\s/);
  });

  it('carries its review as an attachment that round-trips to an identical review (pdfdetach and our reader)', () => {
    const out = tempDir('flankfilm-detach-');
    tool('pdfdetach', ['-saveall', '-o', out, path]);
    const files = readdirSync(out);
    expect(files).toEqual([`${review.id}.flankfilm.json`]);
    expect(parseOrThrow(readFileSync(join(out, files[0]!), 'utf8'))).toEqual(review);
    const ours = readRecord(readFileSync(path));
    expect(ours.attachments).toHaveLength(1);
    expect(parseOrThrow(new TextDecoder().decode(ours.attachments[0]!.data))).toEqual(review);
  });

  it('writes the fingerprint and its parts into the document information', () => {
    const parts = fingerprintParts(review, run(review));
    const info = readRecord(readFileSync(path)).info;
    expect(info[INFO_KEYS.fingerprint]).toBe(parts.combined);
    expect(info[INFO_KEYS.inputs]).toBe(parts.inputs);
    expect(info[INFO_KEYS.results]).toBe(parts.results);
    expect(info[INFO_KEYS.engine]).toBe(parts.engine);
    const pdfinfo = tool('pdfinfo', [path]);
    expect(pdfinfo).toContain(`Keywords:        flankfilm; fingerprint ${parts.combined}`);
    expect(pdfinfo).toMatch(/CreationDate:\s+Tue Dec\s+1 09:30:00 2026 UTC/); // from signoff.signedAt
  });
});

describe('determinism, paper, units and performance', () => {
  it('the same review and signedAt give identical bytes; another signedAt gives other bytes', async () => {
    const review = signedDemo();
    const a = await renderRecord(review, run(review));
    // Another clock: a date taken from the system would show up as a byte difference.
    vi.useFakeTimers({ toFake: ['Date'] });
    vi.setSystemTime(new Date('2031-05-05T05:05:05Z'));
    let b: Buffer;
    try {
      b = await renderRecord(parseOrThrow(JSON.stringify(review)), run(review));
    } finally {
      vi.useRealTimers();
    }
    expect(Buffer.compare(a, b)).toBe(0);
    const later = { ...review, signoff: { ...review.signoff!, signedAt: '2026-12-02T09:30:00Z' } };
    const c = await renderRecord(later, run(later));
    expect(Buffer.compare(a, c)).not.toBe(0);
    const id = (x: Buffer) => /\/ID \[<([0-9a-f]+)>/.exec(x.toString('latin1'))?.[1];
    expect(id(a)).toBeDefined();
    expect(id(a)).toBe(id(b));
  }, T);

  it('Letter paper is 612 × 792 pt, A4 595.28 × 841.89 pt (pdfinfo)', async () => {
    const review = signedDemo();
    const { path: letter } = await writeRecord(review, 'letter.pdf', 'letter');
    const { path: a4 } = await writeRecord(review, 'a4.pdf', 'a4');
    expect(tool('pdfinfo', [letter])).toMatch(/Page size:\s+612 x 792 pts \(letter\)/);
    expect(tool('pdfinfo', [a4])).toMatch(/Page size:\s+595\.28 x 841\.89 pts \(A4\)/);
  }, T);

  it('US units: the inputs and results are in in, ksi, °F, ft/min', async () => {
    const review = { ...signedDemo(), displayUnits: 'us' as const };
    const { path } = await writeRecord(review, 'us.pdf');
    const text = tool('pdftotext', ['-enc', 'UTF-8', path, '-']);
    for (const u of ['Inputs (US customary units)', ' in', ' ksi', '°F', 'ft/min', 'lbf·ft', 'hp', 'µin']) expect(text).toContain(u);
    expect(text).toContain('158 °F'); // 70 °C oil = 158 °F (°F = 1.8 °C + 32)
  }, T);

  it('a review with no oil prints dashes, not NaN, and says there is no verdict', async () => {
    const { review } = loadDemo();
    const noOil = { ...review, oils: [] };
    const { path } = await writeRecord(noOil, 'no-oil.pdf');
    const text = tool('pdftotext', ['-enc', 'UTF-8', path, '-']);
    expect(text).not.toMatch(/NaN|undefined/);
    expect(text).toContain('—');
    expect(text).toContain('No oils are in scope');
    expect(text).toContain('Draft');
  }, T);

  it('the cover puts the change finding first, then the duty\'s need once, then each oil against it; no rule ids or codes anywhere', async () => {
    const review = signedDemo();
    const { path } = await writeRecord(review, 'cover-order.pdf');
    const cover = tool('pdftotext', ['-enc', 'UTF-8', '-f', '1', '-l', '2', path, '-']); // the cover may run onto page 2
    const iChange = cover.indexOf('The change of oil');
    const iNeed = cover.indexOf('What the duty needs');
    const iOils = cover.indexOf('Each oil against the need');
    expect(iChange).toBeGreaterThan(0);
    expect(iNeed).toBeGreaterThan(iChange);
    expect(iOils).toBeGreaterThan(iNeed);
    expect(cover).toMatch(/Change supported with conditions/);
    const all = tool('pdftotext', ['-enc', 'UTF-8', path, '-']);
    expect(all).not.toMatch(/Rule: |falls-short|r-and-o|scuffing\.required-stage|oil\.fzg-stage/);
    expect(all.match(/drain hot, flush with the new oil/g)).toHaveLength(1);
  }, T);

  it('a changed review states "Changed since signing" on its cover', async () => {
    const review = signedDemo();
    const edited = { ...review, loadCases: review.loadCases.map((c, i) => (i === 0 ? { ...c, applicationFactor: c.applicationFactor + 0.1 } : c)) };
    const { path } = await writeRecord(edited, 'changed.pdf');
    const cover = tool('pdftotext', ['-enc', 'UTF-8', '-f', '1', '-l', '1', path, '-']);
    expect(cover).toContain('Changed since signing');
  }, T);

  it('exports the demo record in ≤ 1 s and ≤ 1.5 MB (measured and printed)', async () => {
    const review = signedDemo();
    const results = run(review);
    await renderRecord(review, results); // first run loads and parses the fonts
    const times: number[] = [];
    let size = 0;
    for (let i = 0; i < 3; i++) {
      const t0 = performance.now();
      size = (await renderRecord(review, results)).length;
      times.push(performance.now() - t0);
    }
    const best = Math.min(...times); // best of 3: the machine is shared, the others measure the neighbours
    console.log(`record export: best ${best.toFixed(0)} ms of ${times.map((t) => t.toFixed(0)).join(', ')} ms; ${size} bytes (${(size / 1024).toFixed(0)} KiB)`);
    expect(size).toBeLessThanOrEqual(1.5 * 1024 * 1024);
    expect(best).toBeLessThanOrEqual(1000);
  }, T);
});

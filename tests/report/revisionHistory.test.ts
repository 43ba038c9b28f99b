/** The record's revision history: one line a signing, read back from the PDF with poppler's pdftotext. */
import { describe, expect, it } from 'vitest';
import { writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { renderRecord } from '../../app/report/record';
import { run } from '../../app/review/run';
import { signReview, type SignoffDetails } from '../../app/review/signoff';
import type { Review } from '../../app/review/schema';
import { loadDemo, tempDir, tool } from './helpers';

const FIRST: SignoffDetails = { reviewer: 'Dana Okafor (invented)', role: 'Reliability engineer', decision: 'approved', signedAt: '2026-12-01T09:30:00Z' };
const SECOND: SignoffDetails = { reviewer: 'Lee Marsh (invented)', role: 'Plant engineer', decision: 'not-approved', signedAt: '2026-12-02T14:00:00Z' };

function sign(review: Review, d: SignoffDetails): Review {
  const s = signReview(review, run(review), d);
  if (!s.ok) throw new Error('sign failed');
  return s.review;
}

async function recordText(review: Review, name: string): Promise<string> {
  const path = join(tempDir('flankfilm-history-'), name);
  writeFileSync(path, await renderRecord(review, run(review)));
  return tool('pdftotext', ['-raw', path, '-']);
}

describe('the record of a review signed, changed and signed again', () => {
  it('carries a revision history: who, when, the decision and the fields changed since the previous signing', async () => {
    const first = sign(loadDemo().review, FIRST);
    const changed: Review = { ...first, loadCases: first.loadCases.map((c, i) => (i === 1 ? { ...c, oilTemperature_C: 74 } : c)) };
    const second = sign(changed, SECOND);
    const text = (await recordText(second, 'resigned.pdf')).replace(/\s+/g, ' ');
    expect(text).toContain('Revision history');
    expect(text).toMatch(/2026-12-01T09:30:00Z Dana Okafor \(invented\) \(Reliability engineer\) Approved earliest signing kept in the file/);
    expect(text).toMatch(/2026-12-02T14:00:00Z Lee Marsh \(invented\) \(Plant engineer\) Not approved Duty: Hard-rock peak: Oil temperature θoil/);
  }, 120_000);

  it('a changed KV40 names the viscosity index the editor recomputed with it, as the screen does', async () => {
    const first = sign(loadDemo().review, FIRST);
    const oils = first.oils.map((o, i) => {
      if (i !== 0) return o;
      const { viscosityIndex: _vi, ...rest } = o;
      return { ...rest, kv40_mm2s: o.kv40_mm2s + 10 };
    });
    const second = sign({ ...first, oils }, SECOND);
    const text = (await recordText(second, 'kv40.pdf')).replace(/\s+/g, ' ');
    expect(text).toContain('Not approved Oils: ISO VG 220 R&O mineral: Viscosity at 40 °C (with Viscosity index VI)');
  }, 120_000);

  it('a review signed once has no revision history section', async () => {
    const text = await recordText(sign(loadDemo().review, FIRST), 'once.pdf');
    expect(text).not.toContain('Revision history');
  }, 120_000);
});

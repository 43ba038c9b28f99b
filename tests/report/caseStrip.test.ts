import { describe, expect, it } from 'vitest';
import { writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { renderRecord } from '../../app/report/record';
import { loadDemo, tempDir, tool } from './helpers';

describe('the record’s per-case pages: one strip of charts on a shared A–E axis, figures beside each', () => {
  it('prints the figures beside the charts and the position axis title once per strip', async () => {
    const { review, results } = loadDemo();
    const pdf = join(tempDir(), 'strip.pdf');
    writeFileSync(pdf, await renderRecord(review, results));
    const text = tool('pdftotext', ['-layout', pdf, '-']);
    const pages = text.split('\f');
    const strips = pages.filter((p) => p.includes('Hertz contact stress σH') && p.includes('Contact temperature θB against θS'));
    expect(strips).toHaveLength(results.cases.length); // one strip per case × oil
    for (const p of strips) {
      for (const label of ['σH,max', 'v on the pitch line', 'λmin', 'least hmin', 'θB,max', 'θfl,max (a rise)']) expect(p).toContain(label);
      expect(p.match(/position on the line of action from T1/g)).toHaveLength(1);
    }
    // The EP oil is above FZG stage 12: its θS is not a limit, and the figure says so.
    expect(strips.some((p) => /θS \(oil above stage 12\)\s+not limiting/.test(p))).toBe(true);
  });
});

import { describe, expect, it } from 'vitest';
import { execFileSync } from 'node:child_process';
import { writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { renderRecord } from '../../app/report/record';
import { operatingMaps } from '../../app/review/operatingMaps';
import { loadDemo, tempDir } from './helpers';

describe('the record includes the operating map', () => {
  it('one map per oil for its governing case, as vector graphics, with the contour lines explained', async () => {
    const { review, results } = loadDemo();
    const maps = operatingMaps(review, { temperatures: 30, loads: 30 }) ?? [];
    const file = join(tempDir(), 'map.pdf');
    writeFileSync(file, await renderRecord(review, results, { maps }));
    const text = execFileSync('pdftotext', [file, '-'], { encoding: 'utf8' });
    expect(text).toContain('Operating map: oil temperature × load');
    for (const v of results.verdicts) expect(text).toContain(`governing case: ${v.governingLoadCase}`);
    expect(text).toMatch(/SB = 1\.5/);
    expect(execFileSync('pdfimages', ['-list', file], { encoding: 'utf8' }).trim().split('\n').length).toBe(2); // header only: no raster
  }, 60_000);
});

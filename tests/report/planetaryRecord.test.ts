import { describe, expect, it } from 'vitest';
import { writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { resultsToCsv } from '../../app/report/csv';
import { renderRecord } from '../../app/report/record';
import { loadDemo, tempDir, tool } from './helpers';

const T = 180_000;

describe('record of a planetary stage (invented ball-mill demo)', () => {
  it('gives each mesh its own results and side-by-side pages, the stage inputs and the governing mesh, and no NaN', async () => {
    const { review, results } = loadDemo('harrow-creek-ball-mill-planetary.flankfilm.json');
    const path = join(tempDir(), 'planetary.pdf');
    writeFileSync(path, await renderRecord(review, results));
    const text = tool('pdftotext', ['-enc', 'UTF-8', path, '-']);
    expect(text).not.toMatch(/NaN|undefined|\[object Object\]/);
    for (const s of ['Planetary stage', 'Speeds and torques in the carrier frame', 'Sun–planet mesh, results 1 of 4', 'Planet–ring mesh, results 4 of 4', 'sun–planet mesh', 'planet–ring mesh', 'Governing mesh: sun–planet']) expect(text).toContain(s);
  }, T);
  it('the CSV leads every row with its mesh and holds both meshes’ points', () => {
    const { results } = loadDemo('harrow-creek-ball-mill-planetary.flankfilm.json');
    const rows = resultsToCsv(results).replace(/^\uFEFF/, '').trim().split('\r\n');
    expect(rows[0]?.startsWith('mesh,load case,oil,point')).toBe(true);
    const meshes = new Set(rows.slice(1).map((r) => r.split(',')[0]));
    expect([...meshes]).toEqual(['sun-planet', 'planet-ring']);
    const points = (results.meshes ?? []).reduce((n, m) => n + m.cases.reduce((k, c) => k + c.path.n, 0), 0);
    expect(rows.length - 1).toBe(points);
  });
});

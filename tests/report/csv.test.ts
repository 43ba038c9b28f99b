import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { writeOutputs } from '../../app/cli/outputs';
import { resultsToCsv } from '../../app/report/csv';
import { loadDemo, tempDir } from './helpers';

/** RFC 4180 reader, enough for the test: quoted fields, doubled quotes, CRLF. */
function parseCsv(text: string): string[][] {
  const rows: string[][] = [];
  let row: string[] = [];
  let cell = '';
  let q = false;
  for (let i = 0; i < text.length; i++) {
    const c = text[i]!;
    if (q) {
      if (c === '"' && text[i + 1] === '"') {
        cell += '"';
        i++;
      } else if (c === '"') q = false;
      else cell += c;
    } else if (c === '"') q = true;
    else if (c === ',') {
      row.push(cell);
      cell = '';
    } else if (c === '\r' && text[i + 1] === '\n') {
      row.push(cell);
      rows.push(row);
      row = [];
      cell = '';
      i++;
    } else cell += c;
  }
  return rows;
}

describe('resultsToCsv', () => {
  const { review, results } = loadDemo();
  const csv = resultsToCsv(results, 'si');
  const rows = parseCsv(csv.replace(/^\uFEFF/, ''));
  const header = rows[0]!;

  it('starts with a UTF-8 byte-order mark and a header of names with units', () => {
    expect(csv.startsWith('\uFEFF')).toBe(true);
    expect(header.slice(0, 3)).toEqual(['load case', 'oil', 'point']);
    for (const h of ['micropitting safety Sλ (–)', 'λGF,min in the area at risk (–)', 'micropitting failure stage needed']) expect(header).toContain(h);
    for (const h of ['Hertz stress σH (MPa)', 'sliding velocity vg (m/s)', 'sum velocity vΣ (m/s)', 'film thickness hmin (µm)', 'specific film λ (–)', 'contact temperature θB (°C)', 'flash temperature θfl (K)']) expect(header).toContain(h);
  });

  it('has one row per point of every case, all rows as wide as the header', () => {
    const points = results.cases.reduce((n, c) => n + c.path.n, 0);
    expect(rows.length - 1).toBe(points);
    expect(points).toBe(review.loadCases.length * review.oils.length * review.policy.pathPoints);
    for (const r of rows) expect(r.length).toBe(header.length);
  });

  it('round-trips the numbers of the results (10 significant digits)', () => {
    const col = header.indexOf('Hertz stress σH (MPa)');
    const c = results.cases[1]!;
    const offset = results.cases[0]!.path.n;
    for (const i of [0, 57, c.path.n - 1]) {
      const row = rows[1 + offset + i]!;
      expect(row[0]).toBe(c.loadCase);
      expect(row[1]).toBe(c.oil);
      expect(Number(row[col])).toBeCloseTo(c.path.hertzStress_MPa[i]!, 6);
    }
    expect(csv).not.toMatch(/NaN|undefined|e[+-]\d/);
  });

  it('quotes a name with a comma or a quote (RFC 4180)', () => {
    const odd = { ...results, cases: [{ ...results.cases[0]!, loadCase: 'Peak, "hard" rock' }] };
    const r = parseCsv(resultsToCsv(odd).replace(/^\uFEFF/, ''));
    expect(r[1]![0]).toBe('Peak, "hard" rock');
  });

  it('US units convert the values and name the units', () => {
    const us = parseCsv(resultsToCsv(results, 'us').replace(/^\uFEFF/, ''));
    const h = us[0]!;
    expect(h).toContain('Hertz stress σH (ksi)');
    expect(h).toContain('contact temperature θB (°F)');
    const si = Number(rows[1]![header.indexOf('contact temperature θB (°C)')]);
    expect(Number(us[1]![h.indexOf('contact temperature θB (°F)')])).toBeCloseTo(si * 1.8 + 32, 6); // °F = 1.8 °C + 32
  });

  it('writeOutputs writes it to --csv OUT', async () => {
    const out = join(tempDir(), 'points.csv');
    let msg = '';
    const code = await writeOutputs(review, results, { csv: out, paper: 'a4' }, { out: (s) => (msg += s), err: (s) => (msg += s) });
    expect(code, msg).toBe(0);
    expect(readFileSync(out, 'utf8')).toBe(csv);
  });
});

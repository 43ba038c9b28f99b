import { describe, expect, it } from 'vitest';
import { mkdtempSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { roundedCell, summaryCsv } from '../../app/report/summaryCsv';
import { cli } from '../cli/cliHarness';
import { loadDemo } from './helpers';

const rows = (csv: string) => csv.replace(/^\uFEFF/, '').trimEnd().split('\r\n').map((l) => l.split(','));

describe('summary CSV: one row per case × oil with figures, limits and pass or fail', () => {
  const { review, results } = loadDemo();
  const table = rows(summaryCsv(results, 'si'));
  const header = table[0] ?? [];
  const col = (name: string) => header.indexOf(name);

  it('has a row per case × oil, in the results’ order, with the units in the header', () => {
    expect(table).toHaveLength(1 + review.loadCases.length * review.oils.length);
    expect(header).toContain('max contact temperature θB (°C)');
    expect(header).toContain('SB limit');
    expect(table.slice(1).map((r) => `${r[0]}|${r[1]}`)).toEqual(results.cases.map((c) => `${c.loadCase}|${c.oil}`));
  });

  it('each figure sits beside its policy limit, and pass or fail follows figure ≥ limit', () => {
    for (const r of table.slice(1)) {
      const sb = Number(r[col('SB')]);
      const limit = Number(r[col('SB limit')]);
      expect(limit).toBe(review.policy.scuffingSafetyMin);
      expect(r[col('SB pass')]).toBe(sb >= limit ? 'pass' : 'fail');
      const lam = Number(r[col('λmin')]);
      expect(r[col('λmin pass')]).toBe(lam >= review.policy.lambdaTarget ? 'pass' : 'fail');
      const all = ['SB pass', 'SintS pass', 'λmin pass'].map((n) => r[col(n)]);
      expect(r[col('all limits pass')]).toBe(all.every((p) => p !== 'fail') ? 'pass' : 'fail');
    }
  });

  it('rounds to 4 significant digits (ratios to 3 decimals), never an exponent', () => {
    expect(roundedCell(1234.5678, { sig: 4 })).toBe('1235');
    expect(roundedCell(123456, { sig: 4 })).toBe('123500');
    expect(roundedCell(0.0123456, { sig: 4 })).toBe('0.01235');
    expect(roundedCell(1.23456, { dp: 3 })).toBe('1.235');
    expect(roundedCell(1.2e-9, { sig: 4 })).toBe('0.0000000012');
    for (const r of table.slice(1)) {
      const hertz = r[col('max Hertz stress σH (MPa)')] ?? '';
      expect(hertz.replace(/^0\.0*|\./g, '').replace(/0+$/, '').length).toBeLessThanOrEqual(4);
      expect(r.join(',')).not.toMatch(/\de[+-]?\d/i);
    }
  });

  it('US units convert the figures (°F in the header), the limits stay ratios', () => {
    const us = rows(summaryCsv(results, 'us'));
    expect(us[0]).toContain('max contact temperature θB (°F)');
    const c = Number(table[1]?.[col('max contact temperature θB (°C)')]);
    const f = Number(us[1]?.[us[0]!.indexOf('max contact temperature θB (°F)')]);
    expect(f).toBeCloseTo(c * 1.8 + 32, -1); // °F = 1.8 °C + 32; both rounded to 4 digits
  });

  it('flankfilm review FILE --summary-csv OUT writes it, and never over the review', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'flankfilm-summary-'));
    const out = join(dir, 's.csv');
    const file = 'assets/demo/harrow-creek-crusher-hs-pair.flankfilm.json';
    expect((await cli('review', file, '--summary-csv', out)).code).toBe(0);
    expect(readFileSync(out, 'utf8')).toContain('all limits pass');
    const self = await cli('review', file, '--summary-csv', file);
    expect(self.code).toBe(2);
    expect(self.err).toMatch(/never overwrites an input/);
  });
});

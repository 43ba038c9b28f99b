/**
 * Hostile inputs to the CLI: formula text in CSV cells, duplicate JSON keys, subnormal numbers,
 * command names that are Object's own methods, control characters, and characters the record's
 * font cannot draw. Each case failed before (wrote the formula, kept the last key, printed
 * `wBt = Infinity N/m`, said "internal error", passed ESC through, printed boxes).
 */
import { describe, expect, it, beforeAll } from 'vitest';
import { readFileSync, writeFileSync, existsSync } from 'node:fs';
import { join } from 'node:path';
import { CRUSHER, tempDir } from '../report/helpers';
import { cli } from './cliHarness';

const T = 120_000;
let dir: string;
const demo = () => JSON.parse(readFileSync(CRUSHER, 'utf8')) as Record<string, any>;
beforeAll(() => {
  dir = tempDir('flankfilm-bad-');
});
function file(name: string, text: string): string {
  const p = join(dir, name);
  writeFileSync(p, text);
  return p;
}
function withReview(name: string, mutate: (r: Record<string, any>) => void): string {
  const r = demo();
  mutate(r);
  return file(name, JSON.stringify(r, null, 2));
}

/** Split one CSV line (RFC 4180 quoting). */
function cells(line: string): string[] {
  const out: string[] = [];
  let cur = '';
  let q = false;
  for (let i = 0; i < line.length; i++) {
    const c = line[i]!;
    if (q) {
      if (c === '"' && line[i + 1] === '"') {
        cur += '"';
        i++;
      } else if (c === '"') q = false;
      else cur += c;
    } else if (c === '"') q = true;
    else if (c === ',') {
      out.push(cur);
      cur = '';
    }
    else cur += c;
  }
  out.push(cur);
  return out;
}

describe('CSV formula injection', () => {
  it('text cells beginning with = + - @ get an apostrophe; numbers (negative ones too) stay numbers', async () => {
    const src = withReview('formula.flankfilm.json', (r) => {
      r.loadCases[0].name = '=HYPERLINK("http://example.invalid","x")';
      r.loadCases[1].name = '@SUM(A1:A9)';
      r.oils[0].name = '+cmd|calc';
      r.oils[1].name = '-2+3';
    });
    const csv = join(dir, 'cases.csv');
    const map = join(dir, 'map.csv');
    const r = await cli('review', src, '--csv', csv, '--map', map);
    expect(r.code, r.err).toBe(0);
    for (const out of [csv, map]) {
      const rows = readFileSync(out, 'utf8').replace(/^\uFEFF/, '').split(/\r?\n/).filter(Boolean).slice(1).map(cells);
      const firsts = new Set(rows.flatMap((c) => [c[0]!, c[1]!]));
      for (const name of ['=HYPERLINK("http://example.invalid","x")', '@SUM(A1:A9)', '+cmd|calc', '-2+3']) {
        expect(firsts.has(name), `${out}: ${name} unchanged`).toBe(false);
        expect(firsts.has(`'${name}`), `${out}: ${name} neutralised`).toBe(true);
      }
      // No cell at all starts with a formula character, except plain numbers such as -0.42.
      for (const row of rows) for (const c of row) if (/^[=+\-@]/.test(c)) expect(c, out).toMatch(/^-\d+(\.\d+)?$/);
    }
    // The cases CSV has negative numbers (specific sliding below the pitch point) written as numbers.
    const anyNegative = readFileSync(csv, 'utf8').split(/\r?\n/).slice(1).some((l) => cells(l).some((c) => /^-\d/.test(c)));
    expect(anyNegative).toBe(true);
  }, T);
});

describe('duplicate JSON keys are refused, naming the key path (exit 1)', () => {
  const text = readFileSync(CRUSHER, 'utf8');
  it.each([
    ['top level', text.replace('"title":', '"title": "A forged title",\n  "title":'), 'title'],
    ['nested', text.replace('"teeth":', '"teeth": 40, "teeth":'), 'gearPair.pinion.teeth'],
    ['in an array element', text.replace(/("loadCases": \[\s*\{)/, '$1 "name": "dup", '), 'loadCases[0].name'],
    ['spelt with an escape', text.replace('"title":', '"\\u0074itle": "x",\n  "title":'), 'title'],
  ])('%s', async (_what, t, path) => {
    const r = await cli('review', file('dup.flankfilm.json', t), '--json');
    expect(r.code).toBe(1);
    expect(r.err).toContain(`${path}: this key appears twice in the same object`);
  });
  it('the same key in two different objects is fine', async () => {
    expect((await cli('review', CRUSHER, '--json')).code).toBe(0); // every load case has its own "name"
  });
});

describe('tiny numbers: errors name the review field and its limit, never an engine symbol', () => {
  it.each([
    ['gearPair.faceWidth_mm', (r: any) => (r.gearPair.faceWidth_mm = 1e-320), 'must be at least 0.5 mm'],
    ['loadCases[0].pinionSpeed_rpm', (r: any) => (r.loadCases[0].pinionSpeed_rpm = 1e-320), 'must be at least 0.1 rpm'],
    ['loadCases[0].power_kW', (r: any) => (r.loadCases[0].power_kW = 1e-320), 'must be at least 0.001 kW'],
    ['gearPair.pinion.material.youngsModulus_GPa', (r: any) => (r.gearPair.pinion.material = { youngsModulus_GPa: 1e-320, poissonRatio: 0.3, thermalConductivity_WmK: 45, density_kgm3: 7800, specificHeat_JkgK: 440, structuralFactorXW: 1 }), 'must be at least 0.5 GPa'],
    ['gearPair.wheel.material.thermalConductivity_WmK', (r: any) => (r.gearPair.wheel.material = { youngsModulus_GPa: 206, poissonRatio: 0.3, thermalConductivity_WmK: 1e-320, density_kgm3: 7800, specificHeat_JkgK: 440, structuralFactorXW: 1 }), 'must be at least 0.1 W/(m·K)'],
    ['oils[0].pressureViscosity_1perGPa', (r: any) => (r.oils[0].pressureViscosity_1perGPa = 1e-320), 'must be at least 1 1/GPa'],
  ])('%s = 1e-320', async (path, mutate, limit) => {
    const src = withReview('tiny.flankfilm.json', (r) => {
      if (path.endsWith('power_kW')) delete r.loadCases[0].pinionTorque_Nm;
      mutate(r);
      if (path.endsWith('power_kW') && r.loadCases[0].pinionTorque_Nm !== undefined) delete r.loadCases[0].pinionTorque_Nm;
    });
    const r = await cli('review', src, '--json');
    expect(r.code).toBe(1);
    expect(r.err).toContain(`${path}: ${limit}`);
    expect(r.err).not.toMatch(/Infinity|wBt|bH\b/);
  });
});

describe('unknown commands', () => {
  it.each(['constructor', '__proto__', 'toString', 'hasOwnProperty', 'valueOf'])('"%s" gives usage, exit 2', async (name) => {
    const r = await cli(name);
    expect(r.code).toBe(2);
    expect(r.err).toContain('unknown command');
    expect(r.err).toContain('usage:');
  });
  it('a command name with control characters is printed escaped', async () => {
    const r = await cli('\u001b[31mred\u0007');
    expect(r.code).toBe(2);
    expect(r.err).not.toMatch(/[\u0000-\u0008\u000b-\u001f]/);
  });
});

describe('control characters are refused in the schema (exit 1, the field named)', () => {
  it.each([
    ['loadCases[0].name', (r: any) => (r.loadCases[0].name = 'Peak\u001b[2J')],
    ['oils[0].name', (r: any) => (r.oils[0].name = 'Oil\u0007')],
    ['title', (r: any) => (r.title = 'Title\u0000')],
    ['title', (r: any) => (r.title = 'one\ntwo')],
    ['oils[1].name', (r: any) => (r.oils[1].name = 'abc\u202edcba')],
  ])('%s', async (path, mutate) => {
    const r = await cli('review', withReview('ctl.flankfilm.json', mutate), '--json');
    expect(r.code).toBe(1);
    expect(r.err).toContain(`${path}: must not hold control characters`);
    expect(r.err).not.toMatch(/[\u0000\u0007\u001b]/);
  });
  it('line breaks and tabs stay allowed in the notes', async () => {
    const r = await cli('review', withReview('notes.flankfilm.json', (x) => (x.notes = 'line one\n\tline two')), '--json');
    expect(r.code, r.err).toBe(0);
  });
});

describe('characters the record font cannot draw', () => {
  it('CJK or emoji in a name: no record, a message saying so and naming the field; --json still works', async () => {
    const src = withReview('cjk.flankfilm.json', (r) => {
      r.oils[0].name = '齿轮油 220';
      r.loadCases[1].name = 'Peak 🔥';
    });
    const pdf = join(dir, 'cjk.pdf');
    const r = await cli('review', src, '--pdf', pdf);
    expect(r.code).toBe(1);
    expect(r.err).toContain('oils[0].name: the record\'s font (DejaVu Sans) cannot draw "齿" (U+9F7F)');
    expect(r.err).toContain('loadCases[1].name: the record\'s font (DejaVu Sans) cannot draw "🔥" (U+1F525)');
    expect(existsSync(pdf)).toBe(false);
    expect((await cli('review', src, '--json')).code).toBe(0);
  }, T);
  it('Greek, accents and the unit signs are drawn (the demo and a Greek name make a record)', async () => {
    const src = withReview('greek.flankfilm.json', (r) => (r.oils[0].name = 'Λιπαντικό θ ≤ 90 °C — Ölfüllung'));
    const r = await cli('review', src, '--pdf', join(dir, 'greek.pdf'));
    expect(r.code, r.err).toBe(0);
  }, T);
});

describe('an invalid JSON file: the message says where, never what', () => {
  it('no excerpt of the file in the message', async () => {
    const r = await cli('review', file('secret.flankfilm.json', '{"format": "flankfilm.review", "salary": topsecret}'), '--json');
    expect(r.code).toBe(1);
    expect(r.err).toContain('not valid JSON');
    expect(r.err).not.toContain('topsecret');
  });
});

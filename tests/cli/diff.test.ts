import { beforeAll, describe, expect, it } from 'vitest';
import { copyFileSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { run } from '../../app/review/run';
import { fingerprint } from '../../app/review/fingerprint';
import { CRUSHER, parseOrThrow, tempDir } from '../report/helpers';
import { cli } from './cliHarness';

const T = 120_000;
const SIGN = ['--reviewer', 'Dana Okafor (invented)', '--role', 'Reliability engineer', '--decision', 'approved', '--signed-at', '2026-12-01T09:30:00Z'];
let dir: string;
let signed: string;
beforeAll(async () => {
  dir = tempDir('flankfilm-diffcli-');
  signed = join(dir, 'signed.flankfilm.json');
  copyFileSync(CRUSHER, signed);
  const r = await cli('sign', signed, ...SIGN);
  if (r.code !== 0) throw new Error(r.err);
}, T);

/** A copy of the signed review, edited as a person would edit the JSON. */
function variant(name: string, edit: (j: any) => void): string {
  const j = JSON.parse(readFileSync(signed, 'utf8'));
  edit(j);
  const p = join(dir, name);
  writeFileSync(p, JSON.stringify(j, null, 2));
  return p;
}

describe('flankfilm diff REVIEW (against its own signed state)', () => {
  it('an untouched signed review: no changes, exit 0', async () => {
    const r = await cli('diff', signed);
    expect(r.code, r.err).toBe(0);
    expect(r.out).toContain('No changes since signing.');
    const j = await cli('diff', signed, '--json');
    expect(JSON.parse(j.out)).toMatchObject({ changes: [], verdictChanged: false, resultsChanged: [] });
  }, T);

  it('two changed inputs: exactly those two, by panel, with label, unit, before and after; exit 3', async () => {
    const f = variant('two.flankfilm.json', (j) => {
      j.oils[0].kv40_mm2s = 240;
      j.loadCases[1].oilTemperature_C = 75;
    });
    const r = await cli('diff', f);
    expect(r.code, r.err).toBe(3);
    expect(r.out).toMatch(/\nDuty\n {2}Hard-rock peak: Oil temperature θoil: 68 °C → 75 °C\n/);
    expect(r.out).toMatch(/\nOils\n {2}ISO VG 220 R&O mineral: Viscosity at 40 °C: 220 mm²\/s → 240 mm²\/s\n/);
    expect(r.out).toMatch(/The verdict (did not change|changed)\./);
    expect(r.out).not.toMatch(/kv40_mm2s|oilTemperature_C/); // the reader sees labels, not paths
    const j = JSON.parse((await cli('diff', f, '--json')).out);
    expect(j.changes.map((c: any) => [c.path, c.before, c.after])).toEqual([
      ['loadCases[1].oilTemperature_C', 68, 75],
      ['oils[0].kv40_mm2s', 220, 240],
    ]);
    // verdictChanged against an independent look at the two computations.
    const was = run(parseOrThrow(readFileSync(signed, 'utf8')));
    const now = run(parseOrThrow(readFileSync(f, 'utf8')));
    const moved = was.verdicts.some((v, i) => v.code !== now.verdicts[i]?.code) || was.cases.some((c, i) => c.verdict?.code !== now.cases[i]?.verdict?.code);
    expect(j.verdictChanged).toBe(moved);
    const sb = j.resultsChanged.find((m: any) => m.quantity === 'scuffingSafety' && m.loadCase === 'Hard-rock peak' && m.oil === 'ISO VG 220 R&O mineral');
    const wasCase = was.cases.find((c) => c.loadCase === 'Hard-rock peak' && c.oil === 'ISO VG 220 R&O mineral')!;
    expect(sb.before).toBe(Number(wasCase.scuffingSafety!.toPrecision(3)));
  }, T);

  it('an unsigned review has no signed state: exit 1 with the reason', async () => {
    const r = await cli('diff', CRUSHER);
    expect(r.code).toBe(1);
    expect(r.err).toContain('not signed');
  }, T);

  it('tampering with the stored signed state is reported by diff and by verify (exit 3)', async () => {
    const f = variant('tampered.flankfilm.json', (j) => (j.signoff.signedState.loadCases[0].oilTemperature_C = 40));
    const d = await cli('diff', f);
    expect(d.code).toBe(3);
    expect(d.out).toContain('do not match its sign-off’s fingerprint');
    const pdf = join(dir, 'signed.pdf');
    expect((await cli('review', signed, '--pdf', pdf)).code).toBe(0);
    const v = await cli('verify', pdf, '--review', f);
    expect(v.code).toBe(3);
    expect(v.out).toContain('differs: inputs');
    expect(v.out).toContain('signed state:');
    const ok = await cli('verify', pdf, '--review', signed);
    expect(ok.code, ok.out).toBe(0);
    expect(ok.out).not.toContain('signed state:');
  }, T);

  it('a file signed before the signed state was kept: no field-level audit, exit 0 while the fingerprint matches, 3 after an edit', async () => {
    const j = JSON.parse(readFileSync(CRUSHER, 'utf8'));
    const review = parseOrThrow(JSON.stringify(j));
    const so = { reviewer: 'R (invented)', role: 'Engineer', decision: 'approved' as const, signedAt: '2026-01-01T00:00:00Z', engineVersion: run(review).flankfilm, fingerprint: '0'.repeat(64) };
    so.fingerprint = fingerprint({ ...review, signoff: so }, run(review)); // the former recipe
    const f = join(dir, 'old.flankfilm.json');
    writeFileSync(f, JSON.stringify({ ...j, signoff: so }));
    const r = await cli('diff', f);
    expect(r.code, r.err).toBe(0);
    expect(r.out).toContain('no field-level audit is possible');
    // Such a file still verifies against its record.
    const pdf = join(dir, 'old.pdf');
    expect((await cli('review', f, '--pdf', pdf)).code).toBe(0);
    const v = await cli('verify', pdf, '--review', f);
    expect(v.code, v.out).toBe(0);
    expect(v.out).toContain('state: signed');
    writeFileSync(f, JSON.stringify({ ...j, title: 'Edited', signoff: so }));
    const e = await cli('diff', f, '--json');
    expect(e.code).toBe(3);
    expect(JSON.parse(e.out)).toMatchObject({ changes: null, audit: 'not-kept' });
  }, T);
});

describe('flankfilm diff A B', () => {
  it('inserting a load case in the middle is one added case', async () => {
    const f = variant('inserted.flankfilm.json', (j) => j.loadCases.splice(1, 0, { ...j.loadCases[0], name: 'Overload trip (invented)' }));
    const r = await cli('diff', signed, f, '--json');
    expect(r.code).toBe(3);
    expect(JSON.parse(r.out).changes.map((c: any) => [c.kind, c.path])).toEqual([['added', 'loadCases[1]']]);
    const t = await cli('diff', signed, f);
    expect(t.out).toContain('Load case “Overload trip (invented)” added');
  }, T);

  it('the same file twice: exit 0', async () => {
    const r = await cli('diff', signed, signed);
    expect(r.code).toBe(0);
    expect(r.out).toContain('No differences in the inputs.');
  }, T);

  it('another format, or a newer version, gives a clear message and exit 1', async () => {
    const oils = join(dir, 'list.flankfilm-oils.json');
    writeFileSync(oils, JSON.stringify({ format: 'flankfilm.oils', version: 1, oils: [] }));
    const a = await cli('diff', signed, oils);
    expect(a.code).toBe(1);
    expect(a.err).toContain('this is a "flankfilm.oils" file, not a review');
    const newer = variant('newer.flankfilm.json', (j) => (j.version = 99));
    const b = await cli('diff', newer, signed);
    expect(b.code).toBe(1);
    expect(b.err).toMatch(/version 99, made by a newer Flankfilm/);
  }, T);

  it('usage: no file, or three, exit 2', async () => {
    expect((await cli('diff')).code).toBe(2);
    expect((await cli('diff', signed, signed, signed)).code).toBe(2);
  }, T);
});

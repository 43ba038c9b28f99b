import { beforeAll, describe, expect, it } from 'vitest';
import { execFileSync } from 'node:child_process';
import { copyFileSync, existsSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { cli } from './cliHarness';
import { renderFleetRecord } from '../../app/report/fleet/fleetRecord';
import { runFleet } from '../../app/fleet/fleet';
import { parseOilsText } from '../../app/fleet/oilsFile';
import { parseReviewText } from '../../app/review/parse';

const OILS = 'assets/demo/fleet/harrow-creek-candidates.flankfilm-oils.json';
const FLEET_DIR = 'assets/demo/fleet';
const CRUSHER = 'assets/demo/harrow-creek-crusher-hs-pair.flankfilm.json';
let dir: string;
beforeAll(() => {
  dir = mkdtempSync(join(tmpdir(), 'flankfilm-fleet-'));
});

describe('flankfilm fleet', () => {
  it('--json gives the shape of the issue: gearboxes, oils, fit, cover, assignment, unserved', async () => {
    const { code, out } = await cli('fleet', FLEET_DIR, CRUSHER, '--oils', OILS, '--json');
    expect(code).toBe(0);
    const r = JSON.parse(out);
    for (const k of ['gearboxes', 'oils', 'fit', 'cover', 'assignment', 'unserved']) expect(r, k).toHaveProperty(k);
    expect(r.gearboxes).toHaveLength(5); // four in the fleet folder and the crusher
    expect(r.fit).toHaveLength(5 * r.oils.length);
    for (const c of r.fit) for (const k of ['gearbox', 'oil', 'meets', 'shortfalls', 'governingCase']) expect(c, k).toHaveProperty(k);
    for (const a of r.assignment) expect(r.cover).toContain(a.oil);
    for (const a of r.assignment) expect(r.fit.find((c: any) => c.gearbox === a.gearbox && c.oil === a.oil).meets).toBe(true);
    for (const u of r.unserved) expect(r.fit.filter((c: any) => c.gearbox === u.gearbox && c.meets)).toHaveLength(0);
  });

  it('prints a summary in words, without codes', async () => {
    const { code, out } = await cli('fleet', FLEET_DIR, '--oils', OILS);
    expect(code).toBe(0);
    expect(out).toMatch(/Smallest oil set/);
    expect(out).toMatch(/licensed engineer/);
    expect(out).not.toMatch(/fzg-stage|extreme-pressure|r-and-o|beyond-oil|not-computed/);
  });

  it('refuses a candidate file with a bad oil, naming the file and the field', async () => {
    const bad = JSON.parse(readFileSync(OILS, 'utf8'));
    bad.oils[1].kv100_mm2s = 5000;
    const p = join(dir, 'bad.flankfilm-oils.json');
    writeFileSync(p, JSON.stringify(bad));
    const { code, out, err } = await cli('fleet', FLEET_DIR, '--oils', p);
    expect(code).toBe(1);
    expect(out).toBe('');
    expect(err).toContain(p);
    expect(err).toContain('oils[1].kv100_mm2s');
  });

  it('names a review that fails to parse and goes on with the others', async () => {
    const sub = mkdtempSync(join(dir, 'mixed-'));
    copyFileSync(CRUSHER, join(sub, 'a-crusher.flankfilm.json'));
    writeFileSync(join(sub, 'b-broken.flankfilm.json'), '{"format": "flankfilm.review", "version": 1, "title": ');
    const wrong = JSON.parse(readFileSync(CRUSHER, 'utf8'));
    wrong.gearPair.pinion.teeth = 2.5;
    writeFileSync(join(sub, 'c-wrong.flankfilm.json'), JSON.stringify(wrong));
    const { code, out, err } = await cli('fleet', sub, '--oils', OILS, '--json');
    expect(code).toBe(1);
    expect(err).toContain(join(sub, 'b-broken.flankfilm.json'));
    expect(err).toContain(join(sub, 'c-wrong.flankfilm.json'));
    expect(err).toContain('gearPair.pinion.teeth');
    const r = JSON.parse(out);
    expect(r.gearboxes.map((g: any) => g.source)).toEqual([join(sub, 'a-crusher.flankfilm.json')]);
    expect(r.failed.map((f: any) => f.source)).toEqual([join(sub, 'b-broken.flankfilm.json'), join(sub, 'c-wrong.flankfilm.json')]);
  });

  it('never writes over an input, and asks for --oils', async () => {
    const before = readFileSync(OILS, 'utf8');
    expect((await cli('fleet', FLEET_DIR, '--oils', OILS, '--csv', OILS)).code).toBe(2);
    expect(readFileSync(OILS, 'utf8')).toBe(before);
    expect((await cli('fleet', FLEET_DIR)).code).toBe(2);
    expect((await cli('fleet', '--oils', OILS)).code).toBe(2);
  });

  it('writes the fit table as CSV, a spreadsheet formula in a name neutralised', async () => {
    const evil = JSON.parse(readFileSync(CRUSHER, 'utf8'));
    evil.title = '=HYPERLINK("http://example.invalid","x")';
    const sub = mkdtempSync(join(dir, 'csv-'));
    writeFileSync(join(sub, 'evil.flankfilm.json'), JSON.stringify(evil));
    const oils = JSON.parse(readFileSync(OILS, 'utf8'));
    oils.oils[0].name = '-2+3 cheap oil';
    writeFileSync(join(sub, 'oils.flankfilm-oils.json'), JSON.stringify(oils));
    const csv = join(sub, 'fit.csv');
    const { code } = await cli('fleet', sub, '--oils', join(sub, 'oils.flankfilm-oils.json'), '--csv', csv);
    expect(code).toBe(0);
    const text = readFileSync(csv, 'utf8');
    const lines = text.replace(/^\uFEFF/, '').trimEnd().split('\r\n');
    expect(lines[0]).toContain(",'-2+3 cheap oil,");
    expect(lines[1]?.startsWith('"\'=HYPERLINK(""http://example.invalid"",""x"")"')).toBe(true);
    expect(lines).toHaveLength(3); // header, one gearbox, the set
    expect(lines[2]?.startsWith('smallest oil set,')).toBe(true);
  });

  it('schema --oils prints the candidate file\'s JSON Schema', async () => {
    const { code, out } = await cli('schema', '--oils');
    expect(code).toBe(0);
    expect(JSON.parse(out).$id).toBe('urn:flankfilm:oils:v1');
    expect(JSON.parse((await cli('schema')).out).$id).toBe('urn:flankfilm:review:v1');
    expect((await cli('schema', '--bogus')).code).toBe(2);
  });
});

describe('the fleet record (PDF)', () => {
  const oilsFile = parseOilsText(readFileSync(OILS, 'utf8'));
  if (!oilsFile.ok) throw new Error('demo oils');
  const gearboxes = ['harrow-creek-feeder-final-pair', 'harrow-creek-stacker-hs-pair', 'harrow-creek-screen-drive-spur-pair'].map((n) => {
    const p = parseReviewText(readFileSync(join(FLEET_DIR, `${n}.flankfilm.json`), 'utf8'));
    if (!p.ok) throw new Error(n);
    return { source: n, review: p.review };
  });
  const result = runFleet({ gearboxes, oils: oilsFile.oils });

  it('holds the fit table, the set, the assignment, the cautions, a sign-off block and the fingerprint', async () => {
    const pdf = await renderFleetRecord(result, { gearboxes, oilsFile: oilsFile.file });
    const path = join(dir, 'fleet.pdf');
    writeFileSync(path, pdf);
    const text = execFileSync('pdftotext', ['-layout', path, '-'], { encoding: 'utf8' });
    for (const s of ['Fit table', 'The smallest oil set', 'Assignment', 'Gearboxes no candidate serves', 'Mixing oils', 'Flushing', 'Yellow metals', 'Backstops', 'licensed engineer', 'Sign-off', 'Fingerprint of this record', '✓ meets', '✗']) expect(text, s).toContain(s);
    for (const o of result.cover) expect(text).toContain(o);
    expect(text).not.toMatch(/fzg-stage|extreme-pressure|not-computed/);
    expect(existsSync(path)).toBe(true);
  });

  it('is deterministic: the same inputs give the same bytes', async () => {
    const a = await renderFleetRecord(result, { gearboxes, oilsFile: oilsFile.file });
    const b = await renderFleetRecord(result, { gearboxes, oilsFile: oilsFile.file });
    expect(Buffer.compare(a, b)).toBe(0);
  });
});

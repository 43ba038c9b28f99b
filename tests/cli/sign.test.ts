import { describe, expect, it, beforeAll } from 'vitest';
import { copyFileSync, readFileSync, readdirSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { run } from '../../app/review/run';
import { status } from '../../app/review/status';
import { ENGINE_VERSION } from '../../app/engine/version';
import { CRUSHER, parseOrThrow, tempDir } from '../report/helpers';
import { cli } from './cliHarness';

const T = 120_000;
const ARGS = ['--reviewer', 'Dana Okafor (invented)', '--role', 'Reliability engineer', '--decision', 'approved-with-conditions', '--organisation', 'Harrow Creek (invented)', '--conditions', 'Oil analysis every 500 h', '--signed-at', '2026-12-01T09:30:00Z'];
let dir: string;
beforeAll(() => {
  dir = tempDir('flankfilm-signcli-');
});
function copy(name: string): string {
  const p = join(dir, name);
  copyFileSync(CRUSHER, p);
  return p;
}

describe('flankfilm sign', () => {
  it('writes the sign-off with signedAt, engine version and fingerprint, and the review reads back as Signed', async () => {
    const file = copy('a.flankfilm.json');
    const before = JSON.parse(readFileSync(file, 'utf8'));
    const r = await cli('sign', file, ...ARGS);
    expect(r.code, r.err).toBe(0);
    const after = JSON.parse(readFileSync(file, 'utf8'));
    expect(after.signoff).toMatchObject({ reviewer: 'Dana Okafor (invented)', role: 'Reliability engineer', decision: 'approved-with-conditions', organisation: 'Harrow Creek (invented)', conditions: 'Oil analysis every 500 h', signedAt: '2026-12-01T09:30:00Z', engineVersion: ENGINE_VERSION });
    expect(after.signoff.fingerprint).toMatch(/^[0-9a-f]{64}$/);
    expect(r.out).toContain(after.signoff.fingerprint);
    const { signoff: _s, ...rest } = after;
    expect(rest).toEqual(before); // the rest of the file is kept as written (defaults stay implicit)
    const review = parseOrThrow(readFileSync(file, 'utf8'));
    expect(status(review, run(review))).toBe('signed');
    expect(readdirSync(dir).filter((f) => f.endsWith('.tmp'))).toEqual([]); // atomic write leaves no temp file
  }, T);

  it('an edit after signing makes the review "changed since signing"', async () => {
    const file = copy('b.flankfilm.json');
    expect((await cli('sign', file, ...ARGS)).code).toBe(0);
    const raw = JSON.parse(readFileSync(file, 'utf8'));
    raw.gearPair.faceWidth_mm += 1;
    writeFileSync(file, JSON.stringify(raw));
    const review = parseOrThrow(readFileSync(file, 'utf8'));
    expect(status(review, run(review))).toBe('changed-since-signing');
  }, T);

  it('an invalid review exits 1 and leaves the file byte for byte as it was', async () => {
    const file = join(dir, 'bad.flankfilm.json');
    const raw = JSON.parse(readFileSync(CRUSHER, 'utf8'));
    raw.gearPair.pinion.teeth = 3;
    const text = `${JSON.stringify(raw, null, 2)}\n`;
    writeFileSync(file, text);
    const r = await cli('sign', file, ...ARGS);
    expect(r.code).toBe(1);
    expect(r.err).toContain('gearPair.pinion.teeth');
    expect(readFileSync(file, 'utf8')).toBe(text);
  }, T);

  it('a malformed --signed-at exits 1, names signoff.signedAt, and leaves the file untouched', async () => {
    const file = copy('c.flankfilm.json');
    const text = readFileSync(file, 'utf8');
    const r = await cli('sign', file, ...ARGS.slice(0, -2), '--signed-at', 'last Tuesday');
    expect(r.code).toBe(1);
    expect(r.err).toContain('signoff.signedAt');
    expect(readFileSync(file, 'utf8')).toBe(text);
  }, T);

  it('missing --reviewer, a bad --decision or no FILE are usage errors (exit 2)', async () => {
    const file = copy('d.flankfilm.json');
    const text = readFileSync(file, 'utf8');
    expect((await cli('sign', file, '--role', 'x', '--decision', 'approved')).code).toBe(2);
    const bad = await cli('sign', file, '--reviewer', 'x', '--role', 'x', '--decision', 'maybe');
    expect(bad.code).toBe(2);
    expect(bad.err).toContain('approved-with-conditions');
    expect((await cli('sign', ...ARGS)).code).toBe(2);
    expect(readFileSync(file, 'utf8')).toBe(text);
  });

  it('a missing file exits 1', async () => {
    const r = await cli('sign', join(dir, 'nope.flankfilm.json'), ...ARGS);
    expect(r.code).toBe(1);
    expect(r.err).toContain('ENOENT');
  });
});

/**
 * File safety of the CLI: an output never overwrites an input nor another output, through
 * symbolic or hard links (issue: `review r.flankfilm.json --pdf r.flankfilm.json` destroyed the review).
 */
import { describe, expect, it, beforeAll } from 'vitest';
import { copyFileSync, linkSync, lstatSync, readFileSync, readdirSync, symlinkSync } from 'node:fs';
import { spawnSync } from 'node:child_process';
import { join } from 'node:path';
import { CRUSHER, tempDir } from '../report/helpers';
import { cli } from './cliHarness';

let dir: string;
let review: string;
let original: string;
beforeAll(() => {
  dir = tempDir('flankfilm-files-');
  review = join(dir, 'r.flankfilm.json');
  copyFileSync(CRUSHER, review);
  original = readFileSync(review, 'utf8');
});

async function refusedUsage(...args: string[]): Promise<string> {
  const r = await cli('review', ...args);
  expect(r.code, r.out + r.err).toBe(2);
  expect(readFileSync(review, 'utf8')).toBe(original); // the review is untouched
  return r.err;
}

describe('an output that is an input or another output: exit 2, nothing written', () => {
  for (const flag of ['--pdf', '--csv', '--map']) {
    it(`${flag} naming the review itself`, async () => {
      const err = await refusedUsage(review, flag, review);
      expect(err).toContain('an output never overwrites an input');
    });
  }

  it('the same file by another spelling (./, ..)', async () => {
    await refusedUsage(review, '--pdf', join(dir, '.', '..', dir.split('/').pop()!, 'r.flankfilm.json'));
  });

  it('a symbolic link to the review, a link to a link, and a hard link', async () => {
    const sym = join(dir, 'link.pdf');
    symlinkSync(review, sym);
    const sym2 = join(dir, 'link2.csv');
    symlinkSync(sym, sym2);
    const hard = join(dir, 'hard.csv');
    linkSync(review, hard);
    await refusedUsage(review, '--pdf', sym);
    await refusedUsage(review, '--csv', sym2);
    await refusedUsage(review, '--map', hard);
  });

  it('a link in a folder path (the folder is a symbolic link to the review’s folder)', async () => {
    const alias = join(tempDir('flankfilm-alias-'), 'same');
    symlinkSync(dir, alias);
    await refusedUsage(review, '--csv', join(alias, 'r.flankfilm.json'));
  });

  it('two outputs that are one file, even before it exists (also through a dangling link)', async () => {
    const out = join(dir, 'both.out');
    const err = await refusedUsage(review, '--pdf', out, '--csv', out);
    expect(err).toContain('are the same file');
    const dangling = join(dir, 'dangling.csv');
    symlinkSync(join(dir, 'target-not-yet.csv'), dangling);
    await refusedUsage(review, '--csv', dangling, '--map', join(dir, 'target-not-yet.csv'));
    expect(readdirSync(dir)).not.toContain('both.out');
    expect(readdirSync(dir)).not.toContain('target-not-yet.csv');
  });

  it('--p12 as an output target is refused too (the identity is an input)', async () => {
    const id = join(dir, 'id.p12');
    copyFileSync(CRUSHER, id); // content does not matter: the clash is found before reading
    await refusedUsage(review, '--pdf', id, '--p12', id);
  });

  it('distinct outputs still work', async () => {
    const r = await cli('review', review, '--csv', join(dir, 'ok.csv'), '--map', join(dir, 'ok-map.csv'));
    expect(r.code, r.err).toBe(0);
  }, 120_000);
});

describe('inputs and outputs that are not regular files', () => {
  it('a review that is a FIFO or /dev/zero: exit 1 at once, no hang', async () => {
    const fifo = join(dir, 'pipe.flankfilm.json');
    expect(spawnSync('mkfifo', [fifo]).status).toBe(0);
    const t0 = Date.now();
    const a = await cli('review', fifo, '--json');
    expect(a.code).toBe(1);
    expect(a.err).toContain('not a regular file (a pipe)');
    const b = await cli('review', '/dev/zero', '--json');
    expect(b.code).toBe(1);
    expect(b.err).toContain('not a regular file (a device)');
    expect(Date.now() - t0).toBeLessThan(5000);
  }, 20_000);

  it('an output that is a FIFO is refused (exit 1) and stays a FIFO', async () => {
    const fifo = join(dir, 'out.csv');
    expect(spawnSync('mkfifo', [fifo]).status).toBe(0);
    const r = await cli('review', review, '--csv', fifo);
    expect(r.code).toBe(1);
    expect(r.err).toContain('not a regular file');
    expect(lstatSync(fifo).isFIFO()).toBe(true);
  }, 60_000);
});

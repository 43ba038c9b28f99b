/**
 * What a save must not change about the file it replaces: a read-only file is refused and left
 * alone, the mode and (where the process may) the owner are kept, and a symbolic link stays a
 * link with its target written. The owner cases need two users: they run when this process is
 * root (it then also runs a child as the unprivileged 'nobody', uid 65534) and are skipped,
 * saying so, otherwise.
 */
import { spawn } from 'node:child_process';
import { chmod, chown, lstat, mkdtemp, readdir, readFile, readlink, rm, stat, symlink, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { atomicWrite } from '../../app/files/atomicWrite';
import { cli } from '../cli/cliHarness';
import { CRUSHER } from '../report/helpers';

const CHILD = join(__dirname, 'fixtures', 'fileChild.ts');
const isRoot = process.getuid?.() === 0;
const NOBODY = { uid: 65534, gid: 65534 };
const NEEDS_ROOT = 'needs root here (to own files as two users and to run a child as nobody); skipped';

const dirs: string[] = [];
async function tempDir(): Promise<string> {
  const d = await mkdtemp(join(tmpdir(), 'flankfilm-aw-'));
  dirs.push(d);
  return d;
}
afterEach(async () => {
  for (const d of dirs.splice(0)) await rm(d, { recursive: true, force: true });
});

function asNobody(target: string, text: string): Promise<{ ok: boolean; code?: string; message?: string }> {
  const proc = spawn(process.execPath, ['--import', 'tsx', CHILD, 'put', target, text], { stdio: ['ignore', 'pipe', 'pipe'], ...NOBODY });
  let out = '';
  let err = '';
  proc.stdout.on('data', (c: Buffer) => (out += c.toString()));
  proc.stderr.on('data', (c: Buffer) => (err += c.toString()));
  return new Promise((ok, fail) =>
    proc.on('close', (code) => {
      try {
        ok(JSON.parse(out));
      } catch {
        fail(new Error(`child exited ${code}: ${err}`));
      }
    }),
  );
}

const modeOf = async (p: string): Promise<number> => (await stat(p)).mode & 0o7777;

describe('a read-only target is refused and left untouched', () => {
  it('0444: EACCES with a clear message; content and mode unchanged; no temp file left', async () => {
    const dir = await tempDir();
    const f = join(dir, 'r.flankfilm.json');
    await writeFile(f, 'old', { mode: 0o444 });
    await chmod(f, 0o444);
    const e = await atomicWrite(f, 'new').catch((x: NodeJS.ErrnoException) => x);
    expect((e as NodeJS.ErrnoException).code).toBe('EACCES');
    expect((e as Error).message).toContain('read-only');
    expect(await readFile(f, 'utf8')).toBe('old');
    expect(await modeOf(f)).toBe(0o444);
    expect(await readdir(dir)).toEqual(['r.flankfilm.json']);
  });

  it('`flankfilm sign` on a 0444 review: exit 1, says read-only, the file unchanged', async () => {
    const dir = await tempDir();
    const f = join(dir, 'r.flankfilm.json');
    const text = await readFile(CRUSHER, 'utf8');
    await writeFile(f, text);
    await chmod(f, 0o444);
    const r = await cli('sign', f, '--reviewer', 'A. Reviewer (invented)', '--role', 'Reliability engineer', '--decision', 'approved', '--signed-at', '2026-12-01T09:30:00Z');
    expect(r.code).toBe(1);
    expect(r.err).toContain('cannot write (the file is read-only); the file was not changed');
    expect(await readFile(f, 'utf8')).toBe(text);
  }, 60_000);

  it.skipIf(!isRoot)('0444 as the unprivileged user nobody: refused as well', async () => {
    const dir = await tempDir();
    await chmod(dir, 0o777);
    const f = join(dir, 'r.json');
    await writeFile(f, 'old');
    await chown(f, NOBODY.uid, NOBODY.gid);
    await chmod(f, 0o444);
    const r = await asNobody(f, 'new');
    expect(r).toMatchObject({ ok: false, code: 'EACCES' });
    expect(await readFile(f, 'utf8')).toBe('old');
  }, 60_000);
});

describe('the mode and the owner are kept', () => {
  for (const mode of [0o600, 0o640, 0o664, 0o755]) {
    it(`mode ${mode.toString(8)} stays ${mode.toString(8)} (the umask does not apply)`, async () => {
      const dir = await tempDir();
      const f = join(dir, 'r.json');
      await writeFile(f, 'old');
      await chmod(f, mode);
      await atomicWrite(f, 'new');
      expect(await readFile(f, 'utf8')).toBe('new');
      expect(await modeOf(f)).toBe(mode);
    });
  }

  it('a new file gets 0644 less the umask, as before', async () => {
    const dir = await tempDir();
    const f = join(dir, 'new.json');
    await atomicWrite(f, 'x');
    expect((await modeOf(f)) & ~0o644).toBe(0);
  });

  it.skipIf(!isRoot)('root replacing a file owned by nobody keeps nobody as its owner', async () => {
    const dir = await tempDir();
    const f = join(dir, 'r.json');
    await writeFile(f, 'old');
    await chown(f, NOBODY.uid, NOBODY.gid);
    await atomicWrite(f, 'new');
    const s = await stat(f);
    expect([s.uid, s.gid]).toEqual([NOBODY.uid, NOBODY.gid]);
    expect(await readFile(f, 'utf8')).toBe('new');
  });

  it.skipIf(!isRoot)('nobody saving a shared (0666) file owned by root: the owner stays root (rewritten in place), no temp file left', async () => {
    const dir = await tempDir();
    await chmod(dir, 0o777);
    const f = join(dir, 'shared.json');
    await writeFile(f, 'old');
    await chmod(f, 0o666);
    const r = await asNobody(f, 'new from nobody');
    expect(r, r.message).toMatchObject({ ok: true });
    const s = await stat(f);
    expect([s.uid, s.gid]).toEqual([0, 0]);
    expect(await modeOf(f)).toBe(0o666);
    expect(await readFile(f, 'utf8')).toBe('new from nobody');
    expect(await readdir(dir)).toEqual(['shared.json']);
  }, 60_000);

  it.skipIf(isRoot)(`owner cases: ${NEEDS_ROOT}`, () => {
    expect(isRoot).toBe(false);
  });
});

describe('symbolic links: the target is written, the link kept', () => {
  it('a relative link in another folder', async () => {
    const a = await tempDir();
    const b = await tempDir();
    const target = join(b, 'real.flankfilm.json');
    await writeFile(target, 'old');
    await chmod(target, 0o640);
    const link = join(a, 'link.flankfilm.json');
    await symlink(join('..', b.split('/').pop()!, 'real.flankfilm.json'), link);
    await atomicWrite(link, 'new', { keepBackup: true });
    expect((await lstat(link)).isSymbolicLink()).toBe(true);
    expect(await readFile(target, 'utf8')).toBe('new');
    expect(await modeOf(target)).toBe(0o640);
    expect(await readFile(`${target}.bak`, 'utf8')).toBe('old'); // the backup sits beside the target
    expect((await readdir(a)).sort()).toEqual(['link.flankfilm.json']);
  });

  it('a chain of links, and a dangling link (its target is created)', async () => {
    const d = await tempDir();
    const target = join(d, 'real.json');
    await writeFile(target, 'old');
    await symlink(target, join(d, 'l1'));
    await symlink(join(d, 'l1'), join(d, 'l2'));
    await atomicWrite(join(d, 'l2'), 'new');
    expect(await readFile(target, 'utf8')).toBe('new');
    expect(await readlink(join(d, 'l2'))).toBe(join(d, 'l1'));
    await symlink(join(d, 'later.json'), join(d, 'dangling'));
    await atomicWrite(join(d, 'dangling'), 'made');
    expect((await lstat(join(d, 'dangling'))).isSymbolicLink()).toBe(true);
    expect(await readFile(join(d, 'later.json'), 'utf8')).toBe('made');
  });

  it('`flankfilm sign` through a link signs the link’s target and keeps the link', async () => {
    const d = await tempDir();
    const target = join(d, 'real.flankfilm.json');
    await writeFile(target, await readFile(CRUSHER, 'utf8'));
    const link = join(d, 'link.flankfilm.json');
    await symlink(target, link);
    const r = await cli('sign', link, '--reviewer', 'A. Reviewer (invented)', '--role', 'Reliability engineer', '--decision', 'approved', '--signed-at', '2026-12-01T09:30:00Z');
    expect(r.code, r.err).toBe(0);
    expect((await lstat(link)).isSymbolicLink()).toBe(true);
    expect(JSON.parse(await readFile(target, 'utf8')).signoff.reviewer).toBe('A. Reviewer (invented)');
  }, 60_000);
});

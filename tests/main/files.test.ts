import { spawn } from 'node:child_process';
import { chmod, mkdir, mkdtemp, readdir, readFile, rm, stat, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { createAutosave } from '../../main/services/autosave';
import { DEMO_TEXT, EDITED_TEXT } from './fixtures/texts';

const CHILD = join(__dirname, 'fixtures', 'fileChild.ts');
const isRoot = process.getuid?.() === 0;
/** As root, chmod does not stop writes, so the read-only case runs as the unprivileged 'nobody'. */
const NOBODY = { uid: 65534, gid: 65534 };

const dirs: string[] = [];
async function tempDir(): Promise<string> {
  const d = await mkdtemp(join(tmpdir(), 'flankfilm-files-'));
  dirs.push(d);
  return d;
}
afterEach(async () => {
  for (const d of dirs.splice(0)) {
    await chmod(d, 0o755).catch(() => undefined);
    for (const e of await readdir(d).catch(() => [])) await chmod(join(d, e), 0o755).catch(() => undefined);
    await rm(d, { recursive: true, force: true });
  }
});

function child(args: string[], options: { user?: typeof NOBODY } = {}) {
  return spawn(process.execPath, ['--import', 'tsx', CHILD, ...args], { stdio: ['ignore', 'pipe', 'pipe'], ...(options.user ?? {}) });
}

function collect(proc: ReturnType<typeof child>): Promise<{ code: number | null; signal: NodeJS.Signals | null; out: string; err: string }> {
  let out = '';
  let err = '';
  proc.stdout.on('data', (c: Buffer) => (out += c.toString()));
  proc.stderr.on('data', (c: Buffer) => (err += c.toString()));
  return new Promise((ok) => proc.on('close', (code, signal) => ok({ code, signal, out, err })));
}

describe('atomic save under a crash', () => {
  it('a write killed midway leaves the old file intact and readable', async () => {
    const dir = await tempDir();
    const target = join(dir, 'review.flankfilm.json');
    await writeFile(target, DEMO_TEXT);
    const megabytes = 256;
    const proc = child(['write', target, String(megabytes)]);
    const done = collect(proc);
    // Kill once the temp file has data in it, i.e. between the first write and the rename.
    const killedAt = await new Promise<number>((ok, fail) => {
      proc.stdout.once('data', () => {
        const poll = async (): Promise<void> => {
          if (proc.exitCode !== null) return fail(new Error('the child finished before it could be killed mid-write'));
          const tmp = (await readdir(dir)).find((n) => n.endsWith('.tmp'));
          const size = tmp ? (await stat(join(dir, tmp)).catch(() => null))?.size ?? 0 : 0;
          if (size > 0) {
            proc.kill('SIGKILL');
            return ok(size);
          }
          setImmediate(() => void poll().catch(fail));
        };
        void poll().catch(fail);
      });
    });
    const { signal, out } = await done;
    expect(signal).toBe('SIGKILL');
    expect(out).not.toContain('done');
    expect(killedAt).toBeLessThan(megabytes * 1024 * 1024);
    expect(await readFile(target, 'utf8')).toBe(DEMO_TEXT);
    expect(JSON.parse(await readFile(target, 'utf8')).format).toBe('flankfilm.review');
    // The rename never happened, so no .bak was made and the partial data sits only in the temp file.
    const names = await readdir(dir);
    expect(names).not.toContain('review.flankfilm.json.bak');
    expect(names.filter((n) => n.endsWith('.tmp'))).toHaveLength(1);
  });
});

describe('saving to a read-only place', () => {
  it('fails with a clear message, leaves the file alone and keeps the edits', async () => {
    const dir = await tempDir();
    const userData = await tempDir();
    const target = join(dir, 'review.flankfilm.json');
    await writeFile(target, DEMO_TEXT, { mode: 0o444 });
    await chmod(dir, 0o555); // no new temp file can be made next to the target
    await chmod(userData, 0o777);
    const { code, out, err } = await collect(child(['save', userData, target], isRoot ? { user: NOBODY } : {}));
    expect(code, err).toBe(0);
    const r = JSON.parse(out) as { ok: boolean; error?: string };
    expect(r.ok).toBe(false);
    expect(r.error).toMatch(/^could not save to .*review\.flankfilm\.json: permission denied .*\(EACCES\)/);
    expect(r.error).toContain('your edits are kept');
    expect(await readFile(target, 'utf8')).toBe(DEMO_TEXT);
    expect(await readdir(dir)).toEqual(['review.flankfilm.json']);
    const kept = await createAutosave(userData, () => new Date()).recover();
    expect(kept?.text).toBe(EDITED_TEXT);
    expect(kept?.path).toBe(target);
  });
});

describe('autosave', () => {
  it('survives a crash and is offered back on the next start', async () => {
    const userData = await tempDir();
    await mkdir(userData, { recursive: true });
    const { signal } = await collect(child(['autosave', userData]));
    expect(signal).toBe('SIGKILL');
    const store = createAutosave(userData, () => new Date());
    const recovered = await store.recover();
    expect(recovered).toEqual({ text: EDITED_TEXT, path: null, savedAt: '2026-12-01T09:30:00.000Z' });
    await store.discard();
    expect(await store.recover()).toBeNull();
  });

  it('a damaged autosave file is ignored, not an error', async () => {
    const userData = await tempDir();
    const store = createAutosave(userData, () => new Date());
    await writeFile(store.file, '{"format":"flankfilm.autosave","text":');
    expect(await store.recover()).toBeNull();
  });
});

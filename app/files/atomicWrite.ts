import { constants } from 'node:fs';
import { access, copyFile, lstat, open, readlink, realpath, rename, stat, unlink } from 'node:fs/promises';
import type { Stats } from 'node:fs';
import { basename, dirname, isAbsolute, join, resolve } from 'node:path';

export interface AtomicWriteOptions {
  /** Keep the file being replaced as `<path>.bak`. */
  readonly keepBackup?: boolean;
}

/** A refusal before anything was written; `code` is EACCES for a read-only file. */
export class WriteRefused extends Error {
  constructor(
    /** In words, without the path: "the file is read-only". */
    readonly reason: string,
    target: string,
    readonly code: string,
  ) {
    super(`${target}: ${reason}; it was not changed`);
    this.name = 'WriteRefused';
  }
}

/**
 * Replace `path` with `data` so that a reader (or a crash) sees either the old file or the new
 * one, never a half-written file: write a temp file in the same folder, fsync it, rename it over
 * the target, then fsync the folder. Throws with the OS error code (EACCES, EROFS …) on failure,
 * leaving the target untouched.
 *
 * The target is the file `path` names: a symbolic link is followed (also a dangling one) and its
 * target written, so the link stays a link. A file that exists keeps what a save must not change:
 *  - a read-only file (no write permission for this process, or no write bit at all — root
 *    ignores permissions, so the bits are checked too) is refused, code EACCES, untouched;
 *  - its mode (permission bits) is copied to the new file;
 *  - its owner and group are copied where the process may (root; the group for a member). Where
 *    the process may not give the new file the old owner, the old file is rewritten in place
 *    instead (from the complete, fsynced temp file, which is removed afterwards), so the owner
 *    never changes; that write is not atomic, and the temp copy is kept if it fails.
 */
export async function atomicWrite(path: string, data: string | Uint8Array, options: AtomicWriteOptions = {}): Promise<void> {
  const target = await resolveTarget(path);
  const old = await stat(target).catch((e: NodeJS.ErrnoException) => {
    if (e.code === 'ENOENT') return null;
    throw e;
  });
  if (old) await refuseReadOnly(target, old);

  const dir = dirname(target);
  const tmp = join(dir, `.${basename(target)}.${process.pid}.${Date.now()}.tmp`);
  const handle = await open(tmp, 'wx', old ? old.mode & 0o666 : 0o644);
  let ownerKept = true;
  try {
    await handle.writeFile(data);
    if (old) {
      await handle.chmod(old.mode & 0o7777); // not subject to the umask, unlike open's mode
      ownerKept = await keepOwner(handle, old);
    }
    await handle.sync();
  } catch (e) {
    await handle.close().catch(() => undefined);
    await unlink(tmp).catch(() => undefined);
    throw e;
  }
  await handle.close();
  try {
    if (options.keepBackup && old) {
      await copyFile(target, `${target}.bak`, constants.COPYFILE_FICLONE).catch((e: NodeJS.ErrnoException) => {
        if (e.code !== 'ENOENT') throw e;
      });
    }
    if (ownerKept) await rename(tmp, target);
    else await rewriteInPlace(target, data);
  } catch (e) {
    if (ownerKept) await unlink(tmp).catch(() => undefined);
    throw e;
  }
  if (!ownerKept) await unlink(tmp).catch(() => undefined);
  const dirHandle = await open(dir, 'r').catch(() => null);
  if (dirHandle) {
    await dirHandle.sync().catch(() => undefined); // not supported on every platform
    await dirHandle.close();
  }
}

/** The path a write to `path` lands on: every symbolic link followed (up to 40, as the OS does). */
export async function resolveTarget(path: string): Promise<string> {
  const real = await realpath(path).catch(() => null);
  if (real) return real;
  let p = resolve(path);
  for (let i = 0; i < 40; i++) {
    const info = await lstat(p).catch(() => null);
    if (!info?.isSymbolicLink()) break;
    const link = await readlink(p);
    p = isAbsolute(link) ? link : resolve(dirname(p), link);
  }
  const dir = await realpath(dirname(p)).catch(() => dirname(p));
  return join(dir, basename(p));
}

async function refuseReadOnly(target: string, old: Stats): Promise<void> {
  if (!old.isFile()) throw new WriteRefused('it is not a regular file', target, old.isDirectory() ? 'EISDIR' : 'EINVAL');
  const writable = await access(target, constants.W_OK).then(
    () => true,
    () => false,
  );
  if (!writable || (old.mode & 0o222) === 0) throw new WriteRefused('the file is read-only', target, 'EACCES');
}

/** Give the new file the old one's owner and group; false if the owner could not be kept. */
async function keepOwner(handle: Awaited<ReturnType<typeof open>>, old: Stats): Promise<boolean> {
  const uid = process.getuid?.();
  if (uid === undefined) return true; // Windows: no POSIX owner to keep
  const mine = await handle.stat();
  if (mine.uid === old.uid && mine.gid === old.gid) return true;
  try {
    await handle.chown(old.uid, old.gid);
    return true;
  } catch {
    // Not root: the group may still be ours to give, but the owner is not.
    if (mine.uid !== old.uid) return false;
    await handle.chown(-1, old.gid).catch(() => undefined);
    return (await handle.stat()).gid === old.gid;
  }
}

async function rewriteInPlace(target: string, data: string | Uint8Array): Promise<void> {
  const h = await open(target, 'r+');
  try {
    await h.truncate(0);
    await h.writeFile(data);
    await h.sync();
  } finally {
    await h.close();
  }
}

import { constants } from 'node:fs';
import { copyFile, open, rename, unlink } from 'node:fs/promises';
import { basename, dirname, join } from 'node:path';

export interface AtomicWriteOptions {
  /** Keep the file being replaced as `<path>.bak`. */
  readonly keepBackup?: boolean;
}

/**
 * Replace `path` with `data` so that a reader (or a crash) sees either the old file or the new
 * one, never a half-written file: write a temp file in the same folder, fsync it, rename it over
 * the target, then fsync the folder. Throws with the OS error code (EACCES, EROFS …) on failure,
 * leaving the target untouched.
 */
export async function atomicWrite(path: string, data: string | Uint8Array, options: AtomicWriteOptions = {}): Promise<void> {
  const dir = dirname(path);
  const tmp = join(dir, `.${basename(path)}.${process.pid}.${Date.now()}.tmp`);
  const handle = await open(tmp, 'wx', 0o644);
  try {
    await handle.writeFile(data);
    await handle.sync();
  } catch (e) {
    await handle.close().catch(() => undefined);
    await unlink(tmp).catch(() => undefined);
    throw e;
  }
  await handle.close();
  try {
    if (options.keepBackup) {
      await copyFile(path, `${path}.bak`, constants.COPYFILE_FICLONE).catch((e: NodeJS.ErrnoException) => {
        if (e.code !== 'ENOENT') throw e;
      });
    }
    await rename(tmp, path);
  } catch (e) {
    await unlink(tmp).catch(() => undefined);
    throw e;
  }
  const dirHandle = await open(dir, 'r').catch(() => null);
  if (dirHandle) {
    await dirHandle.sync().catch(() => undefined); // not supported on every platform
    await dirHandle.close();
  }
}

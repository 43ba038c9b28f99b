import { constants } from 'node:fs';
import { open } from 'node:fs/promises';

export type ReadResult = { ok: true; bytes: Buffer } | { ok: false; reason: string };

/**
 * Read a regular file of at most `limit` bytes. Anything else fails at once, without blocking:
 * the file is opened non-blocking (a FIFO with no writer does not wait), checked with fstat on
 * the open handle (so a swap between check and read cannot slip a device in), and read no
 * further than `limit` + 1 bytes (a file that grows while being read is refused too).
 */
export async function readRegularFile(path: string, limit: number): Promise<ReadResult> {
  let handle;
  try {
    handle = await open(path, constants.O_RDONLY | constants.O_NONBLOCK | (constants.O_NOCTTY ?? 0));
  } catch (e) {
    return { ok: false, reason: `cannot read the file (${(e as NodeJS.ErrnoException).code ?? 'unreadable'})` };
  }
  try {
    const info = await handle.stat();
    if (!info.isFile()) return { ok: false, reason: `not a regular file (${kindOf(info)})` };
    if (info.size > limit) return { ok: false, reason: `the file is ${mb(info.size)}; the limit is ${mb(limit)}` };
    const buf = Buffer.alloc(Math.min(info.size, limit) + 1);
    let got = 0;
    for (;;) {
      const { bytesRead } = await handle.read(buf, got, buf.length - got, got);
      if (bytesRead === 0) break;
      got += bytesRead;
      if (got > limit) return { ok: false, reason: `the file is larger than the limit of ${mb(limit)}` };
      if (got === buf.length) return { ok: false, reason: 'the file grew while being read' };
    }
    return { ok: true, bytes: buf.subarray(0, got) };
  } catch (e) {
    return { ok: false, reason: `cannot read the file (${(e as NodeJS.ErrnoException).code ?? 'unreadable'})` };
  } finally {
    await handle.close().catch(() => undefined);
  }
}

function kindOf(info: { isDirectory(): boolean; isFIFO(): boolean; isCharacterDevice(): boolean; isBlockDevice(): boolean; isSocket(): boolean }): string {
  if (info.isDirectory()) return 'a folder';
  if (info.isFIFO()) return 'a pipe';
  if (info.isCharacterDevice() || info.isBlockDevice()) return 'a device';
  if (info.isSocket()) return 'a socket';
  return 'not a file';
}

function mb(bytes: number): string {
  return bytes >= 1e6 ? `${(bytes / 1e6).toFixed(1)} MB` : `${Math.ceil(bytes / 1e3)} kB`;
}

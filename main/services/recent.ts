import { mkdir, readFile, stat } from 'node:fs/promises';
import { join } from 'node:path';
import { z } from 'zod';
import { atomicWrite } from '../../app/files/atomicWrite';

export const RECENT_LIMIT = 10;
const recentFile = z.array(z.string().max(4096)).max(100);

/** The recent-files list in userData/recent.json, newest first; missing files drop out when listed. */
export function createRecentFiles(userDataDir: string, onChanged?: (paths: readonly string[]) => void) {
  const file = join(userDataDir, 'recent.json');

  async function read(): Promise<string[]> {
    const text = await readFile(file, 'utf8').catch(() => null);
    if (text === null) return [];
    try {
      const parsed = recentFile.safeParse(JSON.parse(text));
      return parsed.success ? parsed.data : [];
    } catch {
      return []; // a damaged list is not worth an error; it is rebuilt on the next open
    }
  }

  async function write(paths: string[]): Promise<void> {
    await mkdir(userDataDir, { recursive: true });
    await atomicWrite(file, `${JSON.stringify(paths, null, 2)}\n`);
    onChanged?.(paths);
  }

  return {
    async list(): Promise<string[]> {
      const paths = await read();
      const exists = await Promise.all(paths.map((p) => stat(p).then((s) => s.isFile(), () => false)));
      return paths.filter((_, i) => exists[i]);
    },
    async add(path: string): Promise<void> {
      const paths = (await read()).filter((p) => p !== path);
      await write([path, ...paths].slice(0, RECENT_LIMIT));
    },
    async clear(): Promise<void> {
      await write([]);
    },
  };
}

export type RecentFiles = ReturnType<typeof createRecentFiles>;

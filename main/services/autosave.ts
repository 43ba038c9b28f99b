import { mkdir, readFile, unlink } from 'node:fs/promises';
import { join } from 'node:path';
import { z } from 'zod';
import { atomicWrite } from '../../app/files/atomicWrite';

const autosaveFile = z.object({
  format: z.literal('flankfilm.autosave'),
  text: z.string(),
  path: z.string().nullable(),
  savedAt: z.string(),
});
export type Autosaved = Omit<z.output<typeof autosaveFile>, 'format'>;

/**
 * Unsaved edits kept in userData/autosave.json (atomically, so a crash mid-write leaves the
 * previous autosave), offered back on the next start until saved or discarded.
 */
export function createAutosave(userDataDir: string, clock: () => Date) {
  const file = join(userDataDir, 'autosave.json');
  return {
    file,
    async save(text: string, path: string | null): Promise<void> {
      const record = { format: 'flankfilm.autosave', text, path, savedAt: clock().toISOString() };
      await mkdir(userDataDir, { recursive: true });
      await atomicWrite(file, JSON.stringify(record));
    },
    async recover(): Promise<Autosaved | null> {
      const raw = await readFile(file, 'utf8').catch(() => null);
      if (raw === null) return null;
      try {
        const parsed = autosaveFile.safeParse(JSON.parse(raw));
        if (!parsed.success) return null;
        const { text, path, savedAt } = parsed.data;
        return { text, path, savedAt };
      } catch {
        return null; // not ours or damaged; atomic writes make this unlikely
      }
    },
    async discard(): Promise<void> {
      await unlink(file).catch((e: NodeJS.ErrnoException) => {
        if (e.code !== 'ENOENT') throw e;
      });
    },
  };
}

export type Autosave = ReturnType<typeof createAutosave>;

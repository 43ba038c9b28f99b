import { stat } from 'node:fs/promises';
import { resolve } from 'node:path';
import { resolveTarget } from './atomicWrite';

/**
 * A key that is equal for two paths exactly when writing one would change the other: device and
 * inode for a file that exists (so symbolic and hard links to the same file agree), else the
 * fully resolved path the file would be created at (a dangling link is followed to its target).
 */
export async function fileKey(path: string): Promise<string> {
  try {
    const info = await stat(path); // follows links
    return `inode:${info.dev}:${info.ino}`;
  } catch (e) {
    if ((e as NodeJS.ErrnoException).code !== 'ENOENT') return `path:${resolve(path)}`;
  }
  return `path:${await resolveTarget(path)}`;
}

/**
 * The first clash among named paths: an output that is an input, or two outputs that are one file.
 * Returns a sentence naming both, or null.
 */
export async function pathClash(inputs: ReadonlyArray<readonly [string, string]>, outputs: ReadonlyArray<readonly [string, string]>): Promise<string | null> {
  const seen = new Map<string, { label: string; path: string; input: boolean }>();
  for (const [label, path] of inputs) seen.set(await fileKey(path), { label, path, input: true });
  for (const [label, path] of outputs) {
    const key = await fileKey(path);
    const other = seen.get(key);
    if (other) {
      return other.input
        ? `${label} ${path} is the same file as ${other.label} ${other.path}: an output never overwrites an input`
        : `${label} ${path} and ${other.label} ${other.path} are the same file: give each output its own file`;
    }
    seen.set(key, { label, path, input: false });
  }
  return null;
}

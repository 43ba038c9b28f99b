import { randomUUID } from 'node:crypto';
import { basename, resolve } from 'node:path';
import { UserError } from './errors';

/**
 * The paths main chose — by its dialogs, the recent-files list, the command line, a drop through
 * the preload, or the autosave — each behind an opaque handle ("doc-" + a random UUID). The
 * renderer holds only handles and file names, so it can neither read nor write a file main did
 * not choose. One handle per path, for the life of the process.
 */
export function createDocuments() {
  const byHandle = new Map<string, string>();
  const byPath = new Map<string, string>();
  return {
    /** The handle of a path main chose. */
    register(path: string): string {
      const p = resolve(path);
      const known = byPath.get(p);
      if (known) return known;
      const handle = `doc-${randomUUID()}`;
      byHandle.set(handle, p);
      byPath.set(p, handle);
      return handle;
    },
    /** The path behind a handle; a handle main never gave is refused. */
    path(handle: string): string {
      const p = byHandle.get(handle);
      if (p === undefined) throw new UserError('that document is not known to this window; open it again');
      return p;
    },
    /** The path behind a handle, or null for none or an unknown one. */
    pathOrNull(handle: string | null | undefined): string | null {
      return handle ? (byHandle.get(handle) ?? null) : null;
    },
    name(handle: string): string {
      return basename(this.path(handle));
    },
  };
}

export type Documents = ReturnType<typeof createDocuments>;

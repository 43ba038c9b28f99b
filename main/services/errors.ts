/**
 * A refusal the user should read as is ("the file is from a newer Flankfilm …"). Main's IPC and
 * the harness pass its message through unchanged; other errors are bugs.
 */
export class UserError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'UserError';
  }
}

const FS_WORDS: Readonly<Record<string, string>> = {
  EACCES: 'permission denied (the file or its folder is read-only for you)',
  EPERM: 'the operation is not permitted (the file may be locked or read-only)',
  EROFS: 'the disk is read-only',
  ENOSPC: 'the disk is full',
  EDQUOT: 'the disk quota is used up',
  ENOENT: 'the folder does not exist',
  ENOTDIR: 'part of the path is not a folder',
  EISDIR: 'the path is a folder',
  EBUSY: 'the file is in use by another program',
  EMFILE: 'too many files are open',
  ENAMETOOLONG: 'the path is too long',
};

/** One phrase for an OS error, with its code for a support question. */
export function explainFsError(e: unknown): string {
  const code = (e as NodeJS.ErrnoException | null)?.code;
  if (code && FS_WORDS[code]) return `${FS_WORDS[code]} (${code})`;
  return code ? `the system refused (${code})` : (e as Error | null)?.message ?? String(e);
}

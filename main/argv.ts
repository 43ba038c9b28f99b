import { isAbsolute, resolve } from 'node:path';

/**
 * The review a command line asks to open: `--open PATH` / `--open=PATH` (npm start), else the
 * last argument naming a .json file (the OS opening a file association). Chromium's own switches
 * and the app path ('.') are skipped. Relative paths are resolved against `cwd`.
 */
export function reviewPathFromArgv(argv: readonly string[], cwd: string): string | null {
  const args = argv.slice(1);
  let found: string | null = null;
  for (let i = 0; i < args.length; i++) {
    const a = args[i] as string;
    if (a === '--open') {
      const next = args[i + 1];
      if (next !== undefined) return absolute(next, cwd);
    } else if (a.startsWith('--open=')) {
      return absolute(a.slice('--open='.length), cwd);
    } else if (!a.startsWith('-') && a.toLowerCase().endsWith('.json')) {
      found = a;
    }
  }
  return found === null ? null : absolute(found, cwd);
}

const absolute = (p: string, cwd: string): string => (isAbsolute(p) ? p : resolve(cwd, p));

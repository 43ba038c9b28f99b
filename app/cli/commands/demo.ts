import { mkdir, writeFile } from 'node:fs/promises';
import { join } from 'node:path';
import { DEMO_REVIEWS } from '../../review/demo';
import type { CliIo } from '../io';
import { EXIT } from '../io';

/** `flankfilm demo [DIR]`: write the invented demo reviews (Harrow Creek) to DIR (default: the current folder); never overwrites. */
export async function demoCommand(args: string[], io: CliIo): Promise<number> {
  const dir = args[0] ?? '.';
  await mkdir(dir, { recursive: true });
  for (const [file, review] of Object.entries(DEMO_REVIEWS)) {
    const path = join(dir, file);
    try {
      await writeFile(path, `${JSON.stringify(review, null, 2)}\n`, { flag: 'wx' });
    } catch (e) {
      const code = (e as NodeJS.ErrnoException).code;
      io.err(code === 'EEXIST' ? `${path} exists; not overwritten\n` : `${path}: cannot write (${code})\n`);
      return EXIT.invalid;
    }
    io.out(`${path}\n`);
  }
  return EXIT.ok;
}

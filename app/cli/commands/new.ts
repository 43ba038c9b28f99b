import { writeFile } from 'node:fs/promises';
import { newReview, TEMPLATES, TEMPLATE_WORDS, toFillIn, type TemplateKind } from '../../review/templates';
import { EXIT, UsageError, type CliIo } from '../io';

/**
 * `flankfilm new [spur|helical|internal|planetary] FILE`: write an unfilled review from a template. It never
 * overwrites a file; the review computes once the listed values are filled in.
 */
export async function newCommand(args: string[], io: CliIo): Promise<number> {
  const kind = (TEMPLATES as readonly string[]).includes(args[0] ?? '') ? (args[0] as TemplateKind) : null;
  const rest = kind ? args.slice(1) : args;
  if (rest.length !== 1 || !rest[0] || rest[0].startsWith('-')) throw new UsageError(`give the template (${TEMPLATES.join(', ')}; default spur) and one FILE to write`);
  const file = rest[0];
  try {
    await writeFile(file, `${JSON.stringify(newReview(kind ?? 'spur'), null, 2)}\n`, { flag: 'wx' });
  } catch (e) {
    const code = (e as NodeJS.ErrnoException).code;
    io.err(code === 'EEXIST' ? `flankfilm new: ${file} exists; not overwritten\n` : `flankfilm new: cannot write ${file} (${code ?? (e as Error).message})\n`);
    return EXIT.invalid;
  }
  io.out(`Wrote ${file} (${TEMPLATE_WORDS[kind ?? 'spur'].name.toLowerCase()} template). Fill in:\n${toFillIn(kind ?? 'spur').map((t) => `  - ${t}\n`).join('')}Then run: flankfilm review ${file}\n`);
  return EXIT.ok;
}

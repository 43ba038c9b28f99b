import { reviewJsonSchema } from '../../review/jsonSchema';
import { oilsJsonSchema } from '../../fleet/oilsFile';
import type { CliIo } from '../io';
import { EXIT, UsageError } from '../io';

/** `flankfilm schema` prints the review file's JSON Schema; `--oils`, the candidate-oil file's. */
export async function schemaCommand(args: string[], io: CliIo): Promise<number> {
  const unknown = args.filter((a) => a !== '--oils');
  if (unknown.length) throw new UsageError(`schema takes only --oils (got ${unknown.join(' ')})`);
  io.out(`${JSON.stringify(args.includes('--oils') ? oilsJsonSchema() : reviewJsonSchema(), null, 2)}\n`);
  return EXIT.ok;
}

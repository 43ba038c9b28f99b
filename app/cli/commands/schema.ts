import { reviewJsonSchema } from '../../review/jsonSchema';
import type { CliIo } from '../io';
import { EXIT } from '../io';

export async function schemaCommand(_args: string[], io: CliIo): Promise<number> {
  io.out(`${JSON.stringify(reviewJsonSchema(), null, 2)}\n`);
  return EXIT.ok;
}

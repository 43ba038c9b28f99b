import { z } from 'zod';
import { reviewSchema } from './schema';

/** JSON Schema (draft 2020-12) of the review file as written, i.e. with defaults optional. */
export function reviewJsonSchema(): Record<string, unknown> {
  const schema = z.toJSONSchema(reviewSchema, { io: 'input', unrepresentable: 'any' }) as Record<string, unknown>;
  return { ...schema, $id: 'urn:flankfilm:review:v1', title: 'Flankfilm review, version 1' };
}

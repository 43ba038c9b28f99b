/**
 * The candidate-oil file (`*.flankfilm-oils.json`): the oils a plant would consider, each exactly
 * as an oil in a review (the review's own oil schema), so an oil can be copied between the two.
 * Objects are strict, names unique; every problem names its field path.
 */
import { z } from 'zod';
import { oilSchema, type Oil } from '../review/schema';
import { formatPath, zodIssues, type ReviewIssue } from '../review/parse';

export const OILS_FORMAT = 'flankfilm.oils';
export const OILS_VERSION = 1;
/** A list of a few hundred oils is a few hundred kB; anything near this is not one. */
export const MAX_OILS_BYTES = 2_000_000;
/** More candidates than any plant list; the exact search is meant for up to 30. */
export const MAX_CANDIDATE_OILS = 200;

export const oilsFileSchema = z
  .strictObject({
    format: z.literal(OILS_FORMAT),
    version: z.literal(OILS_VERSION),
    title: z.string().min(1).max(200).optional(),
    notes: z.string().max(10000).optional(),
    oils: z.array(oilSchema).min(1, { message: 'must list at least one oil' }).max(MAX_CANDIDATE_OILS, { message: `must list at most ${MAX_CANDIDATE_OILS} oils` }),
  })
  .superRefine((f, ctx) => {
    const seen = new Map<string, number>();
    f.oils.forEach((o, i) => {
      const first = seen.get(o.name);
      if (first !== undefined) ctx.addIssue({ code: 'custom', path: ['oils', i, 'name'], message: `must be unique: oils[${first}] has the same name "${o.name}"` });
      else seen.set(o.name, i);
    });
  });

export type OilsFile = z.output<typeof oilsFileSchema>;

export type OilsParseResult = { readonly ok: true; readonly file: OilsFile; readonly oils: readonly Oil[] } | { readonly ok: false; readonly issues: readonly ReviewIssue[] };

/** Parse the text of a candidate-oil file: size, JSON, format and version, then the schema. */
export function parseOilsText(text: string): OilsParseResult {
  if (text.length > MAX_OILS_BYTES) return fail('(file)', `the file is ${(text.length / 1e6).toFixed(1)} MB; a candidate-oil file is at most ${MAX_OILS_BYTES / 1e6} MB`);
  let raw: unknown;
  try {
    raw = JSON.parse(text);
  } catch (e) {
    return fail('(file)', `not valid JSON: ${(e as Error).message}`);
  }
  return parseOilsValue(raw);
}

export function parseOilsValue(raw: unknown): OilsParseResult {
  if (typeof raw !== 'object' || raw === null || Array.isArray(raw)) return fail('(file)', 'a candidate-oil file is a JSON object');
  const obj = raw as Record<string, unknown>;
  if (obj.format !== OILS_FORMAT) return fail('format', `must be "${OILS_FORMAT}" (got ${JSON.stringify(obj.format) ?? 'nothing'})`);
  if (typeof obj.version === 'number' && Number.isInteger(obj.version) && obj.version > OILS_VERSION) {
    return fail('version', `this file is version ${obj.version}, made by a newer Flankfilm; this build reads version ${OILS_VERSION}. The file was not changed.`);
  }
  const parsed = oilsFileSchema.safeParse(raw);
  if (!parsed.success) return { ok: false, issues: zodIssues(parsed.error) };
  return { ok: true, file: parsed.data, oils: parsed.data.oils };
}

/** JSON Schema (draft 2020-12) of the candidate-oil file as written (defaults optional). */
export function oilsJsonSchema(): Record<string, unknown> {
  const schema = z.toJSONSchema(oilsFileSchema, { io: 'input', unrepresentable: 'any' }) as Record<string, unknown>;
  return { ...schema, $id: 'urn:flankfilm:oils:v1', title: 'Flankfilm candidate oils, version 1' };
}

function fail(path: string, message: string): OilsParseResult {
  return { ok: false, issues: [{ path: formatPath(path === '(file)' ? [] : [path]), message }] };
}

import { describe, expect, it } from 'vitest';
import { readFileSync, readdirSync } from 'node:fs';
import Ajv2020 from 'ajv/dist/2020';
import { reviewJsonSchema } from '../../app/review/jsonSchema';
import { cli } from '../cli/cliHarness';

describe('flankfilm schema', () => {
  it('prints a draft 2020-12 JSON Schema that an independent validator (ajv) compiles', async () => {
    const { code, out } = await cli('schema');
    expect(code).toBe(0);
    const schema = JSON.parse(out);
    expect(schema.$schema).toBe('https://json-schema.org/draft/2020-12/schema');
    const ajv = new Ajv2020({ strict: false, allErrors: true });
    expect(() => ajv.compile(schema)).not.toThrow();
  });
  it('every demo review validates against it', () => {
    const ajv = new Ajv2020({ strict: false, allErrors: true });
    const validate = ajv.compile(reviewJsonSchema());
    const files = readdirSync('assets/demo').filter((f) => f.endsWith('.flankfilm.json'));
    expect(files.length).toBeGreaterThanOrEqual(2);
    for (const f of files) {
      const ok = validate(JSON.parse(readFileSync(`assets/demo/${f}`, 'utf8')));
      expect(ok, `${f}: ${JSON.stringify(validate.errors)}`).toBe(true);
    }
  });
  it('rejects what the zod schema rejects (a fractional tooth count)', () => {
    const ajv = new Ajv2020({ strict: false });
    const validate = ajv.compile(reviewJsonSchema());
    const r = JSON.parse(readFileSync('assets/demo/harrow-creek-conveyor-spur-pair.flankfilm.json', 'utf8'));
    r.gearPair.pinion.teeth = 19.5;
    expect(validate(r)).toBe(false);
  });
});

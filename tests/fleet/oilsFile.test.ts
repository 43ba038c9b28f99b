import { describe, expect, it } from 'vitest';
import Ajv2020 from 'ajv/dist/2020';
import { oilsJsonSchema, parseOilsText, parseOilsValue } from '../../app/fleet/oilsFile';
import { EP, RO } from './fixtures';

const file = (oils: unknown[]) => ({ format: 'flankfilm.oils', version: 1, oils });

describe('the candidate-oil file', () => {
  it('reads oils exactly as a review writes them, defaults filled in', () => {
    const { role: _r, ...bare } = RO;
    const p = parseOilsValue(file([bare, EP]));
    expect(p.ok).toBe(true);
    if (p.ok) expect(p.oils.map((o) => o.role)).toEqual(['candidate', 'candidate']);
  });

  it('names the field of a bad oil', () => {
    const p = parseOilsValue(file([RO, { ...EP, kv100_mm2s: 900 }]));
    expect(p.ok).toBe(false);
    if (!p.ok) expect(p.issues[0]).toMatchObject({ path: 'oils[1].kv100_mm2s' });
    const typo = parseOilsValue(file([{ ...RO, fzgStage: 9 }]));
    if (!typo.ok) expect(typo.issues.map((i) => i.path).join(' ')).toMatch(/oils\[0\]/);
    expect(typo.ok).toBe(false);
  });

  it('refuses two oils of one name, a wrong format, a newer version and text that is not JSON', () => {
    const dup = parseOilsValue(file([RO, { ...EP, name: RO.name }]));
    expect(dup.ok ? null : dup.issues[0]).toMatchObject({ path: 'oils[1].name' });
    const fmt = parseOilsValue({ ...file([RO]), format: 'flankfilm.review' });
    expect(fmt.ok ? null : fmt.issues[0]?.path).toBe('format');
    const ver = parseOilsValue({ ...file([RO]), version: 2 });
    expect(ver.ok ? null : ver.issues[0]?.message).toMatch(/newer Flankfilm/);
    const bad = parseOilsText('{"format": ');
    expect(bad.ok ? null : bad.issues[0]?.path).toBe('(file)');
    const empty = parseOilsValue(file([]));
    expect(empty.ok ? null : empty.issues[0]?.path).toBe('oils');
  });

  it('has a JSON Schema that accepts a good file and refuses a bad one', () => {
    const ajv = new Ajv2020({ strict: false });
    const validate = ajv.compile(oilsJsonSchema());
    expect(validate(file([RO, EP]))).toBe(true);
    expect(validate(file([{ ...RO, chemistry: 'snake-oil' }]))).toBe(false);
  });
});

import { describe, expect, it } from 'vitest';
import { lubricantFactor } from '../../../app/engine/oil/lubricantFactor';
import { BASE_OILS } from '../../../app/engine/oil/types';

describe('ISO/TS 6336-20 lubricant factor XL [memory]', () => {
  it.each([
    ['mineral', 1.0], // ISO/TS 6336-20 [memory]
    ['pao', 0.8], // ISO/TS 6336-20 [memory]
    ['pag-insoluble', 0.7], // ISO/TS 6336-20 [memory]
    ['pag-soluble', 0.6], // ISO/TS 6336-20 [memory]
    ['traction', 1.5], // ISO/TS 6336-20 [memory]
    ['phosphate-ester', 1.3], // ISO/TS 6336-20 [memory]
  ] as const)('%s: XL = %s', (baseOil, xl) => {
    const r = lubricantFactor(baseOil);
    expect(r.value).toBe(xl);
    expect(r.warning).toBeNull();
  });

  it('orders traction > phosphate ester > mineral > PAO > PAG-insoluble > PAG-soluble', () => {
    const order = (['traction', 'phosphate-ester', 'mineral', 'pao', 'pag-insoluble', 'pag-soluble'] as const).map((b) => lubricantFactor(b).value);
    for (let i = 1; i < order.length; i++) expect(order[i]!).toBeLessThan(order[i - 1]!); // ISO/TS 6336-20 table [memory]
  });

  it('ester is not tabulated: 1.0 with a warning naming the field', () => {
    const r = lubricantFactor('ester', 'oils[2].baseOil');
    expect(r.value).toBe(1.0);
    expect(r.warning?.code).toBe('oil.lubricant-factor-untabulated');
    expect(r.warning?.field).toBe('oils[2].baseOil');
  });

  it('covers every base oil', () => {
    for (const b of BASE_OILS) expect(Number.isFinite(lubricantFactor(b).value)).toBe(true);
  });
});

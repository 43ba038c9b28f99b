import { describe, expect, it } from 'vitest';
import { ISO_VG_LIMITS } from '../../../app/engine/oil/isoGrade';
import { kv100ForViscosityIndex, viscosityIndex } from '../../../app/engine/oil/viscosityIndex';
import { centistokes } from '../../../app/engine/units';

describe('ASTM D2270 VI as a function of KV100', () => {
  it('rises with KV100 at fixed KV40 wherever VI < 4000 (so the grade-finder root is unique)', () => {
    let checked = 0;
    for (let eu = Math.log10(2.05); eu <= 5; eu += 0.05) {
      const u = 10 ** eu;
      let prev = -Infinity;
      for (let y = 2; y < u; y *= 1.01) {
        const vi = viscosityIndex(centistokes(u), centistokes(y)).unrounded;
        if (vi > 4000) break;
        expect(vi).toBeGreaterThan(prev);
        prev = vi;
        checked++;
      }
    }
    expect(checked).toBeGreaterThan(10000);
  });
});

describe('kv100ForViscosityIndex', () => {
  it.each([0, 95, 150, 250])('builds every VG 10…3200 oil at VI %s', (target) => {
    for (const g of ISO_VG_LIMITS.filter((r) => r.grade >= 10)) {
      const kv100 = kv100ForViscosityIndex(g.midpoint, target);
      expect(kv100).toBeLessThan(g.midpoint);
      expect(viscosityIndex(g.midpoint, kv100).unrounded).toBeCloseTo(target, 6);
    }
  });

  it('rejects a non-finite target, naming the field', () => {
    expect(() => kv100ForViscosityIndex(centistokes(220), Number.NaN, 'oils[0]')).toThrow(/oils\[0\]\.viscosityIndex/);
  });
});

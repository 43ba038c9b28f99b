/**
 * Models kept across recomputes: the same data sheet and field give the same (immutable) model,
 * any change of a value gives a new one with its own numbers, and a rejected oil is not kept.
 */
import { describe, expect, it } from 'vitest';
import { EngineInputError } from '../../../app/engine/diagnostics';
import { makeOilModel, type OilData } from '../../../app/engine/oil/oilModel';
import { cachedOilModel } from '../../../app/engine/oil/oilModelCache';
import { celsiusToKelvin, centistokes, type KilogramsPerCubicMetre } from '../../../app/engine/units';

// An ISO VG 220 mineral gear oil's data sheet (KV100 19 mm²/s, VI ≈ 97: typical catalogue values, [memory]).
const vg220: OilData = { kv40: centistokes(220), kv100: centistokes(19), density15: 885 as KilogramsPerCubicMetre, baseOil: 'mineral' };

describe('cachedOilModel', () => {
  it('gives the same model for the same data and field, with makeOilModel’s numbers', () => {
    const a = cachedOilModel(vg220, 'oils[0]');
    expect(cachedOilModel({ ...vg220 }, 'oils[0]')).toBe(a);
    const fresh = makeOilModel(vg220, 'oils[0]');
    const t = celsiusToKelvin(70);
    expect(a.kinematicViscosity(t)).toBe(fresh.kinematicViscosity(t));
    expect(a.viscosityIndex).toEqual(fresh.viscosityIndex);
    expect(Object.isFrozen(a.warnings)).toBe(true);
  });
  it('a changed value or another field gives another model', () => {
    const a = cachedOilModel(vg220, 'oils[0]');
    expect(cachedOilModel(vg220, 'oils[1]')).not.toBe(a);
    const thicker = cachedOilModel({ ...vg220, kv40: centistokes(230) }, 'oils[0]');
    expect(thicker).not.toBe(a);
    expect(thicker.kinematicViscosity(celsiusToKelvin(40))).toBeGreaterThan(a.kinematicViscosity(celsiusToKelvin(40)));
    expect(cachedOilModel({ ...vg220, viscosityIndex: 97 }, 'oils[0]')).not.toBe(a);
  });
  it('an oil the model rejects throws every time (it is not kept)', () => {
    const bad = { ...vg220, kv100: centistokes(-1) };
    expect(() => cachedOilModel(bad, 'oils[2]')).toThrow(EngineInputError);
    expect(() => cachedOilModel(bad, 'oils[2]')).toThrow(/oils\[2\]\.kv100_mm2s/);
  });
});

import { describe, expect, it } from 'vitest';
import { gearPairGeometry } from '../../../app/engine/geometry/gearPair';
import { blokFlashTemperature, thermalContactCoefficient } from '../../../app/engine/heat/blokFlash';
import { MATERIALS, materialContactCoefficient } from '../../../app/engine/materials';
import { blokFlashAlongPath } from '../../../app/engine/mesh/blokAlongPath';
import { meshMechanics } from '../../../app/engine/mesh/mechanics';
import { rpmToRadiansPerSecond, type JoulesPerKilogramKelvin, type KilogramsPerCubicMetre, type Metres, type MetresPerSecond, type NewtonMetres, type NewtonsPerMetre, type WattsPerMetreKelvin } from '../../../app/engine/units';
import { FZG_PINION_SPEED_RPM, FZG_TYPE_A, FZG_TYPE_C } from '../../reference/fzgTestGears';

const steel = MATERIALS['steel-carburized'];
const duty = (torque: number) => ({ pinionSpeed: rpmToRadiansPerSecond(FZG_PINION_SPEED_RPM), pinionTorque: torque as NewtonMetres, applicationFactor: 1, dynamicFactor: 1, faceLoadFactor: 1, transverseLoadFactor: 1 });

describe('Blok flash temperature along a path: the per-point formula, factored once per path', () => {
  // The FZG A and C-GF test gears (ISO 14635-1, [memory] geometry in tests/reference/fzgTestGears.ts) at 302 N·m.
  for (const [name, gear, points] of [['FZG A', FZG_TYPE_A, 201], ['FZG C', FZG_TYPE_C, 201], ['FZG A, even count (C between points)', FZG_TYPE_A, 40]] as const) {
    it(`${name}: θfl equals blokFlashTemperature at every point, to the last bit, for several μ`, () => {
      const m = meshMechanics(gearPairGeometry(gear), steel, steel, duty(302), points);
      const bM = materialContactCoefficient(steel);
      const out = new Float64Array(m.n);
      for (const mu of [0, 0.04, 0.0612345, 0.1]) {
        const max = blokFlashAlongPath(mu, m, bM, bM, out);
        let expectedMax = 0;
        for (let i = 0; i < m.n; i++) {
          const f = blokFlashTemperature(mu, m.lineLoad[i] as NewtonsPerMetre, m.v1[i] as MetresPerSecond, m.v2[i] as MetresPerSecond, bM, bM, m.hertzSemiWidth[i] as Metres);
          expect(Object.is(out[i], f), `point ${i}, μ ${mu}: ${out[i]} vs ${f}`).toBe(true);
          expectedMax = Math.max(expectedMax, f);
        }
        expect(max).toBe(expectedMax);
        if (mu > 0) expect(max).toBeGreaterThan(0);
      }
    });
  }

  it('different materials on pinion and wheel (BM1 ≠ BM2) keep the same identity, and a second set of coefficients is not served the first', () => {
    const m = meshMechanics(gearPairGeometry(FZG_TYPE_A), steel, steel, duty(200), 101);
    const b1 = materialContactCoefficient(steel);
    // A tin bronze wheel: k ≈ 60 W/(m·K), ρ ≈ 8800 kg/m³, c ≈ 380 J/(kg·K), typical handbook values [memory]
    // (the identity holds for any positive coefficients; these give BM1 ≠ BM2).
    const b2 = thermalContactCoefficient(60 as WattsPerMetreKelvin, 8800 as KilogramsPerCubicMetre, 380 as JoulesPerKilogramKelvin);
    const a = new Float64Array(m.n), b = new Float64Array(m.n);
    blokFlashAlongPath(0.05, m, b1, b1, a);
    blokFlashAlongPath(0.05, m, b1, b2, b);
    for (let i = 0; i < m.n; i++) {
      const f = blokFlashTemperature(0.05, m.lineLoad[i] as NewtonsPerMetre, m.v1[i] as MetresPerSecond, m.v2[i] as MetresPerSecond, b1, b2, m.hertzSemiWidth[i] as Metres);
      expect(Object.is(b[i], f)).toBe(true);
    }
    expect(a.some((x, i) => x !== b[i])).toBe(true);
  });

  it('a negative μ is refused by name, as the per-point formula refuses it', () => {
    const m = meshMechanics(gearPairGeometry(FZG_TYPE_A), steel, steel, duty(302), 21);
    const bM = materialContactCoefficient(steel);
    expect(() => blokFlashAlongPath(-0.01, m, bM, bM, new Float64Array(m.n))).toThrow(/mu/);
  });
});

import { describe, expect, it } from 'vitest';
import { makeOilModel } from '../../../app/engine/oil/oilModel';
import type { BaseOil } from '../../../app/engine/oil/types';
import { kv100ForViscosityIndex } from '../../../app/engine/oil/viscosityIndex';
import { celsiusToKelvin, centistokes, perGigapascal, si, toPerGigapascal } from '../../../app/engine/units';
import type { KilogramsPerCubicMetre } from '../../../app/engine/units';

const VGS = [32, 46, 68, 100, 150, 220, 320, 460, 680] as const;

/** A VG oil of the given VI (KV100 by ASTM D2270) and density; inputs, not expected values. */
function vgOil(vg: number, vi: number, baseOil: BaseOil, density15 = 880, alpha?: number) {
  const kv40 = centistokes(vg);
  return makeOilModel(
    {
      kv40,
      kv100: kv100ForViscosityIndex(kv40, vi),
      density15: si<KilogramsPerCubicMetre>(density15),
      baseOil,
      ...(alpha !== undefined ? { pressureViscosity: perGigapascal(alpha) } : {}),
    },
    'oils[0]',
  );
}

const alphaAt = (m: ReturnType<typeof vgOil>, theta: number) => toPerGigapascal(m.pressureViscosity(celsiusToKelvin(theta)));

describe('default pressure–viscosity coefficient', () => {
  it.each(VGS)('mineral VG %s (VI 95) at 40 °C lies in 15–30 GPa⁻¹', (vg) => {
    const a = alphaAt(vgOil(vg, 95, 'mineral'), 40);
    expect(a).toBeGreaterThanOrEqual(15); // common practice: mineral oils 15–30 GPa⁻¹ near 40 °C
    expect(a).toBeLessThanOrEqual(30); // common practice
  });

  it('mineral α rises with grade (VG 32 → 680) and falls with temperature (20 → 120 °C)', () => {
    const at40 = VGS.map((vg) => alphaAt(vgOil(vg, 95, 'mineral'), 40));
    for (let i = 1; i < at40.length; i++) expect(at40[i]!).toBeGreaterThan(at40[i - 1]!); // ISO/TR 15144-1 form [memory]: α38 ∝ η38^0.1348
    const m = vgOil(220, 95, 'mineral');
    let prev = Infinity;
    for (let theta = 20; theta <= 120; theta += 10) {
      const a = alphaAt(m, theta);
      expect(a).toBeLessThan(prev); // common practice: α falls as the oil warms
      prev = a;
    }
  });

  it.each([
    ['pao', 12, 20], // common practice: PAO 12–20 GPa⁻¹ near 40 °C
    ['pag-insoluble', 8, 16], // common practice: PAG 8–16 GPa⁻¹ near 40 °C
    ['pag-soluble', 8, 16], // common practice: PAG 8–16 GPa⁻¹ near 40 °C
  ] as const)('%s VG 32…680 at 40 °C lies in %s–%s GPa⁻¹', (baseOil, lo, hi) => {
    for (const vg of VGS) {
      const m = vgOil(vg, 150, baseOil, baseOil === 'pao' ? 850 : 1050);
      const a = alphaAt(m, 40);
      expect(a).toBeGreaterThanOrEqual(lo);
      expect(a).toBeLessThanOrEqual(hi);
      expect(m.warnings.filter((w) => w.code === 'oil.pressure-viscosity-typical')).toHaveLength(0);
    }
  });

  it('PAO and PAG sit below mineral oil of the same grade', () => {
    const mineral = alphaAt(vgOil(220, 95, 'mineral'), 40);
    expect(alphaAt(vgOil(220, 150, 'pao', 850), 40)).toBeLessThan(mineral); // common practice
    expect(alphaAt(vgOil(220, 200, 'pag-insoluble', 1050), 40)).toBeLessThan(mineral); // common practice
  });

  it.each(['ester', 'phosphate-ester', 'traction'] as const)('%s uses a typical value and says so', (baseOil) => {
    const m = vgOil(100, 130, baseOil, 950);
    const w = m.warnings.find((x) => x.code === 'oil.pressure-viscosity-typical');
    expect(w?.field).toBe('oils[0].pressureViscosity_1perGPa');
    expect(alphaAt(m, 40)).toBeGreaterThan(alphaAt(m, 100));
  });

  it('the traction fluid default is the highest (common practice: traction fluids have the highest α)', () => {
    const traction = alphaAt(vgOil(32, 80, 'traction', 900), 40);
    for (const b of ['mineral', 'pao', 'pag-insoluble', 'pag-soluble', 'ester', 'phosphate-ester'] as const) {
      expect(traction).toBeGreaterThan(alphaAt(vgOil(680, 95, b, 900), 40));
    }
  });

  it('a data-sheet α wins at every temperature', () => {
    const m = vgOil(220, 95, 'mineral', 880, 17.5);
    expect(alphaAt(m, 40)).toBeCloseTo(17.5, 12); // input
    expect(alphaAt(m, 110)).toBeCloseTo(17.5, 12); // input
    expect(m.pressureViscositySource).toContain('data sheet');
    expect(m.warnings).toHaveLength(0);
  });
});

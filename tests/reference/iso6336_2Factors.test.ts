import { describe, expect, it } from 'vitest';
import { gearPairGeometry } from '../../app/engine/geometry/gearPair';
import { MATERIALS } from '../../app/engine/materials';
import { contactModulus } from '../../app/engine/stress/hertz';
import { contactRatioFactor, elasticityFactor, nominalContactStress, zoneFactor } from '../../app/engine/stress/iso6336Nominal';
import { degreesToRadians, millimetres, type Newtons } from '../../app/engine/units';

const steel = MATERIALS['steel-through-hardened'];
const eStar = contactModulus(steel.youngsModulus, steel.poissonRatio, steel.youngsModulus, steel.poissonRatio);
const pair = (betaDeg: number) =>
  gearPairGeometry({
    normalModule: millimetres(4),
    normalPressureAngle: degreesToRadians(20),
    helixAngle: degreesToRadians(betaDeg),
    faceWidth: millimetres(50),
    pinion: { teeth: 20, profileShift: 0 },
    wheel: { teeth: 60, profileShift: 0 },
  });

describe('ISO 6336-2 factors', () => {
  it('ZE = 189.8 √(N/mm²) for steel on steel, E = 206 GPa, ν = 0.3 (ISO 6336-2)', () => {
    expect(elasticityFactor(eStar) / 1e3).toBeCloseTo(189.8, 1); // √Pa → √(N/mm²) is ÷ 1000
  });
  it('ZH = 2.495 for 20° spur gears without profile shift (ISO 6336-2)', () => {
    expect(zoneFactor(pair(0))).toBeCloseTo(2.495, 3);
  });
  it('ZH = 2.42 for β = 15°, x1 + x2 = 0, αn = 20° (ISO 6336-2 ZH chart [memory]; formula gives 2.4246)', () => {
    expect(zoneFactor(pair(15))).toBeCloseTo(2.42, 2);
  });
  it('Zε: spur √((4 − εα)/3); εβ ≥ 1 gives √(1/εα) (ISO 6336-2)', () => {
    expect(contactRatioFactor(1.6, 0)).toBeCloseTo(Math.sqrt(2.4 / 3), 12);
    expect(contactRatioFactor(1.6, 1.2)).toBeCloseTo(Math.sqrt(1 / 1.6), 12);
  });
});

describe('nominal contact stress σH0 (ISO 6336-2)', () => {
  // Hand calculation for the spur pair above, T1 = 500 N·m: d1 = 80 mm, Ft = 12 500 N, u = 3,
  // εα = (√(44² − 37.588²) − (54.723 − √(124² − 112.763²)))/(4π cos 20°) = (22.872 − 3.143)/11.809
  // = 1.6707 (ISO 21771), Zε = √((4 − 1.6707)/3) = 0.8812,
  // σH0 = 2.4946 · 189.81 · 0.8812 · √(12500 · 4/(80 · 50 · 3)) = 851.7 N/mm².
  it('spur hand calculation: 851.7 N/mm² within 0.5 % (ISO 6336-2 formula, arithmetic)', () => {
    const g = pair(0);
    const s = nominalContactStress(g, 12500 as Newtons, eStar, { kA: 1, kv: 1, kHbeta: 1, kHalpha: 1 });
    expect(Math.abs(s.sigmaH0 / 1e6 / 851.7 - 1)).toBeLessThan(0.005);
  });
  it('σH = σH0 √(KA Kv KHβ KHα)', () => {
    const g = pair(10);
    const s = nominalContactStress(g, 12500 as Newtons, eStar, { kA: 1.25, kv: 1.1, kHbeta: 1.3, kHalpha: 1.0 });
    expect(s.sigmaH / s.sigmaH0).toBeCloseTo(Math.sqrt(1.25 * 1.1 * 1.3), 12);
  });
  it('β → 0 is continuous with the spur result (1e-6 rad off spur differs by < 1e-6 relative)', () => {
    const spur = nominalContactStress(pair(0), 12500 as Newtons, eStar, { kA: 1, kv: 1, kHbeta: 1, kHalpha: 1 });
    const nearly = nominalContactStress(pair(1e-4), 12500 as Newtons, eStar, { kA: 1, kv: 1, kHbeta: 1, kHalpha: 1 });
    expect(Math.abs(nearly.sigmaH0 / spur.sigmaH0 - 1)).toBeLessThan(1e-6);
  });
  // Helical hand calculation, β = 18°, same pair and T1 = 500 N·m (ISO 6336-2:2019 formulas, arithmetic):
  // d1 = 20·4/cos 18° = 84.117 mm, Ft = 2·500e3/84.117 = 11 888.2 N, αt = atan(tan 20°/cos 18°) = 20.942°,
  // βb = asin(sin 18° cos 20°) = 16.881°, pbt = π·4·cos αt/cos 18° = 12.340 mm, εα = (24.051 − 4.820)/12.340 = 1.5584,
  // εβ = 50 sin 18°/(4π) = 1.2295 ≥ 1 → Zε = √(1/εα) = 0.8011, ZH = √(2 cos βb cos αt/(cos² αt sin αt)) = 2.3944,
  // Zβ = 1/√cos 18° = 1.02541, σH0 = 2.3944 · 189.81 · 0.8011 · 1.02541 · √(11888.2 · 4/(84.117 · 50 · 3)) = 724.74 N/mm².
  // With the 1996 edition's Zβ = √cos β the same pair gives 724.74 · cos 18° = 689.27 N/mm² (4.9 % low).
  it('helical hand calculation, β = 18°: σH0 = 724.7 N/mm² within 0.3 % with Zβ = 1/√cos β (ISO 6336-2:2019)', () => {
    const s = nominalContactStress(pair(18), 11888.206 as Newtons, eStar, { kA: 1, kv: 1, kHbeta: 1, kHalpha: 1 });
    expect(s.zBeta).toBeCloseTo(1.025408, 6);
    expect(Math.abs(s.sigmaH0 / 1e6 / 724.74 - 1)).toBeLessThan(0.003);
    expect(Math.abs(s.sigmaH0 / 1e6 / 689.27 - 1)).toBeGreaterThan(0.04);
  });
});

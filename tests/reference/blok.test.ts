import { describe, expect, it } from 'vitest';
import { EngineInputError } from '../../app/engine/diagnostics';
import { BLOK_CONSTANT_SEMI_WIDTH, blokFlashTemperature, thermalContactCoefficient } from '../../app/engine/heat/blokFlash';
import type {
  JoulesPerKilogramKelvin,
  KilogramsPerCubicMetre,
  Metres,
  MetresPerSecond,
  NewtonsPerMetre,
  ThermalContactCoefficient,
  WattsPerMetreKelvin,
} from '../../app/engine/units';

const B = (v: number) => v as ThermalContactCoefficient;
const ms = (v: number) => v as MetresPerSecond;
const STEEL = B(13.6e3); // 13.6 N/(mm·s^0.5·K) = 13 600 W·s^0.5/(m²·K), steel (AGMA 925 [memory])

// Pinion tip E of the FZG A gear at stage 9, 2175 rpm (own arithmetic of the ISO 14635-1 geometry):
// ρ1 28.73 mm, ρ2 6.19 mm, v1 6.545 m/s, v2 0.940 m/s, w = XΓ(E) 1/3 × 446.4 N/mm, bH 92.3 µm (E 206 GPa, ν 0.3);
// μ 0.06 (ISO/TS 6336-20 μm of that case, isoTs6336_20.test.ts).
const P = { mu: 0.06, w: 148_788 as NewtonsPerMetre, v1: ms(6.5446), v2: ms(0.94013), bH: 92.334e-6 as Metres };

describe('Blok flash temperature (Blok 1937; AGMA 925 form [memory])', () => {
  it('steel B_M = √(kρc): k 45 W/(m·K), ρ 7850 kg/m³, c 470 J/(kg·K) → 12.9e3 W·s^0.5/(m²·K) = 12.9 N/(mm·s^0.5·K)', () => {
    const b = thermalContactCoefficient(45 as WattsPerMetreKelvin, 7850 as KilogramsPerCubicMetre, 470 as JoulesPerKilogramKelvin);
    expect(b).toBeCloseTo(12_885, 0); // arithmetic: √(45·7850·470) = √1.660e8
    expect(b / 1000).toBeCloseTo(12.9, 1); // same number in N/(mm·s^0.5·K): W·s^0.5/(m²·K) = N/(m·s^0.5·K) = 1e-3 N/(mm·s^0.5·K)
    expect(Math.abs(b / STEEL - 1)).toBeLessThan(0.06); // within 6 % of the 13.6 quoted for gear steel
  });

  it('is zero at equal velocities (pure rolling, pitch point)', () => {
    expect(blokFlashTemperature(P.mu, P.w, ms(8.3), ms(8.3), STEEL, STEEL, P.bH)).toBe(0);
    expect(blokFlashTemperature(P.mu, P.w, ms(0), ms(0), STEEL, STEEL, P.bH)).toBe(0);
  });

  it('equals AGMA’s mixed-unit form 0.80·√1000·μ w[N/mm] |√v1 − √v2| / (B_M[N/(mm·s^0.5·K)] √bH[mm]) (AGMA 925 [memory])', () => {
    const si = blokFlashTemperature(P.mu, P.w, P.v1, P.v2, STEEL, STEEL, P.bH);
    const mixed = (0.8 * Math.sqrt(1000) * P.mu * (P.w / 1000) * Math.abs(Math.sqrt(P.v1) - Math.sqrt(P.v2))) / ((STEEL / 1000) * Math.sqrt(P.bH * 1000));
    expect(si).toBeCloseTo(mixed, 9);
    expect(si).toBeCloseTo(86.82, 1); // arithmetic: 0.80·0.06·148 788·(2.5582 − 0.9696)/(13 600·√9.2334e-5)
  });

  it('semi-width constant 0.80 and full-width constant 1.11 describe the same source within 2 % (0.80·√2 = 1.131)', () => {
    const semi = blokFlashTemperature(P.mu, P.w, P.v1, P.v2, STEEL, STEEL, P.bH);
    const full = (1.11 * P.mu * P.w * Math.abs(Math.sqrt(P.v1) - Math.sqrt(P.v2))) / (STEEL * Math.sqrt(2 * P.bH));
    expect(semi / full).toBeCloseTo((BLOK_CONSTANT_SEMI_WIDTH * Math.SQRT2) / 1.11, 12);
    expect(Math.abs(semi / full - 1)).toBeLessThan(0.02); // 1.019
  });

  it('is linear in μ and w, and ∝ bH^−0.5, at fixed velocities', () => {
    const t0 = blokFlashTemperature(P.mu, P.w, P.v1, P.v2, STEEL, STEEL, P.bH);
    expect(blokFlashTemperature(2 * P.mu, P.w, P.v1, P.v2, STEEL, STEEL, P.bH) / t0).toBeCloseTo(2, 12);
    expect(blokFlashTemperature(P.mu, (2 * P.w) as NewtonsPerMetre, P.v1, P.v2, STEEL, STEEL, P.bH) / t0).toBeCloseTo(2, 12);
    expect(blokFlashTemperature(P.mu, P.w, P.v1, P.v2, STEEL, STEEL, (4 * P.bH) as Metres) / t0).toBeCloseTo(0.5, 12);
  });

  it('different materials: Blok partition lies between the two equal-material values and is symmetric in the bodies', () => {
    const bronze = B(7.0e3); // lower effusivity than steel (order of magnitude, common practice)
    const mixed = blokFlashTemperature(P.mu, P.w, P.v1, P.v2, STEEL, bronze, P.bH);
    const allSteel = blokFlashTemperature(P.mu, P.w, P.v1, P.v2, STEEL, STEEL, P.bH);
    const allBronze = blokFlashTemperature(P.mu, P.w, P.v1, P.v2, bronze, bronze, P.bH);
    expect(mixed).toBeGreaterThan(allSteel);
    expect(mixed).toBeLessThan(allBronze);
    expect(blokFlashTemperature(P.mu, P.w, P.v2, P.v1, bronze, STEEL, P.bH)).toBeCloseTo(mixed, 9);
  });

  it('negative velocity or non-positive width throw EngineInputError', () => {
    expect(() => blokFlashTemperature(P.mu, P.w, ms(-1), P.v2, STEEL, STEEL, P.bH)).toThrow(EngineInputError);
    expect(() => blokFlashTemperature(P.mu, P.w, P.v1, P.v2, STEEL, STEEL, 0 as Metres)).toThrow(EngineInputError);
    expect(() => blokFlashTemperature(Number.NaN, P.w, P.v1, P.v2, STEEL, STEEL, P.bH)).toThrow(EngineInputError);
  });
});

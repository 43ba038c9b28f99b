import { describe, expect, it } from 'vitest';
import { EngineInputError } from '../../../app/engine/diagnostics';
import { scuffingProbability } from '../../../app/engine/heat/scuffingProbability';
import { celsiusToKelvin } from '../../../app/engine/units';

const C = celsiusToKelvin;

describe('scuffing probability P = Φ((θB,max − θS)/σ), σ = 0.15 θS in °C (AGMA 925 style [memory])', () => {
  // θS 262.25 °C (FZG stage 9, ISO/TS 6336-20 formula): σ = 39.34 K
  it('θB,max = θS → 0.5; one σ below → 0.159; 1.96 σ above → 0.975 (standard normal tables)', () => {
    expect(scuffingProbability(C(262.25), C(262.25))).toBeCloseTo(0.5, 6);
    expect(scuffingProbability(C(262.25 - 0.15 * 262.25), C(262.25))).toBeCloseTo(0.1586553, 6);
    expect(scuffingProbability(C(262.25 + 1.96 * 0.15 * 262.25), C(262.25))).toBeCloseTo(0.9750021, 6);
  });

  it('σ is on the Celsius value, not the kelvin value', () => {
    // with σ from 535.4 K the same θB would give Φ(−39.34/80.31) = 0.312 instead of 0.159
    expect(scuffingProbability(C(262.25 - 39.3375), C(262.25))).not.toBeCloseTo(0.312, 2);
  });

  it('takes the scatter fraction as a parameter', () => {
    expect(scuffingProbability(C(262.25 - 0.1 * 262.25), C(262.25), 0.1)).toBeCloseTo(0.1586553, 6);
    expect(() => scuffingProbability(C(200), C(262.25), 0)).toThrow(EngineInputError);
    expect(() => scuffingProbability(C(200), C(-5))).toThrow(EngineInputError);
  });
});

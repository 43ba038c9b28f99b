import { describe, expect, it } from 'vitest';
import { EngineInputError } from '../../../app/engine/diagnostics';
import { gearPairGeometry } from '../../../app/engine/geometry/gearPair';
import { degreesToRadians, millimetres } from '../../../app/engine/units';
import { FZG_TYPE_A } from '../../reference/fzgTestGears';

/**
 * Contact continuity (ISO 21771 [memory]): a pair runs continuously when the total contact ratio
 * εγ = εα + εβ ≥ 1. A helical pair with short tips (εα < 1) is continuous through its overlap.
 */
describe('contact continuity: refuse only εγ < 1, warn εα < 1', () => {
  // εβ = b sin β/(π mn) = 60 · sin 30°/(π · 4) = 2.387; tips cut to 0.6 mn addendum bring εα below 1.
  const shortTips = (betaDeg: number, faceWidth: number, addendum = 0.6) =>
    gearPairGeometry({
      normalModule: millimetres(4),
      normalPressureAngle: degreesToRadians(20),
      helixAngle: degreesToRadians(betaDeg),
      faceWidth: millimetres(faceWidth),
      pinion: { teeth: 20, profileShift: 0, tipDiameter: millimetres((20 * 4) / Math.cos(degreesToRadians(betaDeg)) + 2 * addendum * 4) },
      wheel: { teeth: 60, profileShift: 0, tipDiameter: millimetres((60 * 4) / Math.cos(degreesToRadians(betaDeg)) + 2 * addendum * 4) },
    });

  it('helical, short tips: εα < 1, εβ = 2.387, εγ > 1 → runs, with a warning (it was refused before)', () => {
    const g = shortTips(30, 60);
    expect(g.transverseContactRatio).toBeLessThan(1);
    expect(g.overlapRatio).toBeCloseTo((60 * Math.sin(degreesToRadians(30))) / (Math.PI * 4), 9); // 2.387, ISO 21771
    expect(g.totalContactRatio).toBeGreaterThan(1);
    expect(g.checks.map((c) => c.code)).toContain('geometry.transverse-contact-ratio-below-one');
  });

  it('spur with tips short enough for εα < 1 (0.4 mn addendum): εγ = εα < 1 → refused, naming the contact ratio', () => {
    expect(() => shortTips(0, 60, 0.4)).toThrow(EngineInputError);
    expect(() => shortTips(0, 60, 0.4)).toThrow(/εγ/);
  });
});

/**
 * Centre distance against profile shifts (ISO 21771): the no-backlash centre distance follows from
 * inv αwt = inv αt + 2 tan αn (x1 + x2)/(z1 + z2). FZG type A: x1 + x2 = 0.3532 gives 91.5 mm
 * (Höhn 2008, Table 1).
 */
describe('centre distance with backlash', () => {
  it('0.08 mm above the no-backlash value: accepted, αwt from the given a, a warning that says backlash and the difference', () => {
    const g = gearPairGeometry({ ...FZG_TYPE_A, centerDistance: millimetres(91.58) });
    const w = g.checks.find((c) => c.code === 'geometry.backlash');
    expect(w?.message).toMatch(/backlash/);
    expect(w?.message).toMatch(/0\.0[78]\d mm above/);
    // cos αwt = a0 cos αt / a, a0 = 4.5 · 40/2 = 90 mm: acos(90 cos 20°/91.58) = 22.55° (arithmetic)
    expect((g.workingPressureAngle * 180) / Math.PI).toBeCloseTo((Math.acos((90 * Math.cos(degreesToRadians(20))) / 91.58) * 180) / Math.PI, 9);
    expect(g.x1).toBe(0.8532);
  });
  it('0.2 mm below: the teeth jam → refused with the limit', () => {
    expect(() => gearPairGeometry({ ...FZG_TYPE_A, centerDistance: millimetres(91.3) })).toThrow(/jam/);
    try {
      gearPairGeometry({ ...FZG_TYPE_A, centerDistance: millimetres(91.3) });
    } catch (e) {
      expect((e as EngineInputError).field).toBe('gearPair.centerDistance_mm');
      expect((e as EngineInputError).limit).toMatch(/≥ 91\.5\d\d mm/);
    }
  });
  it('the published data (91.5 mm) give no backlash warning', () => {
    expect(gearPairGeometry(FZG_TYPE_A).checks.map((c) => c.code)).not.toContain('geometry.backlash');
  });
});

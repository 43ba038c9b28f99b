import { describe, expect, it } from 'vitest';
import { gearPairGeometry } from '../../app/engine/geometry/gearPair';
import { involute, inverseInvolute } from '../../app/engine/geometry/involute';
import { degreesToRadians, millimetres, radiansToDegrees, toMillimetres } from '../../app/engine/units';
import { FZG_TYPE_A, FZG_TYPE_C } from './fzgTestGears';

describe('involute function (ISO 21771)', () => {
  it('inv 20° = 0.0149044 (arithmetic: tan 20° − 20° in rad)', () => {
    expect(involute(degreesToRadians(20))).toBeCloseTo(0.0149044, 7);
  });
  it('inverse involute returns the angle', () => {
    for (const deg of [5, 14.5, 20, 22.44, 25, 35, 50]) {
      expect(radiansToDegrees(inverseInvolute(involute(degreesToRadians(deg))))).toBeCloseTo(deg, 9);
    }
  });
});

describe('FZG test gears (ISO 14635-1; Höhn et al. 2008, Table 1)', () => {
  for (const [name, input] of [['type A', FZG_TYPE_A], ['type C', FZG_TYPE_C]] as const) {
    it(`${name}: dw1 = 73.2 mm (2a/(1+u), a = 91.5 mm, u = 1.5)`, () => {
      const g = gearPairGeometry(input);
      expect(toMillimetres(g.workingDiameter1)).toBeCloseTo(73.2, 6);
    });
    it(`${name}: the given shifts agree with a = 91.5 mm within 0.01 mm (data consistency, Höhn 2008 Table 1)`, () => {
      const { centerDistance: _a, ...shiftsOnly } = input;
      const g = gearPairGeometry(shiftsOnly);
      expect(Math.abs(toMillimetres(g.centerDistance) - 91.5)).toBeLessThan(0.01);
    });
  }
  it('type A: αwt = 22.44° (cos αwt = 90 cos 20°/91.5, ISO 21771 arithmetic)', () => {
    const g = gearPairGeometry(FZG_TYPE_A);
    expect(radiansToDegrees(g.workingPressureAngle)).toBeCloseTo(22.44, 2);
  });
  // εα from the Table 1 tip diameters by the ISO 21771 formulas, worked by hand:
  // type A: T1E = √(44.385² − 33.829²) = 28.734, T1A = 34.929 − √(56.25² − 50.743²) = 10.655,
  // pbt = 4.5π cos 20° = 13.285 → εα = 1.361. Type C likewise: (23.569 − 4.476)/13.285 = 1.437.
  it('type A: εα = 1.361 (hand calculation from Höhn 2008 Table 1 by ISO 21771)', () => {
    expect(gearPairGeometry(FZG_TYPE_A).transverseContactRatio).toBeCloseTo(1.361, 3);
  });
  it('type C: εα = 1.437 (hand calculation from Höhn 2008 Table 1 by ISO 21771)', () => {
    expect(gearPairGeometry(FZG_TYPE_C).transverseContactRatio).toBeCloseTo(1.437, 2);
  });
  it('A < B < D < E, with C in the two-pair zone below B on type A (ISO 14635-1 type A is known for C outside single contact)', () => {
    const g = gearPairGeometry(FZG_TYPE_A);
    const { A, B, C, D, E } = g.points;
    expect(A).toBeGreaterThan(0);
    expect(A).toBeLessThan(B);
    expect(B).toBeLessThan(D);
    expect(D).toBeLessThan(E);
    expect(C).toBeGreaterThan(A);
    expect(C).toBeLessThan(B);
    expect(E).toBeLessThan(g.lineOfAction);
  });
  it('ordering identities: T1B = T1E − pbt and T1D = T1A + pbt (ISO 21771)', () => {
    const g = gearPairGeometry(FZG_TYPE_C);
    expect(g.points.E - g.points.B).toBeCloseTo(g.transverseBasePitch, 12);
    expect(g.points.D - g.points.A).toBeCloseTo(g.transverseBasePitch, 12);
  });
});

describe('helical geometry (ISO 21771)', () => {
  const helical = (betaDeg: number) =>
    gearPairGeometry({
      normalModule: millimetres(3),
      normalPressureAngle: degreesToRadians(20),
      helixAngle: degreesToRadians(betaDeg),
      faceWidth: millimetres(40),
      pinion: { teeth: 21, profileShift: 0 },
      wheel: { teeth: 67, profileShift: 0 },
    });
  it('αt = atan(tan αn/cos β) and βb = asin(sin β cos αn): β = 15° gives αt = 20.647°, βb = 14.076° (arithmetic)', () => {
    const g = helical(15);
    expect(radiansToDegrees(g.transversePressureAngle)).toBeCloseTo(20.6469, 3);
    expect(radiansToDegrees(g.baseHelixAngle)).toBeCloseTo(14.0761, 3);
  });
  it('εβ = b sin β/(π mn): 40 sin 15°/(3π) = 1.0985 (arithmetic)', () => {
    expect(helical(15).overlapRatio).toBeCloseTo((40 * Math.sin((15 * Math.PI) / 180)) / (3 * Math.PI), 12);
  });
  it('zero shifts give a = mn (z1 + z2)/(2 cos β)', () => {
    const g = helical(15);
    expect(toMillimetres(g.centerDistance)).toBeCloseTo((3 * 88) / (2 * Math.cos((15 * Math.PI) / 180)), 9);
  });
});

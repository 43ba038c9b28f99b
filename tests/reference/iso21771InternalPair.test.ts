import { describe, expect, it } from 'vitest';
import { EngineInputError } from '../../app/engine/diagnostics';
import { gearPairGeometry } from '../../app/engine/geometry/gearPair';
import type { GearPairInput } from '../../app/engine/geometry/types';
import { MATERIALS } from '../../app/engine/materials';
import { meshMechanics } from '../../app/engine/mesh/mechanics';
import { degreesToRadians, millimetres, radiansToDegrees, rpmToRadiansPerSecond, toMegapascals, toMillimetres, type NewtonMetres } from '../../app/engine/units';

/**
 * An internal spur pair worked by hand from the ISO 21771 formulas for internal gears
 * (../shared/METHODS.md, "Internal gears and planetary stages" [memory]): pinion z1 = 24 inside a
 * ring z2 = 72, mn = 4 mm, αn = 20°, β = 0, b = 40 mm, zero shifts, standard addendum (haP* = 1).
 * The numbers are our own hand calculation; the arithmetic is beside each value.
 */
const INTERNAL: GearPairInput = {
  kind: 'internal',
  normalModule: millimetres(4),
  normalPressureAngle: degreesToRadians(20),
  helixAngle: degreesToRadians(0),
  faceWidth: millimetres(40),
  pinion: { teeth: 24, profileShift: 0 },
  wheel: { teeth: 72, profileShift: 0 },
};
const EXTERNAL: GearPairInput = { ...INTERNAL, kind: 'external' };
const steel = MATERIALS['steel-carburized'];
// T1 = 1000 N·m at 1000 rpm: any duty serves, the stress scales as √T1.
const duty = { pinionSpeed: rpmToRadiansPerSecond(1000), pinionTorque: 1000 as NewtonMetres, applicationFactor: 1, dynamicFactor: 1, faceLoadFactor: 1, transverseLoadFactor: 1 };

describe('internal spur pair 24/72, mn 4 (hand calculation by ISO 21771)', () => {
  const g = gearPairGeometry(INTERNAL);
  const mm = (x: number) => toMillimetres(x as never);
  it('centre distance a = mn (z2 − z1)/2 = 4·48/2 = 96 mm and αwt = αt = 20° for zero shifts', () => {
    expect(mm(g.centerDistance)).toBeCloseTo(96, 9); // 4 · (72 − 24)/2
    expect(radiansToDegrees(g.workingPressureAngle)).toBeCloseTo(20, 9);
  });
  it('ring inner (tip) diameter da2 = d2 − 2 mn = 288 − 8 = 280 mm', () => {
    expect(mm(g.tipDiameter2)).toBeCloseTo(280, 9);
    expect(mm(g.tipDiameter1)).toBeCloseTo(104, 9); // 96 + 8
  });
  it('T1T2 = a sin αwt = 96 sin 20° = 32.834 mm', () => {
    expect(mm(g.lineOfAction)).toBeCloseTo(32.834, 3);
  });
  // rb1 = 48 cos 20° = 45.1052, rb2 = 144 cos 20° = 135.3157; ra1 = 52, ra2 = 140;
  // T1E = √(52² − 45.1052²) = √(2704 − 2034.48) = 25.875;
  // T1A = √(140² − 135.3157²) − T1T2 = √(19600 − 18310.36) − 32.834 = 35.912 − 32.834 = 3.078;
  // T1C = rb1 tan αwt = 45.1052 · 0.36397 = 16.417; pbt = π 4 cos 20° = 11.809;
  // T1B = T1E − pbt = 14.066; T1D = T1A + pbt = 14.886.
  it('A 3.078, B 14.066, C 16.417, D 14.886, E 25.875 mm from T1', () => {
    expect(mm(g.points.A)).toBeCloseTo(3.078, 3);
    expect(mm(g.points.B)).toBeCloseTo(14.066, 3);
    expect(mm(g.points.C)).toBeCloseTo(16.417, 3);
    expect(mm(g.points.D)).toBeCloseTo(14.886, 3);
    expect(mm(g.points.E)).toBeCloseTo(25.875, 3);
  });
  it('εα = (T1E − T1A)/pbt = (25.875 − 3.078)/11.809 = 1.931; εβ = 0 (spur)', () => {
    expect(g.transverseContactRatio).toBeCloseTo(1.9306, 3);
    expect(g.overlapRatio).toBe(0);
  });
  it('εβ = b sin β/(π mn): 40 sin 10°/(4π) = 0.5527 on the helical variant', () => {
    expect(gearPairGeometry({ ...INTERNAL, helixAngle: degreesToRadians(10) }).overlapRatio).toBeCloseTo(0.5527, 4);
  });
  it('no design check warns: 48 teeth difference, tips and roots clear', () => {
    expect(g.checks.filter((c) => c.severity !== 'info')).toEqual([]);
  });

  // Whole-load pitch stress: Ft = 2·1000/0.096 = 20 833 N, Fbt = Ft/cos 20° = 22 170 N,
  // w = 22 170/0.040 = 554 259 N/m; ρ1 = T1C = 16.417 mm, ρ2 = T1C + T1T2 = 49.251 mm,
  // ρred = ρ1ρ2/(ρ2 − ρ1) = 16.417·49.251/32.834 = 24.625 mm; E* = 206 GPa/(2·0.91) = 113.19 GPa;
  // pC = √(554 259 · 113.19e9/(π · 0.024625)) = 900.5 MPa.
  const m = meshMechanics(g, steel, steel, duty, 201);
  it('pitch stress with the whole load pC = 900.5 MPa (conformal ρred = 24.625 mm)', () => {
    expect(mm(m.reducedRadius[m.pitchIndex] as number)).toBeCloseTo(24.625, 3);
    expect(toMegapascals(m.pitchHertzWholeLoad)).toBeCloseTo(900.5, 1);
  });
  // ISO 6336-2 with u negative for internal gears [memory]: σH0 = ZH ZE Zε √(Ft/(d1 b) · (u − 1)/u)
  // = 2.4946 · 189.81 · √((4 − 1.9306)/3) · √(20 833/(96·40) · 2/3) = 2.4946·189.81·0.83055·1.9017 = 747.9 MPa.
  it('nominal σH0 = 747.9 MPa by ISO 6336-2 with (|u| − 1)/|u|', () => {
    expect(toMegapascals(m.nominal.sigmaH0)).toBeCloseTo(747.9, 0);
  });

  const ext = gearPairGeometry(EXTERNAL);
  const me = meshMechanics(ext, steel, steel, duty, 201);
  it('the external pair of the same pinion carries a higher pitch stress (ρ2 = 65.668 − 16.417 mm, ρred = 12.313 mm, pC = 1273.5 MPa)', () => {
    expect(toMegapascals(me.pitchHertzWholeLoad)).toBeCloseTo(1273.5, 1);
    expect(m.pitchHertzWholeLoad).toBeLessThan(me.pitchHertzWholeLoad);
  });
  it('sliding is zero at C, and v1 = v2 there', () => {
    expect(m.position[m.pitchIndex]).toBe(g.points.C);
    expect(m.slidingVelocity[m.pitchIndex] as number).toBeLessThan(1e-12);
    expect(m.v1[m.pitchIndex] as number).toBeCloseTo(m.v2[m.pitchIndex] as number, 12);
  });
  // At y from C: internal v1 − v2 = y (ω1 − ω2), external y (ω1 + ω2) (kinematics of ρ1 = s, ρ2 = s ± T1T2),
  // so at equal y the internal pair slides less by (u − 1)/(u + 1) = 2/4 = 0.5.
  it('sliding at the same distance from C is (u − 1)/(u + 1) = 0.5 of the external pair’s', () => {
    const y = 5e-3;
    const at = (mech: typeof m, s: number) => {
      let best = 0;
      for (let i = 0; i < mech.n; i++) if (Math.abs((mech.position[i] as number) - s) < Math.abs((mech.position[best] as number) - s)) best = i;
      return best;
    };
    const ii = at(m, g.points.C + y);
    const ie = at(me, ext.points.C + y);
    const yi = (m.position[ii] as number) - g.points.C;
    const ye = (me.position[ie] as number) - ext.points.C;
    expect((m.slidingVelocity[ii] as number) / yi / ((me.slidingVelocity[ie] as number) / ye)).toBeCloseTo(0.5, 9);
  });
  // vΣ = 2 vC + y (ω1 + ω2) inside the ring, 2 vC + y (ω1 − ω2) outside: equal at C, smaller on the
  // ring-tip side (y < 0) and larger on the pinion-tip side (y > 0).
  it('sum velocity: equal at C, smaller than the external pair’s at A (the thinnest film), larger at E', () => {
    expect(m.sumVelocity[m.pitchIndex] as number).toBeCloseTo(me.sumVelocity[me.pitchIndex] as number, 10);
    const vA = (mech: typeof m, gg: typeof g, s: number) => 2 * mech.pinionAngularSpeed * gg.points.C + (s - gg.points.C) * (mech.pinionAngularSpeed + (gg.kind === 'internal' ? 1 : -1) * mech.wheelAngularSpeed);
    expect(m.sumVelocity[0] as number).toBeCloseTo(vA(m, g, g.points.A), 10);
    expect(m.sumVelocity[0] as number).toBeLessThan(vA(me, ext, g.points.A));
    expect(m.sumVelocity[m.n - 1] as number).toBeGreaterThan(vA(me, ext, g.points.E));
  });
});

function fieldOf(f: () => unknown): string | null {
  try {
    f();
  } catch (e) {
    return e instanceof EngineInputError ? e.field : null;
  }
  return null;
}

describe('internal pair: bad input and design checks', () => {
  it('a ring with no more teeth than its pinion is refused, naming the ring teeth', () => {
    expect(() => gearPairGeometry({ ...INTERNAL, wheel: { teeth: 24 } })).toThrow(EngineInputError);
    expect(fieldOf(() => gearPairGeometry({ ...INTERNAL, wheel: { teeth: 20 } }))).toBe('gearPair.wheel.teeth');
  });
  it('a ring whose inner diameter lies below its base circle is refused, naming the tip diameter', () => {
    // db2 = 288 cos 20° = 270.63 mm; an inner diameter of 270 mm lies inside it.
    const run = () => gearPairGeometry({ ...INTERNAL, wheel: { teeth: 72, tipDiameter: millimetres(270) } });
    expect(run).toThrow(/below the base circle/);
    expect(fieldOf(run)).toBe('gearPair.wheel.tipDiameter_mm');
  });
  // z1 = 20 in z2 = 60, mn 4: T2A = √(116² − 112.763²) = 27.212 < T1T2 = 80 sin 20° = 27.362, so the ring
  // tip passes T1 (T1A = −0.150 mm): the classic involute interference of a small pinion in a ring.
  it('a 20-tooth pinion in a standard 60-tooth ring: the ring tip passes T1 (interference), refused', () => {
    expect(() => gearPairGeometry({ ...INTERNAL, pinion: { teeth: 20, profileShift: 0 }, wheel: { teeth: 60, profileShift: 0 } })).toThrow(/reaches past T1/);
  });
  it('a tooth-count difference under 10 warns of tip interference (common practice)', () => {
    const g = gearPairGeometry({ ...INTERNAL, pinion: { teeth: 60, profileShift: 0 }, wheel: { teeth: 68, profileShift: 0 } });
    expect(g.checks.map((c) => c.code)).toContain('geometry.internal-tip-interference');
  });
  it('profile shift on the ring (ISO sign: x2 > 0 towards the axis) shrinks its inner diameter and the centre distance', () => {
    // da2 = d2 − 2 mn (1 + x2) = 288 − 8·1.5 = 276 mm
    const g = gearPairGeometry({ ...INTERNAL, wheel: { teeth: 72, profileShift: 0.5 } });
    expect(toMillimetres(g.tipDiameter2)).toBeCloseTo(276, 9);
    expect(toMillimetres(g.centerDistance)).toBeLessThan(96);
  });
  it('a given centre distance gives back the shifts that produce it', () => {
    const shifted = gearPairGeometry({ ...INTERNAL, pinion: { teeth: 24, profileShift: 0.3 }, wheel: { teeth: 72, profileShift: 0.1 } });
    const back = gearPairGeometry({ ...INTERNAL, centerDistance: shifted.centerDistance, pinion: { teeth: 24, profileShift: 0.3 }, wheel: { teeth: 72 } });
    expect(back.x2).toBeCloseTo(0.1, 9);
  });
});

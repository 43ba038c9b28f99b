import { describe, expect, it } from 'vitest';
import { gearPairGeometry } from '../../app/engine/geometry/gearPair';
import { loadShare, spurLoadShare } from '../../app/engine/load/loadSharing';
import { samplePath } from '../../app/engine/kinematics/pathSampling';
import { MATERIALS } from '../../app/engine/materials';
import { meshMechanics } from '../../app/engine/mesh/mechanics';
import { degreesToRadians, millimetres, rpmToRadiansPerSecond, type Metres, type NewtonMetres } from '../../app/engine/units';
import { FZG_TYPE_C } from '../reference/fzgTestGears';

const steel = MATERIALS['steel-carburized'];
// Any duty will do: these are identities of the kinematics and the sharing, not values.
const duty = { pinionSpeed: rpmToRadiansPerSecond(1500), pinionTorque: 200 as NewtonMetres, applicationFactor: 1, dynamicFactor: 1, faceLoadFactor: 1, transverseLoadFactor: 1 };

describe('path sampling', () => {
  it('contains A, B, C, D and E exactly, in order, with the requested count', () => {
    const g = gearPairGeometry(FZG_TYPE_C);
    for (const n of [11, 12, 201, 400]) {
      const s = samplePath(g.points, n);
      expect(s.length).toBe(n);
      for (const p of Object.values(g.points)) expect(Array.from(s)).toContain(p);
      for (let i = 1; i < n; i++) expect(s[i] as number).toBeGreaterThan(s[i - 1] as number);
    }
  });
});

describe('kinematic identities (ISO/TS 6336-20 kinematics)', () => {
  const g = gearPairGeometry(FZG_TYPE_C);
  const m = meshMechanics(g, steel, steel, duty, 201);
  it('sliding is zero at C and v1 = v2 there', () => {
    expect(m.position[m.pitchIndex]).toBe(g.points.C);
    expect(m.slidingVelocity[m.pitchIndex] as number).toBeLessThan(1e-12);
    expect(m.v1[m.pitchIndex] as number).toBeCloseTo(m.v2[m.pitchIndex] as number, 12);
  });
  it('slide-to-roll changes sign across C (negative on the pinion dedendum)', () => {
    expect(m.slideToRoll[0] as number).toBeLessThan(0);
    expect(m.slideToRoll[m.n - 1] as number).toBeGreaterThan(0);
  });
  it('the sum velocity at C is twice the rolling speed ω1 rb1 tan αwt', () => {
    const rb1 = g.baseDiameter1 / 2;
    expect(m.sumVelocity[m.pitchIndex] as number).toBeCloseTo(2 * m.pinionAngularSpeed * rb1 * Math.tan(g.workingPressureAngle), 10);
  });
});

describe('load sharing XΓ (ISO/TS 6336-20 [memory])', () => {
  const g = gearPairGeometry(FZG_TYPE_C);
  const p = g.points;
  it('spur: 1/3 at A, 2/3 just before B, 1 from B to D, 1/3 at E', () => {
    expect(spurLoadShare(p.A, p)).toBeCloseTo(1 / 3, 12);
    expect(spurLoadShare((p.B - 1e-12) as Metres, p)).toBeCloseTo(2 / 3, 9);
    expect(spurLoadShare(p.B, p)).toBe(1);
    expect(spurLoadShare(((p.B + p.D) / 2) as Metres, p)).toBe(1);
    expect(spurLoadShare(p.D, p)).toBe(1);
    expect(spurLoadShare(p.E, p)).toBeCloseTo(1 / 3, 12);
  });
  it('helical with εβ ≥ 1: uniform 1/εα', () => {
    expect(loadShare(p.A, p, 1.5, 1.2)).toBeCloseTo(1 / 1.5, 12);
    expect(loadShare(p.C, p, 1.5, 1.2)).toBeCloseTo(1 / 1.5, 12);
  });
  it('β = 0 gives exactly the spur path; small εβ is continuous with it', () => {
    for (const s of [p.A, p.B, p.C, p.D, p.E]) {
      expect(loadShare(s, p, g.transverseContactRatio, 0)).toBe(spurLoadShare(s, p));
      expect(Math.abs(loadShare(s, p, g.transverseContactRatio, 1e-9) - spurLoadShare(s, p))).toBeLessThan(1e-8);
    }
  });
  it('single-pair contact holds between B and D, and the shares of two pairs a base pitch apart add to 1 in the two-pair zones', () => {
    for (let t = 0.125; t < 1; t += 0.125) { // open interval: at B and D the step takes the single-pair value
      const s = (p.A + t * (p.B - p.A)) as Metres;
      const partner = (s + g.transverseBasePitch) as Metres; // the other pair is in the zone D…E
      expect(partner > p.D && partner < p.E).toBe(true);
      {
        expect(spurLoadShare(s, p) + spurLoadShare(partner, p)).toBeCloseTo(1, 9);
      }
    }
  });
});

describe('helical pair reached as β → 0', () => {
  const pair = (betaDeg: number) =>
    gearPairGeometry({ normalModule: millimetres(3), normalPressureAngle: degreesToRadians(20), helixAngle: degreesToRadians(betaDeg), faceWidth: millimetres(30), pinion: { teeth: 23, profileShift: 0.2 }, wheel: { teeth: 71, profileShift: 0 } });
  it('Hertz stress along the path converges to the spur values', () => {
    const spur = meshMechanics(pair(0), steel, steel, duty, 101);
    const near = meshMechanics(pair(1e-5), steel, steel, duty, 101);
    for (let i = 0; i < spur.n; i++) {
      expect(Math.abs((near.hertzPressure[i] as number) / (spur.hertzPressure[i] as number) - 1)).toBeLessThan(1e-5);
    }
  });
});

describe('specific sliding (kinematics of involute gearing)', () => {
  it('ζ1 = (v1 − v2)/v1 and ζ2 = (v2 − v1)/v2, zero at C, with ζ2 = −ζ1/(1 − ζ1)', () => {
    const g = gearPairGeometry(FZG_TYPE_C);
    const m = meshMechanics(g, steel, steel, duty, 101);
    expect(m.specificSliding1[m.pitchIndex] as number).toBeCloseTo(0, 12);
    for (let i = 0; i < m.n; i++) {
      const z1 = m.specificSliding1[i] as number;
      expect(m.specificSliding2[i] as number).toBeCloseTo(-z1 / (1 - z1), 9);
    }
  });
});

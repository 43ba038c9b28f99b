import { EngineInputError, type EngineWarning } from '../diagnostics';
import type { Metres, Radians } from '../units';
import { involute, inverseInvolute } from './involute';
import type { GearPairGeometry, GearPairInput } from './types';
import { designChecks } from './designChecks';

/** Addendum coefficient of the basic rack, haP* = 1 (ISO 53 profile A). */
const ADDENDUM_COEFFICIENT = 1;
/**
 * Tolerance between a given centre distance and the one the given profile shifts imply:
 * 0.5 % of the module, far above the rounding of published data (the ISO 14635-1 type A
 * data agree to 0.002 mm at mn = 4.5 mm) and far below a real design error.
 */
const CENTRE_DISTANCE_TOLERANCE_PER_MODULE = 0.005;

const F = {
  a: 'gearPair.centerDistance_mm',
  x1: 'gearPair.pinion.profileShift',
  x2: 'gearPair.wheel.profileShift',
  da1: 'gearPair.pinion.tipDiameter_mm',
  da2: 'gearPair.wheel.tipDiameter_mm',
} as const;

/**
 * Geometry of an external involute cylindrical gear pair (spur or helical) per ISO 21771:
 * diameters, working pressure angle, centre distance, the points A–E on the line of action
 * (measured from T1) and the contact ratios, followed by the design checks.
 *
 * Either the centre distance or the profile shifts may be given; the other is derived.
 * If both are given, a centre distance above the no-backlash value of the shifts (by more than
 * 0.005·mn) is backlash: the given a sets αwt and a warning states the difference; one below it
 * would jam the teeth and raises an EngineInputError that names the field and the limit.
 * Impossible geometry (no contact, a tip inside its base circle) raises EngineInputError.
 */
export function gearPairGeometry(g: GearPairInput): GearPairGeometry {
  const mn = g.normalModule;
  const an = g.normalPressureAngle;
  const beta = g.helixAngle;
  const z1 = g.pinion.teeth;
  const z2 = g.wheel.teeth;
  const cosB = Math.cos(beta);
  const at = Math.atan(Math.tan(an) / cosB) as Radians;
  const betaB = Math.asin(Math.sin(beta) * Math.cos(an)) as Radians;
  const d1 = ((z1 * mn) / cosB) as Metres;
  const d2 = ((z2 * mn) / cosB) as Metres;
  const db1 = (d1 * Math.cos(at)) as Metres;
  const db2 = (d2 * Math.cos(at)) as Metres;
  const a0 = (d1 + d2) / 2;
  const invAt = involute(at);
  const notes: EngineWarning[] = [];

  let x1: number;
  let x2: number;
  let awt: Radians;
  let a: Metres;
  const givenX1 = g.pinion.profileShift;
  const givenX2 = g.wheel.profileShift;
  if (g.centerDistance !== undefined) {
    a = g.centerDistance;
    const cosAwt = (a0 * Math.cos(at)) / a;
    if (!(cosAwt > 0 && cosAwt < 1)) {
      throw new EngineInputError(
        'geometry.centre-distance-impossible',
        F.a,
        `> ${(a0 * Math.cos(at) * 1e3).toFixed(3)} mm`,
        `${F.a} = ${(a * 1e3).toFixed(3)} mm is impossible: the base circles would overlap (it must exceed ${(a0 * Math.cos(at) * 1e3).toFixed(3)} mm).`,
      );
    }
    awt = Math.acos(cosAwt) as Radians;
    const sumX = ((involute(awt) - invAt) * (z1 + z2)) / (2 * Math.tan(an));
    if (givenX1 !== undefined && givenX2 !== undefined) {
      const impliedA = centreDistanceFromShifts(a0, at, an, z1, z2, givenX1 + givenX2);
      const tol = CENTRE_DISTANCE_TOLERANCE_PER_MODULE * mn;
      if (a < impliedA - tol) {
        throw new EngineInputError(
          'geometry.centre-distance-too-small',
          F.a,
          `≥ ${(impliedA * 1e3).toFixed(3)} mm`,
          `${F.a} = ${(a * 1e3).toFixed(3)} mm is below ${(impliedA * 1e3).toFixed(3)} mm, the no-backlash centre distance of the profile shifts x1 + x2 = ${(givenX1 + givenX2).toFixed(4)}: the teeth would jam. Increase the centre distance or reduce the profile shifts.`,
        );
      }
      if (a > impliedA + tol) {
        notes.push({
          code: 'geometry.backlash',
          severity: 'warning',
          field: F.a,
          message: `The centre distance ${(a * 1e3).toFixed(3)} mm is ${((a - impliedA) * 1e3).toFixed(3)} mm above ${(impliedA * 1e3).toFixed(3)} mm, the no-backlash value of the profile shifts x1 + x2 = ${(givenX1 + givenX2).toFixed(4)}: the difference is backlash. The working pressure angle is taken from the given centre distance.`,
        });
      }
      x1 = givenX1;
      x2 = givenX2;
    } else if (givenX1 !== undefined) {
      x1 = givenX1;
      x2 = sumX - givenX1;
    } else if (givenX2 !== undefined) {
      x2 = givenX2;
      x1 = sumX - givenX2;
    } else {
      x1 = sumX / 2;
      x2 = sumX / 2;
      notes.push({
        code: 'geometry.profile-shift-split',
        severity: 'info',
        field: F.x1,
        message: `Profile shifts not given: the sum x1 + x2 = ${sumX.toFixed(4)} implied by the centre distance is split equally.`,
      });
    }
  } else {
    x1 = givenX1 ?? 0;
    x2 = givenX2 ?? 0;
    if (givenX1 === undefined || givenX2 === undefined) {
      notes.push({
        code: 'geometry.profile-shift-assumed-zero',
        severity: 'info',
        field: givenX1 === undefined ? F.x1 : F.x2,
        message: 'No centre distance and no profile shift given: x = 0 assumed for the missing shift.',
      });
    }
    const invAwt = invAt + (2 * Math.tan(an) * (x1 + x2)) / (z1 + z2);
    if (!(invAwt > 0)) {
      throw new EngineInputError('geometry.profile-shift-impossible', F.x1, 'x1 + x2 > −(z1+z2) inv αt / (2 tan αn)', `The profile shifts x1 + x2 = ${(x1 + x2).toFixed(4)} give no working pressure angle.`);
    }
    awt = inverseInvolute(invAwt);
    a = ((a0 * Math.cos(at)) / Math.cos(awt)) as Metres;
  }

  const da1 = g.pinion.tipDiameter ?? ((d1 + 2 * mn * (ADDENDUM_COEFFICIENT + x1)) as Metres);
  const da2 = g.wheel.tipDiameter ?? ((d2 + 2 * mn * (ADDENDUM_COEFFICIENT + x2)) as Metres);
  if (!(da1 > db1)) {
    throw new EngineInputError('geometry.tip-inside-base-circle', F.da1, `> ${(db1 * 1e3).toFixed(3)} mm`, `${F.da1} = ${(da1 * 1e3).toFixed(3)} mm is not larger than the base diameter ${(db1 * 1e3).toFixed(3)} mm: the pinion has no involute flank.`);
  }
  if (!(da2 > db2)) {
    throw new EngineInputError('geometry.tip-inside-base-circle', F.da2, `> ${(db2 * 1e3).toFixed(3)} mm`, `${F.da2} = ${(da2 * 1e3).toFixed(3)} mm is not larger than the base diameter ${(db2 * 1e3).toFixed(3)} mm: the wheel has no involute flank.`);
  }

  const rb1 = db1 / 2;
  const rb2 = db2 / 2;
  const ra1 = da1 / 2;
  const ra2 = da2 / 2;
  const T1T2 = (a * Math.sin(awt)) as Metres;
  const T1E = Math.sqrt(ra1 * ra1 - rb1 * rb1) as Metres;
  const T1A = (T1T2 - Math.sqrt(ra2 * ra2 - rb2 * rb2)) as Metres;
  const T1C = (rb1 * Math.tan(awt)) as Metres;
  const pbt = ((Math.PI * mn * Math.cos(at)) / cosB) as Metres;
  const T1B = (T1E - pbt) as Metres;
  const T1D = (T1A + pbt) as Metres;
  const epsAlpha = (T1E - T1A) / pbt;
  const epsBeta = (g.faceWidth * Math.sin(beta)) / (Math.PI * mn);
  const u = z2 / z1;
  const dw1 = ((2 * a) / (1 + u)) as Metres;

  const geometry: GearPairGeometry = {
    z1,
    z2,
    u,
    normalModule: mn,
    normalPressureAngle: an,
    helixAngle: beta,
    faceWidth: g.faceWidth,
    transversePressureAngle: at,
    workingPressureAngle: awt,
    baseHelixAngle: betaB,
    x1,
    x2,
    referenceDiameter1: d1,
    referenceDiameter2: d2,
    baseDiameter1: db1,
    baseDiameter2: db2,
    tipDiameter1: da1,
    tipDiameter2: da2,
    workingDiameter1: dw1,
    workingDiameter2: (dw1 * u) as Metres,
    centerDistance: a,
    transverseBasePitch: pbt,
    lineOfAction: T1T2,
    points: { A: T1A, B: T1B, C: T1C, D: T1D, E: T1E },
    transverseContactRatio: epsAlpha,
    overlapRatio: epsBeta,
    totalContactRatio: epsAlpha + epsBeta,
    checks: [],
  };
  const checks = [...notes, ...designChecks(geometry)];
  const fatal = checks.find((c) => c.severity === 'error');
  if (fatal) throw new EngineInputError(fatal.code, fatal.field, 'a meshing gear pair', fatal.message);
  return { ...geometry, checks };
}

/** a = a0 cos αt / cos αwt with inv αwt = inv αt + 2 tan αn Σx/(z1+z2) (ISO 21771). */
function centreDistanceFromShifts(a0: number, at: Radians, an: Radians, z1: number, z2: number, sumX: number): number {
  const invAwt = involute(at) + (2 * Math.tan(an) * sumX) / (z1 + z2);
  if (!(invAwt > 0)) return -1; // no working angle: cannot equal a real centre distance
  return (a0 * Math.cos(at)) / Math.cos(inverseInvolute(invAwt));
}

import { EngineInputError, type EngineWarning } from '../diagnostics';
import type { Metres, Radians } from '../units';
import { involute, inverseInvolute } from './involute';
import { DEFAULT_PAIR_NAMES, type GearPairGeometry, type GearPairInput, type PairNames } from './types';
import { designChecks } from './designChecks';

/** Addendum coefficient of the basic rack, haP* = 1 (ISO 53 profile A). */
const ADDENDUM_COEFFICIENT = 1;
/**
 * Tolerance between a given centre distance and the one the given profile shifts imply:
 * 0.5 % of the module, far above the rounding of published data (the ISO 14635-1 type A
 * data agree to 0.002 mm at mn = 4.5 mm) and far below a real design error.
 */
const CENTRE_DISTANCE_TOLERANCE_PER_MODULE = 0.005;

const fieldsOf = (n: PairNames) =>
  ({
    a: `${n.pair}.centerDistance_mm`,
    z2: `${n.wheel.field}.teeth`,
    x1: `${n.pinion.field}.profileShift`,
    x2: `${n.wheel.field}.profileShift`,
    da1: `${n.pinion.field}.tipDiameter_mm`,
    da2: `${n.wheel.field}.tipDiameter_mm`,
  }) as const;

/**
 * Geometry of an involute cylindrical gear pair (spur or helical, external or internal) per
 * ISO 21771: diameters, working pressure angle, centre distance, the points A–E on the line of
 * action (measured from T1) and the contact ratios, followed by the design checks.
 *
 * The internal pair is ISO 21771's external pair with the ring's tooth count, diameters and centre
 * distance negative [memory]; here they stay positive and σ = −1 carries the sign:
 * a = (d2 + σ d1)/2 · cos αt/cos αwt, inv αwt = inv αt + 2 tan αn (x1 + x2)/(z1 + σ z2),
 * da2 = d2 + σ 2 mn (haP* + x2), T1A = σ (T1T2 − √(ra2² − rb2²)), dw1 = 2a/(u + σ).
 * With zero shifts an internal pair has a = mn (z2 − z1)/(2 cos β).
 *
 * Either the centre distance or the profile shifts may be given; the other is derived.
 * If both are given, a centre distance on the loose side of the no-backlash value of the shifts
 * (by more than 0.005·mn: larger on an external pair, smaller on an internal one) is backlash:
 * the given a sets αwt and a warning states the difference; one on the tight side would jam the
 * teeth and raises an EngineInputError that names the field and the limit.
 * Impossible geometry (no contact, a tip inside its base circle, a ring no larger than its
 * pinion) raises EngineInputError.
 */
export function gearPairGeometry(g: GearPairInput): GearPairGeometry {
  const kind = g.kind ?? 'external';
  const names = g.names ?? DEFAULT_PAIR_NAMES;
  const F = fieldsOf(names);
  const sigma = kind === 'internal' ? -1 : 1;
  const mn = g.normalModule;
  const an = g.normalPressureAngle;
  const beta = g.helixAngle;
  const z1 = g.pinion.teeth;
  const z2 = g.wheel.teeth;
  if (kind === 'internal' && !(z2 > z1)) {
    throw new EngineInputError('geometry.ring-not-larger', F.z2, `> ${z1} teeth`, `The ${names.wheel.word} has ${z2} teeth, not more than the ${names.pinion.word}'s ${z1}: an internal gear must have more teeth than the gear inside it.`);
  }
  const cosB = Math.cos(beta);
  const at = Math.atan(Math.tan(an) / cosB) as Radians;
  const betaB = Math.asin(Math.sin(beta) * Math.cos(an)) as Radians;
  const d1 = ((z1 * mn) / cosB) as Metres;
  const d2 = ((z2 * mn) / cosB) as Metres;
  const db1 = (d1 * Math.cos(at)) as Metres;
  const db2 = (d2 * Math.cos(at)) as Metres;
  const a0 = (d2 + sigma * d1) / 2;
  const zSum = z1 + sigma * z2;
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
        `The centre distance ${(a * 1e3).toFixed(3)} mm is impossible: ${kind === 'internal' ? 'the base circles would not leave a line of action' : 'the base circles would overlap'} (it must exceed ${(a0 * Math.cos(at) * 1e3).toFixed(3)} mm, the ${kind === 'internal' ? 'difference' : 'sum'} of the base radii).`,
      );
    }
    awt = Math.acos(cosAwt) as Radians;
    const sumX = ((involute(awt) - invAt) * zSum) / (2 * Math.tan(an));
    if (givenX1 !== undefined && givenX2 !== undefined) {
      const impliedA = centreDistanceFromShifts(a0, at, an, zSum, givenX1 + givenX2);
      const tol = CENTRE_DISTANCE_TOLERANCE_PER_MODULE * mn;
      // Backlash opens as the pinion moves away from the wheel's teeth: a larger a outside, a smaller a inside a ring.
      const loose = sigma * (a - impliedA);
      if (loose < -tol) {
        throw new EngineInputError(
          'geometry.centre-distance-too-small',
          F.a,
          `${sigma > 0 ? '≥' : '≤'} ${(impliedA * 1e3).toFixed(3)} mm`,
          `The centre distance ${(a * 1e3).toFixed(3)} mm is ${sigma > 0 ? 'below' : 'above'} ${(impliedA * 1e3).toFixed(3)} mm, the no-backlash centre distance of the profile shifts x1 + x2 = ${(givenX1 + givenX2).toFixed(4)}: the teeth would jam. ${sigma > 0 ? 'Increase' : 'Reduce'} the centre distance or reduce the profile shifts.`,
        );
      }
      if (loose > tol) {
        notes.push({
          code: 'geometry.backlash',
          severity: 'warning',
          field: F.a,
          message: `The centre distance ${(a * 1e3).toFixed(3)} mm is ${(loose * 1e3).toFixed(3)} mm ${sigma > 0 ? 'above' : 'below'} ${(impliedA * 1e3).toFixed(3)} mm, the no-backlash value of the profile shifts x1 + x2 = ${(givenX1 + givenX2).toFixed(4)}: the difference is backlash. The working pressure angle is taken from the given centre distance.`,
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
    const invAwt = invAt + (2 * Math.tan(an) * (x1 + x2)) / zSum;
    if (!(invAwt > 0)) {
      const limit = kind === 'internal' ? 'x1 + x2 < (z2 − z1) inv αt / (2 tan αn)' : 'x1 + x2 > −(z1+z2) inv αt / (2 tan αn)';
      throw new EngineInputError('geometry.profile-shift-impossible', F.x1, limit, `The profile shifts x1 + x2 = ${(x1 + x2).toFixed(4)} give no working pressure angle.`);
    }
    awt = inverseInvolute(invAwt);
    a = ((a0 * Math.cos(at)) / Math.cos(awt)) as Metres;
  }

  const da1 = g.pinion.tipDiameter ?? ((d1 + 2 * mn * (ADDENDUM_COEFFICIENT + x1)) as Metres);
  const da2 = g.wheel.tipDiameter ?? ((d2 + sigma * 2 * mn * (ADDENDUM_COEFFICIENT + x2)) as Metres);
  if (!(da1 > db1)) {
    throw new EngineInputError('geometry.tip-inside-base-circle', F.da1, `> ${(db1 * 1e3).toFixed(3)} mm`, `The ${names.pinion.word}'s tip diameter ${(da1 * 1e3).toFixed(3)} mm is not larger than its base diameter ${(db1 * 1e3).toFixed(3)} mm: it has no involute flank.`);
  }
  if (!(da2 > db2)) {
    const what = kind === 'internal' ? `inner (tip) diameter` : 'tip diameter';
    throw new EngineInputError('geometry.tip-inside-base-circle', F.da2, `> ${(db2 * 1e3).toFixed(3)} mm`, `The ${names.wheel.word}'s ${what} ${(da2 * 1e3).toFixed(3)} mm is not larger than its base diameter ${(db2 * 1e3).toFixed(3)} mm: its tip lies below the base circle, where there is no involute flank.`);
  }

  const rb1 = db1 / 2;
  const rb2 = db2 / 2;
  const ra1 = da1 / 2;
  const ra2 = da2 / 2;
  const T1T2 = (a * Math.sin(awt)) as Metres;
  const T1E = Math.sqrt(ra1 * ra1 - rb1 * rb1) as Metres;
  const T1A = (sigma * (T1T2 - Math.sqrt(ra2 * ra2 - rb2 * rb2))) as Metres;
  const T1C = (rb1 * Math.tan(awt)) as Metres;
  const pbt = ((Math.PI * mn * Math.cos(at)) / cosB) as Metres;
  const T1B = (T1E - pbt) as Metres;
  const T1D = (T1A + pbt) as Metres;
  const epsAlpha = (T1E - T1A) / pbt;
  const epsBeta = (g.faceWidth * Math.sin(beta)) / (Math.PI * mn);
  const u = z2 / z1;
  const dw1 = ((2 * a) / (u + sigma)) as Metres;

  const geometry: GearPairGeometry = {
    kind,
    names,
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

/** a = a0 cos αt / cos αwt with inv αwt = inv αt + 2 tan αn Σx/(z1 + σ z2) (ISO 21771). */
function centreDistanceFromShifts(a0: number, at: Radians, an: Radians, zSum: number, sumX: number): number {
  const invAwt = involute(at) + (2 * Math.tan(an) * sumX) / zSum;
  if (!(invAwt > 0)) return -1; // no working angle: cannot equal a real centre distance
  return (a0 * Math.cos(at)) / Math.cos(inverseInvolute(invAwt));
}

import type { EngineWarning } from '../diagnostics';
import type { Radians } from '../units';
import { involute } from './involute';
import type { GearPairGeometry } from './types';

/** Dedendum coefficient of the basic rack hfP* = 1.25 (ISO 53 profile A), for the tip-to-root clearance check. */
const DEDENDUM_COEFFICIENT = 1.25;
/** Minimum normal tip thickness, 0.2 mn (common practice for case-hardened gears). */
const MIN_TIP_THICKNESS_PER_MODULE = 0.2;

type Side = 'pinion' | 'wheel';

/**
 * Design checks on a computed pair. Severity `error` means the pair cannot mesh as described
 * (the caller rejects the review); `warning` means it meshes but a practitioner would object.
 */
export function designChecks(g: GearPairGeometry): EngineWarning[] {
  const out: EngineWarning[] = [];
  const { A, E } = g.points;
  const mm = (m: number) => `${(m * 1e3).toFixed(3)} mm`;

  if (A <= 0) {
    out.push({
      code: 'geometry.interference-pinion-base',
      severity: 'error',
      field: 'gearPair.wheel.tipDiameter_mm',
      message: `The wheel tip reaches past T1 (T1A = ${mm(A)} ≤ 0): it would cut into the pinion below its base circle. Reduce the wheel tip diameter or add pinion profile shift.`,
    });
  }
  if (E >= g.lineOfAction) {
    out.push({
      code: 'geometry.interference-wheel-base',
      severity: 'error',
      field: 'gearPair.pinion.tipDiameter_mm',
      message: `The pinion tip reaches past T2 (T1E = ${mm(E)} ≥ T1T2 = ${mm(g.lineOfAction)}): it would cut into the wheel below its base circle.`,
    });
  }
  if (g.totalContactRatio < 1) {
    out.push({
      code: 'geometry.contact-ratio-below-one',
      severity: 'error',
      field: 'gearPair',
      message: `Total contact ratio εγ = εα + εβ = ${g.totalContactRatio.toFixed(3)} < 1: contact is not continuous, the pair cannot run smoothly. Increase the tip diameters, the tooth counts, the face width or the helix angle.`,
    });
  } else if (g.transverseContactRatio < 1) {
    out.push({
      code: 'geometry.transverse-contact-ratio-below-one',
      severity: 'warning',
      field: 'gearPair',
      message: `Transverse contact ratio εα = ${g.transverseContactRatio.toFixed(3)} < 1 (short tips): contact stays continuous through the overlap (εγ = ${g.totalContactRatio.toFixed(3)}), but each transverse section is in single-pair contact; check the tip diameters.`,
    });
  }
  for (const side of ['pinion', 'wheel'] as const) {
    out.push(...undercutCheck(g, side), ...tipThicknessCheck(g, side));
  }
  out.push(...clearanceChecks(g));
  return out;
}

function sideValues(g: GearPairGeometry, side: Side) {
  return side === 'pinion'
    ? { z: g.z1, x: g.x1, d: g.referenceDiameter1, db: g.baseDiameter1, da: g.tipDiameter1 }
    : { z: g.z2, x: g.x2, d: g.referenceDiameter2, db: g.baseDiameter2, da: g.tipDiameter2 };
}

/**
 * Undercut: for αn = 20° the practical limit x ≥ (14 − zn)/17 (common practice); for other
 * angles the theoretical limit x ≥ haP* − (zn/2) sin² αn (ISO 21771 [memory]); zn = z/(cos²βb cos β).
 */
function undercutCheck(g: GearPairGeometry, side: Side): EngineWarning[] {
  const { z, x } = sideValues(g, side);
  const zn = z / (Math.cos(g.baseHelixAngle) ** 2 * Math.cos(g.helixAngle));
  const is20 = Math.abs(g.normalPressureAngle - (20 * Math.PI) / 180) < 1e-9;
  const xMin = is20 ? (14 - zn) / 17 : 1 - (zn / 2) * Math.sin(g.normalPressureAngle) ** 2;
  if (x >= xMin - 1e-9) return [];
  return [
    {
      code: `geometry.undercut-${side}`,
      severity: 'warning',
      field: `gearPair.${side}.profileShift`,
      message: `The ${side} may be undercut: x = ${x.toFixed(3)} is below the limit ${xMin.toFixed(3)} for zn = ${zn.toFixed(1)} (${is20 ? '(14 − zn)/17, common practice' : 'haP* − zn sin²αn/2'}).`,
    },
  ];
}

/** Normal tooth thickness at the tip, san = da (st/d + inv αt − inv αat) cos βa (ISO 21771). */
export function normalTipThickness(g: GearPairGeometry, side: Side): number {
  const { x, d, db, da } = sideValues(g, side);
  const mt = g.normalModule / Math.cos(g.helixAngle);
  const st = mt * (Math.PI / 2 + 2 * x * Math.tan(g.normalPressureAngle));
  const aat = Math.acos(db / da) as Radians;
  const sat = da * (st / d + involute(g.transversePressureAngle) - involute(aat));
  const betaA = Math.atan((Math.tan(g.helixAngle) * da) / d);
  return sat * Math.cos(betaA);
}

function tipThicknessCheck(g: GearPairGeometry, side: Side): EngineWarning[] {
  const san = normalTipThickness(g, side);
  const limit = MIN_TIP_THICKNESS_PER_MODULE * g.normalModule;
  const field = `gearPair.${side}.tipDiameter_mm`;
  if (san <= 0) {
    return [
      {
        code: `geometry.tip-diameter-impossible-${side}`,
        severity: 'error',
        field,
        message: `The ${side} tip diameter ${(sideValues(g, side).da * 1e3).toFixed(3)} mm is larger than the geometry allows: the flanks meet below it (tip thickness ${(san * 1e3).toFixed(3)} mm). Reduce the tip diameter or the profile shift.`,
      },
    ];
  }
  if (san < limit) {
    return [
      {
        code: `geometry.pointed-tip-${side}`,
        severity: 'warning',
        field,
        message: `The ${side} tip is nearly pointed: normal tip thickness ${(san * 1e3).toFixed(3)} mm < 0.2 mn = ${(limit * 1e3).toFixed(3)} mm (common practice).`,
      },
    ];
  }
  return [];
}

/** Tip-to-root clearance c = a − ra − rf of the mating gear, with rf from the ISO 53 rack (hfP* = 1.25). */
function clearanceChecks(g: GearPairGeometry): EngineWarning[] {
  const out: EngineWarning[] = [];
  const rf1 = (g.referenceDiameter1 - 2 * g.normalModule * (DEDENDUM_COEFFICIENT - g.x1)) / 2;
  const rf2 = (g.referenceDiameter2 - 2 * g.normalModule * (DEDENDUM_COEFFICIENT - g.x2)) / 2;
  const pairs: Array<[Side, number]> = [
    ['pinion', g.centerDistance - g.tipDiameter1 / 2 - rf2],
    ['wheel', g.centerDistance - g.tipDiameter2 / 2 - rf1],
  ];
  for (const [side, c] of pairs) {
    if (c < 0) {
      out.push({
        code: `geometry.tip-root-clearance-${side}`,
        severity: 'warning',
        field: `gearPair.${side}.tipDiameter_mm`,
        message: `The ${side} tip would reach ${(-c * 1e3).toFixed(3)} mm into the mating root circle (root from an ISO 53 rack, hfP* = 1.25): check the tip diameter against the real root.`,
      });
    }
  }
  return out;
}

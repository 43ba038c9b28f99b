import type { EngineWarning } from '../diagnostics';
import type { Radians } from '../units';
import { involute } from './involute';
import type { GearPairGeometry } from './types';

/** Dedendum coefficient of the basic rack hfP* = 1.25 (ISO 53 profile A), for the tip-to-root clearance check. */
const DEDENDUM_COEFFICIENT = 1.25;
/** Minimum normal tip thickness, 0.2 mn (common practice for case-hardened gears). */
const MIN_TIP_THICKNESS_PER_MODULE = 0.2;
/**
 * Smallest tooth-count difference z2 − z1 of an internal pair with 20° full-depth teeth below which
 * the tips foul outside the path of contact (tip interference); common practice [memory] asks for
 * 10 or more, a cutter-specific check for less.
 */
export const MIN_INTERNAL_TOOTH_DIFFERENCE = 10;

type Side = 'pinion' | 'wheel';

/**
 * Design checks on a computed pair. Severity `error` means the pair cannot mesh as described
 * (the caller rejects the review); `warning` means it meshes but a practitioner would object.
 * An internal pair's ring has no undercut check (its teeth widen towards the root) and no T2
 * check (T2 lies behind T1); it has the tooth-count-difference check for tip interference.
 */
export function designChecks(g: GearPairGeometry): EngineWarning[] {
  const out: EngineWarning[] = [];
  const { A, E } = g.points;
  const mm = (m: number) => `${(m * 1e3).toFixed(3)} mm`;
  const n = g.names;
  const internal = g.kind === 'internal';

  if (A <= 0) {
    out.push({
      code: 'geometry.interference-pinion-base',
      severity: 'error',
      field: `${n.wheel.field}.tipDiameter_mm`,
      message: `The ${n.wheel.word} tip reaches past T1 (T1A = ${mm(A)} ≤ 0): it would cut into the ${n.pinion.word} below its base circle. ${internal ? `Enlarge the ${n.wheel.word}'s inner (tip) diameter` : `Reduce the ${n.wheel.word} tip diameter`} or add ${n.pinion.word} profile shift.`,
    });
  }
  if (!internal && E >= g.lineOfAction) {
    out.push({
      code: 'geometry.interference-wheel-base',
      severity: 'error',
      field: `${n.pinion.field}.tipDiameter_mm`,
      message: `The ${n.pinion.word} tip reaches past T2 (T1E = ${mm(E)} ≥ T1T2 = ${mm(g.lineOfAction)}): it would cut into the ${n.wheel.word} below its base circle.`,
    });
  }
  if (g.totalContactRatio < 1) {
    out.push({
      code: 'geometry.contact-ratio-below-one',
      severity: 'error',
      field: n.pair,
      message: `Total contact ratio εγ = εα + εβ = ${g.totalContactRatio.toFixed(3)} < 1: contact is not continuous, the pair cannot run smoothly. Increase the tip diameters, the tooth counts, the face width or the helix angle.`,
    });
  } else if (g.transverseContactRatio < 1) {
    out.push({
      code: 'geometry.transverse-contact-ratio-below-one',
      severity: 'warning',
      field: n.pair,
      message: `Transverse contact ratio εα = ${g.transverseContactRatio.toFixed(3)} < 1 (short tips): contact stays continuous through the overlap (εγ = ${g.totalContactRatio.toFixed(3)}), but each transverse section is in single-pair contact; check the tip diameters.`,
    });
  }
  if (internal && g.z2 - g.z1 < MIN_INTERNAL_TOOTH_DIFFERENCE) {
    out.push({
      code: 'geometry.internal-tip-interference',
      severity: 'warning',
      field: `${n.wheel.field}.teeth`,
      message: `The ${n.wheel.word} has only ${g.z2 - g.z1} teeth more than the ${n.pinion.word} (fewer than ${MIN_INTERNAL_TOOTH_DIFFERENCE}, common practice): the tips may foul outside the path of contact. Check tip interference with the cutter and the assembly.`,
    });
  }
  out.push(...undercutCheck(g, 'pinion'), ...tipThicknessCheck(g, 'pinion'));
  if (!internal) out.push(...undercutCheck(g, 'wheel'));
  out.push(...tipThicknessCheck(g, 'wheel'));
  out.push(...clearanceChecks(g));
  return out;
}

function sideValues(g: GearPairGeometry, side: Side) {
  return side === 'pinion'
    ? { z: g.z1, x: g.x1, d: g.referenceDiameter1, db: g.baseDiameter1, da: g.tipDiameter1, name: g.names.pinion }
    : { z: g.z2, x: g.x2, d: g.referenceDiameter2, db: g.baseDiameter2, da: g.tipDiameter2, name: g.names.wheel };
}

/**
 * Undercut: for αn = 20° the practical limit x ≥ (14 − zn)/17 (common practice); for other
 * angles the theoretical limit x ≥ haP* − (zn/2) sin² αn (ISO 21771 [memory]); zn = z/(cos²βb cos β).
 */
function undercutCheck(g: GearPairGeometry, side: Side): EngineWarning[] {
  const { z, x, name } = sideValues(g, side);
  const zn = z / (Math.cos(g.baseHelixAngle) ** 2 * Math.cos(g.helixAngle));
  const is20 = Math.abs(g.normalPressureAngle - (20 * Math.PI) / 180) < 1e-9;
  const xMin = is20 ? (14 - zn) / 17 : 1 - (zn / 2) * Math.sin(g.normalPressureAngle) ** 2;
  if (x >= xMin - 1e-9) return [];
  return [
    {
      code: `geometry.undercut-${side}`,
      severity: 'warning',
      field: `${name.field}.profileShift`,
      message: `The ${name.word} may be undercut: x = ${x.toFixed(3)} is below the limit ${xMin.toFixed(3)} for zn = ${zn.toFixed(1)} (${is20 ? '(14 − zn)/17, common practice' : 'haP* − zn sin²αn/2'}).`,
    },
  ];
}

/**
 * Normal tooth thickness at the tip, san = da (st/d + inv αt − inv αat) cos βa (ISO 21771).
 * For a ring the space width e = π mt − st is the "external" shape: the tooth at the inner (tip)
 * circle is sat = π da/z − da (e/d + inv αt − inv αat).
 */
export function normalTipThickness(g: GearPairGeometry, side: Side): number {
  const { z, x, d, db, da } = sideValues(g, side);
  const mt = g.normalModule / Math.cos(g.helixAngle);
  const st = mt * (Math.PI / 2 + 2 * x * Math.tan(g.normalPressureAngle));
  const aat = Math.acos(db / da) as Radians;
  const ring = side === 'wheel' && g.kind === 'internal';
  const sat = ring ? (Math.PI * da) / z - da * ((Math.PI * mt - st) / d + involute(g.transversePressureAngle) - involute(aat)) : da * (st / d + involute(g.transversePressureAngle) - involute(aat));
  const betaA = Math.atan((Math.tan(g.helixAngle) * da) / d);
  return sat * Math.cos(betaA);
}

function tipThicknessCheck(g: GearPairGeometry, side: Side): EngineWarning[] {
  const san = normalTipThickness(g, side);
  const limit = MIN_TIP_THICKNESS_PER_MODULE * g.normalModule;
  const { name, da } = sideValues(g, side);
  const field = `${name.field}.tipDiameter_mm`;
  const what = side === 'wheel' && g.kind === 'internal' ? 'inner (tip) diameter' : 'tip diameter';
  if (san <= 0) {
    return [
      {
        code: `geometry.tip-diameter-impossible-${side}`,
        severity: 'error',
        field,
        message: `The ${name.word} ${what} ${(da * 1e3).toFixed(3)} mm is beyond what the geometry allows: the flanks meet before it (tip thickness ${(san * 1e3).toFixed(3)} mm). Change the ${what} or the profile shift.`,
      },
    ];
  }
  if (san < limit) {
    return [
      {
        code: `geometry.pointed-tip-${side}`,
        severity: 'warning',
        field,
        message: `The ${name.word} tip is nearly pointed: normal tip thickness ${(san * 1e3).toFixed(3)} mm < 0.2 mn = ${(limit * 1e3).toFixed(3)} mm (common practice).`,
      },
    ];
  }
  return [];
}

/**
 * Tip-to-root clearance against the mating root circle, with roots from the ISO 53 rack
 * (hfP* = 1.25). External: c = a − ra − rf(mate). Internal: the pinion tip against the ring root
 * rf2 = r2 + mn (hfP* − x2), c = rf2 − a − ra1; the ring tip against the pinion root, c = ra2 − a − rf1.
 */
function clearanceChecks(g: GearPairGeometry): EngineWarning[] {
  const out: EngineWarning[] = [];
  const internal = g.kind === 'internal';
  const mn = g.normalModule;
  const rf1 = g.referenceDiameter1 / 2 - mn * (DEDENDUM_COEFFICIENT - g.x1);
  const rf2 = internal ? g.referenceDiameter2 / 2 + mn * (DEDENDUM_COEFFICIENT - g.x2) : g.referenceDiameter2 / 2 - mn * (DEDENDUM_COEFFICIENT - g.x2);
  const a = g.centerDistance;
  const pairs: Array<[Side, number]> = internal
    ? [
        ['pinion', rf2 - a - g.tipDiameter1 / 2],
        ['wheel', g.tipDiameter2 / 2 - a - rf1],
      ]
    : [
        ['pinion', a - g.tipDiameter1 / 2 - rf2],
        ['wheel', a - g.tipDiameter2 / 2 - rf1],
      ];
  for (const [side, c] of pairs) {
    if (c < 0) {
      const { name } = sideValues(g, side);
      out.push({
        code: `geometry.tip-root-clearance-${side}`,
        severity: 'warning',
        field: `${name.field}.tipDiameter_mm`,
        message: `The ${name.word} tip would reach ${(-c * 1e3).toFixed(3)} mm into the mating root circle (root from an ISO 53 rack, hfP* = 1.25): check the tip diameter against the real root.`,
      });
    }
  }
  return out;
}

import { ColumnBlock } from '../columnBlock';
import type { GearPairGeometry } from '../geometry/types';
import { requirePathPoints, samplePath } from '../kinematics/pathSampling';
import { emptyFlankVelocities, flankVelocities } from '../kinematics/flankVelocities';
import { loadShare } from '../load/loadSharing';
import { toothForces, type ToothForces } from '../load/toothForces';
import { conformalReducedRadius, contactModulus, hertzLinePressure, hertzSemiWidth, reducedRadius } from '../stress/hertz';
import { nominalContactStress, type NominalContactStress } from '../stress/iso6336Nominal';
import type { Material } from '../materials';
import type { EngineDuty } from './types';
import type { Metres, MetresPerSecond, NewtonsPerMetre, Pascals, RadiansPerSecond } from '../units';

/** What the mechanics need of a load case (see EngineDuty). */
export type MeshDuty = Pick<EngineDuty, 'pinionSpeed' | 'pinionTorque' | 'applicationFactor' | 'dynamicFactor' | 'faceLoadFactor' | 'transverseLoadFactor'>;

/** Everything along the path that follows from geometry, materials and load alone (struct of arrays, SI). */
export interface MeshMechanics {
  readonly n: number;
  /** Position from T1, m. */
  readonly position: Float64Array;
  /** XΓ */
  readonly loadShare: Float64Array;
  /** Normal load per unit contact-line length w = XΓ KA Kv KHβ KHα Fbt/b, N/m. */
  readonly lineLoad: Float64Array;
  /** Reduced radius of curvature in the normal plane, m. */
  readonly reducedRadius: Float64Array;
  readonly hertzPressure: Float64Array;
  /** Hertz semi-width bH, m. */
  readonly hertzSemiWidth: Float64Array;
  readonly v1: Float64Array;
  readonly v2: Float64Array;
  readonly sumVelocity: Float64Array;
  readonly slidingVelocity: Float64Array;
  readonly slideToRoll: Float64Array;
  readonly specificSliding1: Float64Array;
  readonly specificSliding2: Float64Array;
  readonly contactModulus: Pascals;
  readonly forces: ToothForces;
  readonly pinionAngularSpeed: RadiansPerSecond;
  readonly wheelAngularSpeed: RadiansPerSecond;
  /** On the working circle dw1. */
  readonly pitchLineVelocity: MetresPerSecond;
  /** Index of the pitch point C in the arrays. */
  readonly pitchIndex: number;
  /** Transverse unit load wBt = KA Kv KHβ KHα Fbt/b (no sharing), N/m. */
  readonly unitLoad: NewtonsPerMetre;
  /** Hertz pressure at C with the whole normal load wBt on one pair (the load-stage-table figure). */
  readonly pitchHertzWholeLoad: Pascals;
  readonly nominal: NominalContactStress;
}

/**
 * Reduced radius in the normal plane at s from T1: ρn = ρ/cos βb, with ρ1 = s and ρ2 = T1T2 − s
 * (external, convex–convex) or ρ2 = s + T1T2 (internal, conformal: ρred = ρ1 ρ2/(ρ2 − ρ1)).
 */
export function normalReducedRadius(g: GearPairGeometry, s: number, cosBb: number = Math.cos(g.baseHelixAngle)): Metres {
  return g.kind === 'internal'
    ? conformalReducedRadius((s / cosBb) as Metres, ((s + g.lineOfAction) / cosBb) as Metres)
    : reducedRadius((s / cosBb) as Metres, ((g.lineOfAction - s) / cosBb) as Metres);
}

/**
 * Kinematics, load sharing and Hertz stress at `n` points along A…E (ISO 21771 geometry,
 * ISO/TS 6336-20 load sharing, Hertz line contact in the normal plane, ρn = ρ/cos βb), for an
 * external or an internal pair.
 */
export function meshMechanics(g: GearPairGeometry, pinion: Material, wheel: Material, duty: MeshDuty, n: number): MeshMechanics {
  // The positions and the twelve columns that follow from them, from one buffer.
  const block = new ColumnBlock(requirePathPoints(n), 13);
  const position = samplePath(g.points, n, block.float64());
  const arrays = () => block.float64();
  const xg = arrays(), w = arrays(), rr = arrays(), pH = arrays(), bH = arrays();
  const v1 = arrays(), v2 = arrays(), vs = arrays(), vg = arrays(), srr = arrays(), z1 = arrays(), z2 = arrays();
  const eStar = contactModulus(pinion.youngsModulus, pinion.poissonRatio, wheel.youngsModulus, wheel.poissonRatio);
  const forces = toothForces(duty.pinionTorque, g.referenceDiameter1, g.transversePressureAngle, g.faceWidth);
  const omega1 = duty.pinionSpeed;
  const omega2 = (omega1 / g.u) as RadiansPerSecond;
  const cosBb = Math.cos(g.baseHelixAngle);
  const internal = g.kind === 'internal';
  // One load along the whole path (stress, film, flash): KA Kv KHβ KHα Fbt/b, as ISO/TS 6336-20 loads
  // its flash temperature; with Kv = KHβ = KHα = 1 (the defaults) this is METHODS' KA Fbt/b.
  const nominalLoad = forces.lineLoad * duty.applicationFactor * duty.dynamicFactor * duty.faceLoadFactor * duty.transverseLoadFactor;
  const fv = emptyFlankVelocities();
  let pitchIndex = 0;
  for (let i = 0; i < position.length; i++) {
    const s = position[i] as Metres;
    if (s === g.points.C) pitchIndex = i;
    const share = loadShare(s, g.points, g.transverseContactRatio, g.overlapRatio);
    const load = (share * nominalLoad) as NewtonsPerMetre;
    const rho = normalReducedRadius(g, s, cosBb);
    xg[i] = share;
    w[i] = load;
    rr[i] = rho;
    pH[i] = hertzLinePressure(load, rho, eStar);
    bH[i] = hertzSemiWidth(load, rho, eStar);
    flankVelocities(s, g.lineOfAction, omega1, omega2, fv, internal);
    v1[i] = fv.v1;
    v2[i] = fv.v2;
    vs[i] = fv.sum;
    vg[i] = fv.sliding;
    srr[i] = fv.slideToRoll;
    z1[i] = fv.specificSliding1;
    z2[i] = fv.specificSliding2;
  }
  const rhoC = normalReducedRadius(g, g.points.C, cosBb);
  const nominal = nominalContactStress(g, forces.tangential, eStar, {
    kA: duty.applicationFactor,
    kv: duty.dynamicFactor,
    kHbeta: duty.faceLoadFactor,
    kHalpha: duty.transverseLoadFactor,
  });
  return {
    n: position.length,
    position,
    loadShare: xg,
    lineLoad: w,
    reducedRadius: rr,
    hertzPressure: pH,
    hertzSemiWidth: bH,
    v1,
    v2,
    sumVelocity: vs,
    slidingVelocity: vg,
    slideToRoll: srr,
    specificSliding1: z1,
    specificSliding2: z2,
    contactModulus: eStar,
    forces,
    pinionAngularSpeed: omega1,
    wheelAngularSpeed: omega2,
    pitchLineVelocity: ((omega1 * g.workingDiameter1) / 2) as MetresPerSecond,
    pitchIndex,
    unitLoad: nominalLoad as NewtonsPerMetre,
    pitchHertzWholeLoad: hertzLinePressure(nominalLoad as NewtonsPerMetre, rhoC, eStar),
    nominal,
  };
}

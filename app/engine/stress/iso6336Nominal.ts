import type { Pascals } from '../units';
import type { GearPairGeometry } from '../geometry/types';
import type { Newtons } from '../units';

/** Zone factor ZH = √(2 cos βb cos αwt/(cos² αt sin αwt)) (ISO 6336-2, eq. for ZH). 2.495 for 20° spur, x = 0. */
export function zoneFactor(g: GearPairGeometry): number {
  const at = g.transversePressureAngle;
  const awt = g.workingPressureAngle;
  return Math.sqrt((2 * Math.cos(g.baseHelixAngle) * Math.cos(awt)) / (Math.cos(at) ** 2 * Math.sin(awt)));
}

/** Elasticity factor ZE = √(E* / π), in √Pa (ISO 6336-2). 189.8 √(N/mm²) for steel on steel. */
export function elasticityFactor(eStar: Pascals): number {
  return Math.sqrt(eStar / Math.PI);
}

/**
 * Contact-ratio factor Zε (ISO 6336-2 [memory] for the helical forms):
 * spur √((4 − εα)/3); εβ < 1: √((4 − εα)/3 · (1 − εβ) + εβ/εα); εβ ≥ 1: √(1/εα).
 */
export function contactRatioFactor(epsAlpha: number, epsBeta: number): number {
  if (epsBeta >= 1) return Math.sqrt(1 / epsAlpha);
  return Math.sqrt(((4 - epsAlpha) / 3) * (1 - epsBeta) + epsBeta / epsAlpha);
}

/** The edition whose Zβ the nominal stress uses, to print beside σH. */
export const NOMINAL_STRESS_EDITION = 'ISO 6336-2:2019, Zβ = 1/√cos β';

/**
 * Helix-angle factor Zβ = 1/√(cos β) (ISO 6336-2:2006 and :2019 [memory]). The 1996 edition (and
 * DIN 3990) had √(cos β), which makes σH0 of a helical pair lower by the factor cos β (4.9 % at
 * 18°, 13.4 % at 30°): not conservative.
 */
export function helixAngleFactor(g: GearPairGeometry): number {
  return 1 / Math.sqrt(Math.cos(g.helixAngle));
}

export interface NominalContactStressFactors {
  /** Dynamic factor Kv; not computed here, input (default 1). */
  readonly kv: number;
  /** Face load factor KHβ; input (default 1). */
  readonly kHbeta: number;
  /** Transverse load factor KHα; input (default 1). */
  readonly kHalpha: number;
  /** Application factor KA. */
  readonly kA: number;
}

export interface NominalContactStress {
  readonly zH: number;
  readonly zE: number;
  readonly zEpsilon: number;
  readonly zBeta: number;
  /** σH0 = ZH ZE Zε Zβ √(Ft (u+1)/(d1 b u)) */
  readonly sigmaH0: Pascals;
  /** σH = σH0 √(KA Kv KHβ KHα) (pinion/wheel single-contact factors ZB, ZD not applied). */
  readonly sigmaH: Pascals;
}

/**
 * Nominal contact stress at the pitch point by ISO 6336-2 (method B form, ZB = ZD = 1). For an
 * internal pair ISO 6336 takes u negative [memory], so (u + 1)/u becomes (|u| − 1)/|u|.
 */
export function nominalContactStress(g: GearPairGeometry, ft: Newtons, eStar: Pascals, k: NominalContactStressFactors): NominalContactStress {
  const zH = zoneFactor(g);
  const zE = elasticityFactor(eStar);
  const zEpsilon = contactRatioFactor(g.transverseContactRatio, g.overlapRatio);
  const zBeta = helixAngleFactor(g);
  const uSum = g.kind === 'internal' ? g.u - 1 : g.u + 1;
  const sigmaH0 = zH * zE * zEpsilon * zBeta * Math.sqrt((ft * uSum) / (g.referenceDiameter1 * g.faceWidth * g.u));
  const sigmaH = sigmaH0 * Math.sqrt(k.kA * k.kv * k.kHbeta * k.kHalpha);
  return { zH, zE, zEpsilon, zBeta, sigmaH0: sigmaH0 as Pascals, sigmaH: sigmaH as Pascals };
}

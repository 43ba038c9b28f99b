import type { WarningSink } from '../diagnostics';
import { blokFlashTemperature } from '../heat/blokFlash';
import { integralContactRatioFactor } from '../heat/contactRatioFactor';
import { FZG_A_PINION_TORQUE, integralScuffingSafety, integralScuffingTemperature, integralTemperature } from '../heat/integralTemperature';
import { scuffingProbability } from '../heat/scuffingProbability';
import { scuffingSafety, scuffingTemperature } from '../heat/scuffingTemperature';
import { materialContactCoefficient } from '../materials';
import { hertzSemiWidth } from '../stress/hertz';
import type { Kelvin, KelvinDifference, Metres, MetresPerSecond, NewtonMetres, NewtonsPerMetre } from '../units';
import type { MeshMechanics } from './mechanics';
import type { TemperaturesAlongPath } from './temperatures';
import type { CaseInput } from './types';

/** An FZG A/8.3/90 failure stage 1…12, or beyond the scale. */
export type FzgStageNeed = number | '>12';

export interface ScuffingAssessment {
  /** Structural factor XW used (the lower of pinion and wheel, the conservative side). */
  readonly structuralFactor: number;
  readonly scuffingTemperature: Kelvin;
  readonly scuffingTemperatureAtLeast: boolean;
  /** SB = (θS − θoil)/(θB,max − θoil); null when undefined (no temperature rise). */
  readonly safety: number | null;
  /** Smallest FZG stage S with SB(S) ≥ SB,min for this oil's film and friction, or '>12'. */
  readonly requiredStage: FzgStageNeed;
  /** The same by the integral temperature method (SintS ≥ SintS,min). */
  readonly requiredStageIntegral: FzgStageNeed;
  readonly probability: number;
  readonly integralTemperature: Kelvin;
  readonly integralScuffingTemperature: Kelvin;
  readonly integralSafety: number | null;
  /** SintS with an oil at the policy's EP floor stage (for the beyond-oil rule). */
  readonly integralSafetyAtEpFloor: number | null;
  readonly flashAtTipFullLoad: KelvinDifference;
  readonly contactRatioFactor: number;
}

const stageOf = (s: number | '>12'): number => (s === '>12' ? 12 : s);

/**
 * Scuffing by the flash temperature method (ISO/TS 6336-20) and the integral temperature method
 * (ISO/TS 6336-21), from the oil's FZG A/8.3/90 failure stage; and the stage the duty needs.
 */
export function scuffingAssessment(input: CaseInput, m: MeshMechanics, heat: TemperaturesAlongPath, sink: WarningSink): ScuffingAssessment {
  const oil = input.oil as NonNullable<CaseInput['oil']>;
  const { policy } = input;
  const xW = Math.min(input.pinion.structuralFactorXW, input.wheel.structuralFactorXW);
  const xL = oil.model.lubricantFactor;
  const tOil = input.duty.oilTemperature;
  const thetaS = scuffingTemperature(oil.fzgFailureStage, xW, xL);
  const sb = scuffingSafety(thetaS.value, tOil, heat.contactMax, sink);
  const sbAt = (stage: number) => scuffingSafety(scuffingTemperature(stage, xW, xL).value, tOil, heat.contactMax).value;
  const requiredStage = smallestStage((s) => {
    const v = sbAt(s);
    return v === null || v >= policy.scuffingSafetyMin;
  });

  // Integral method: flash at the pinion tip E with the whole unit load, weighted by Xε.
  const g = input.geometry;
  const last = m.n - 1;
  const fullLoad = (m.unitLoad * heat.helicalLoadFactor) as NewtonsPerMetre;
  const bHE = hertzSemiWidth(fullLoad, m.reducedRadius[last] as Metres, m.contactModulus);
  const blokE = blokFlashTemperature(heat.friction, fullLoad, m.v1[last] as MetresPerSecond, m.v2[last] as MetresPerSecond, materialContactCoefficient(input.pinion), materialContactCoefficient(input.wheel), bHE);
  const flashE = blokE;
  const eps1 = (g.points.E - g.points.C) / g.transverseBasePitch;
  const eps2 = Math.max(0, (g.points.C - g.points.A) / g.transverseBasePitch);
  const xEps = integralContactRatioFactor(eps1, eps2);
  const integral = integralTemperature(tOil, flashE, xEps, input.duty.pinionMeshes);
  const intS = (stage: number) => integralScuffingTemperature(FZG_A_PINION_TORQUE[stage - 1] as NewtonMetres, xL, xW);
  const thetaIntS = intS(stageOf(oil.fzgFailureStage));
  const sInt = integralScuffingSafety(thetaIntS, integral.integral, sink);
  const sIntAt = (stage: number) => integralScuffingSafety(intS(stage), integral.integral).value;
  const requiredStageIntegral = smallestStage((s) => {
    const v = sIntAt(s);
    return v === null || v >= policy.integralSafetyMin;
  });

  return {
    structuralFactor: xW,
    scuffingTemperature: thetaS.value,
    scuffingTemperatureAtLeast: thetaS.atLeast,
    safety: sb.value,
    requiredStage,
    requiredStageIntegral,
    probability: scuffingProbability(heat.contactMax, thetaS.value, policy.scuffingTemperatureSpread),
    integralTemperature: integral.integral,
    integralScuffingTemperature: thetaIntS,
    integralSafety: sInt.value,
    integralSafetyAtEpFloor: sIntAt(policy.epOilFzgStage),
    flashAtTipFullLoad: flashE,
    contactRatioFactor: xEps,
  };
}

/** The smallest stage 1…12 that passes (safety rises with the stage), else '>12'. */
function smallestStage(passes: (stage: number) => boolean): FzgStageNeed {
  for (let s = 1; s <= 12; s++) if (passes(s)) return s;
  return '>12';
}

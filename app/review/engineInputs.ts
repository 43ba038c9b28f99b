import type { EngineDuty, EnginePolicy } from '../engine/mesh/types';
import { celsiusToKelvin, rpmToRadiansPerSecond } from '../engine/units';
import type { PairReview, Policy } from './schema';
import { pinionTorqueOf } from './toEngine';

export function enginePolicyOf(p: Policy): EnginePolicy {
  return {
    pathPoints: p.pathPoints,
    thermalFilmCorrection: p.thermalFilmCorrection,
    filmFormula: p.filmFormula,
    regime: { boundaryBelow: p.boundaryBelowLambda, fullFilmFrom: p.fullFilmFromLambda },
    lambdaTarget: p.lambdaTarget,
    scuffingSafetyMin: p.scuffingSafetyMin,
    integralSafetyMin: p.integralSafetyMin,
    antiWearOilFzgStage: p.antiWearOilFzgStage,
    epOilFzgStage: p.epOilFzgStage,
    frictionCoefficient: p.frictionCoefficient ?? null,
    scuffingTemperatureSpread: p.scuffingTemperatureSpread,
    shockApplicationFactor: p.shockApplicationFactor,
    scuffingMethods: p.scuffingMethods,
    micropittingSafetyMin: p.micropittingSafetyMin,
  };
}

/** Load case `index` of the review, in SI. */
export function engineDutyOf(review: PairReview, index: number): EngineDuty {
  const lc = review.loadCases[index];
  if (!lc) throw new RangeError(`no load case ${index}`);
  const gp = review.gearPair;
  return {
    name: lc.name,
    pinionSpeed: rpmToRadiansPerSecond(lc.pinionSpeed_rpm),
    pinionTorque: pinionTorqueOf(lc),
    applicationFactor: lc.applicationFactor,
    dynamicFactor: gp.dynamicFactorKv,
    faceLoadFactor: gp.faceLoadFactorKHbeta,
    transverseLoadFactor: gp.transverseLoadFactorKHalpha,
    oilTemperature: celsiusToKelvin(lc.oilTemperature_C),
    lubrication: lc.lubrication,
    pinionMeshes: gp.pinionMeshes,
    timeShare: lc.timeShare,
  };
}

import { DEFAULT_PAIR_NAMES, type GearPairInput, type PairNames } from '../engine/geometry/types';
import { MATERIALS, type Material } from '../engine/materials';
import { degreesToRadians, millimetres, rpmToRadiansPerSecond, type NewtonMetres, type Watts } from '../engine/units';
import type { GearPair } from './schema';

type MaterialEntry = GearPair['pinion']['material'];

/** A material preset name or a custom material, in SI. */
export function materialOf(m: MaterialEntry): Material {
  if (typeof m === 'string') return MATERIALS[m];
  return {
    youngsModulus: (m.youngsModulus_GPa * 1e9) as Material['youngsModulus'],
    poissonRatio: m.poissonRatio,
    thermalConductivity: m.thermalConductivity_WmK as Material['thermalConductivity'],
    density: m.density_kgm3 as Material['density'],
    specificHeat: m.specificHeat_JkgK as Material['specificHeat'],
    structuralFactorXW: m.structuralFactorXW,
    ...(m.micropittingFactorWW !== undefined ? { micropittingFactorWW: m.micropittingFactorWW } : {}),
  };
}

/** The review's gear pair (mm, degrees) as the engine's SI input. */
const INTERNAL_PAIR_NAMES: PairNames = { ...DEFAULT_PAIR_NAMES, wheel: { field: 'gearPair.wheel', word: 'ring' } };

export function gearPairInput(gp: GearPair): GearPairInput {
  const gear = (x: GearPair['pinion']) => ({
    teeth: x.teeth,
    ...(x.profileShift !== undefined ? { profileShift: x.profileShift } : {}),
    ...(x.tipDiameter_mm !== undefined ? { tipDiameter: millimetres(x.tipDiameter_mm) } : {}),
  });
  return {
    kind: gp.kind ?? 'external',
    // The wheel of an internal pair is a ring, and the sheet calls it so: the checks' messages do too.
    ...(gp.kind === 'internal' ? { names: INTERNAL_PAIR_NAMES } : {}),
    normalModule: millimetres(gp.normalModule_mm),
    normalPressureAngle: degreesToRadians(gp.normalPressureAngle_deg),
    helixAngle: degreesToRadians(gp.helixAngle_deg),
    faceWidth: millimetres(gp.faceWidth_mm),
    ...(gp.centerDistance_mm !== undefined ? { centerDistance: millimetres(gp.centerDistance_mm) } : {}),
    pinion: gear(gp.pinion),
    wheel: gear(gp.wheel),
  };
}

/** Pinion torque of a load case, from the torque or from the power, T1 = P/ω1. */
export function pinionTorqueOf(c: { pinionTorque_Nm?: number | undefined; power_kW?: number | undefined; pinionSpeed_rpm: number }): NewtonMetres {
  if (c.pinionTorque_Nm !== undefined) return c.pinionTorque_Nm as NewtonMetres;
  const power = ((c.power_kW ?? 0) * 1e3) as Watts;
  return (power / rpmToRadiansPerSecond(c.pinionSpeed_rpm)) as NewtonMetres;
}

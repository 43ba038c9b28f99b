import { EngineInputError } from '../diagnostics';
import type { EngineDuty } from '../mesh/types';
import type { NewtonMetres, RadiansPerSecond, Watts } from '../units';
import type { PlanetaryDuty, PlanetaryMeshName, PlanetaryStage, StageSpeeds } from './types';
import { stageSpeeds } from './willis';

export interface PlanetaryMeshDuties {
  readonly speeds: StageSpeeds;
  readonly 'sun-planet': EngineDuty;
  readonly 'planet-ring': EngineDuty;
}

/**
 * Each mesh of the stage as a pair in the carrier frame (METHODS.md, planetary stages [memory]):
 *  - sun–planet: the sun is the pinion at |nS − nC|, torque T_sun Kγ/planets; the sun meshes with
 *    every planet, so n_p = planets in Xmp = (1 + n_p)/2;
 *  - planet–ring: the planet is the pinion at |nP − nC| = |nS − nC| zS/zP with the same force on
 *    the line of action, so its torque is T_sun Kγ zP/(zS planets) (rb ∝ z at one module); a planet
 *    meshes with two members, n_p = 2.
 * The rest of the duty (KA, Kv, KHβ, KHα, oil, lubrication, time share) is the stage's.
 */
export function planetaryMeshDuties(stage: PlanetaryStage, duty: PlanetaryDuty): PlanetaryMeshDuties {
  const { zS, zP, zR } = stage;
  const { planets, meshLoadFactor, held } = stage.input;
  const speeds = stageSpeeds(zS, zP, zR, held, duty.inputSpeed);
  const { inputSpeed: _i, sunTorque, ...rest } = duty;
  if (!(sunTorque > 0) || !Number.isFinite(sunTorque)) {
    throw new EngineInputError('input.not-positive', 'loadCases[].sunTorque_Nm', '> 0 N·m', 'The sun torque must be greater than 0.');
  }
  const perMesh = (sunTorque * meshLoadFactor) / planets;
  return {
    speeds,
    'sun-planet': { ...rest, pinionSpeed: Math.abs(speeds.sunRelative) as RadiansPerSecond, pinionTorque: perMesh as NewtonMetres, pinionMeshes: planets },
    'planet-ring': { ...rest, pinionSpeed: Math.abs(speeds.planetRelative) as RadiansPerSecond, pinionTorque: ((perMesh * zP) / zS) as NewtonMetres, pinionMeshes: 2 },
  };
}

/**
 * The sun torque that transmits `power` through the stage: the power enters at the driving member,
 * so T_sun = P/ωS when the sun drives, and T_sun = P/((1 + zR/zS) ωC) when the sun is held and
 * the carrier drives (T_carrier = −T_sun (1 + zR/zS), from the torque balance).
 */
export function sunTorqueFromPower(stage: PlanetaryStage, power: Watts, inputSpeed: RadiansPerSecond): NewtonMetres {
  const factor = stage.input.held === 'sun' ? 1 + stage.zR / stage.zS : 1;
  return (power / (factor * inputSpeed)) as NewtonMetres;
}

export const PLANETARY_MESHES: readonly PlanetaryMeshName[] = ['sun-planet', 'planet-ring'];

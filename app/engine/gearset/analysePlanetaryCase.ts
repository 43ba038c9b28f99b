import type { Material } from '../materials';
import { analyseCase, type CaseAnalysis } from '../mesh/analyseCase';
import type { EngineOil, EnginePolicy } from '../mesh/types';
import type { Metres } from '../units';
import { planetaryMeshDuties, type PlanetaryMeshDuties } from './meshDuties';
import type { PlanetaryDuty, PlanetaryMeshName, PlanetaryStage } from './types';

export interface PlanetaryMember {
  readonly material: Material;
  readonly roughnessRa: Metres;
}

export interface PlanetaryCaseInput {
  readonly stage: PlanetaryStage;
  readonly sun: PlanetaryMember;
  readonly planet: PlanetaryMember;
  readonly ring: PlanetaryMember;
  readonly duty: PlanetaryDuty;
  readonly oil: EngineOil | null;
  readonly policy: EnginePolicy;
  readonly caseField: string;
}

export interface PlanetaryCaseAnalysis {
  readonly duties: PlanetaryMeshDuties;
  readonly meshes: Readonly<Record<PlanetaryMeshName, CaseAnalysis>>;
}

/**
 * One load case of a planetary stage with one oil: each mesh analysed by mesh/analyseCase as a
 * pair in the carrier frame (see meshDuties.ts). mesh/ knows nothing of planets.
 */
export function analysePlanetaryCase(input: PlanetaryCaseInput): PlanetaryCaseAnalysis {
  const duties = planetaryMeshDuties(input.stage, input.duty);
  const common = { oil: input.oil, policy: input.policy, caseField: input.caseField };
  return {
    duties,
    meshes: {
      'sun-planet': analyseCase({ ...common, geometry: input.stage.sunPlanet, pinion: input.sun.material, wheel: input.planet.material, roughnessRa1: input.sun.roughnessRa, roughnessRa2: input.planet.roughnessRa, duty: duties['sun-planet'] }),
      'planet-ring': analyseCase({ ...common, geometry: input.stage.planetRing, pinion: input.planet.material, wheel: input.ring.material, roughnessRa1: input.planet.roughnessRa, roughnessRa2: input.ring.roughnessRa, duty: duties['planet-ring'] }),
    },
  };
}

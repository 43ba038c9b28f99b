import { planetaryMeshDuties, PLANETARY_MESHES, sunTorqueFromPower, type PlanetaryMeshDuties } from '../../engine/gearset/meshDuties';
import { planetaryStage } from '../../engine/gearset/planetaryStage';
import type { PlanetaryDuty, PlanetaryMeshName, PlanetaryStage, PlanetaryStageInput } from '../../engine/gearset/types';
import type { GearInput, GearPairGeometry } from '../../engine/geometry/types';
import { celsiusToKelvin, degreesToRadians, millimetres, rpmToRadiansPerSecond, type Watts } from '../../engine/units';
import type { GearPair, LoadCase, PairLoadCase, PairReview, Planetary, Review } from '../schema';

export type PlanetaryReview = Review & { planetary: Planetary };

/** One mesh of the stage as a gear pair review, ready for the per-pair pipeline. */
export interface MeshReview {
  readonly mesh: PlanetaryMeshName;
  readonly review: PairReview;
  readonly geometry: GearPairGeometry;
}

export interface PlanetaryMeshReviews {
  readonly stage: PlanetaryStage;
  readonly duties: readonly PlanetaryMeshDuties[];
  readonly meshes: readonly MeshReview[];
}

type Member = Planetary['sun'];

const gearInput = (m: Member): GearInput => ({
  teeth: m.teeth,
  ...(m.profileShift !== undefined ? { profileShift: m.profileShift } : {}),
  ...(m.tipDiameter_mm !== undefined ? { tipDiameter: millimetres(m.tipDiameter_mm) } : {}),
});

/** The review's stage (mm, degrees) as the engine's SI input. */
export function planetaryStageInput(p: Planetary): PlanetaryStageInput {
  return {
    normalModule: millimetres(p.normalModule_mm),
    normalPressureAngle: degreesToRadians(p.normalPressureAngle_deg),
    helixAngle: degreesToRadians(p.helixAngle_deg),
    faceWidth: millimetres(p.faceWidth_mm),
    planets: p.planets,
    meshLoadFactor: p.meshLoadFactorKgamma,
    held: p.held,
    sun: gearInput(p.sun),
    planet: gearInput(p.planet),
    ring: gearInput(p.ring),
  };
}

/** Load case `index` of a planetary review, in SI. */
export function planetaryDutyOf(review: PlanetaryReview, stage: PlanetaryStage, index: number): PlanetaryDuty {
  const lc = review.loadCases[index] as LoadCase;
  const p = review.planetary;
  // The schema guarantees the input speed of the held member's kind and one of torque or power.
  const inputSpeed = rpmToRadiansPerSecond((p.held === 'sun' ? lc.carrierSpeed_rpm : lc.sunSpeed_rpm) ?? 0);
  const sunTorque = lc.sunTorque_Nm !== undefined ? lc.sunTorque_Nm : sunTorqueFromPower(stage, ((lc.power_kW ?? 0) * 1e3) as Watts, inputSpeed);
  return {
    name: lc.name,
    inputSpeed,
    sunTorque: sunTorque as PlanetaryDuty['sunTorque'],
    applicationFactor: lc.applicationFactor,
    dynamicFactor: p.dynamicFactorKv,
    faceLoadFactor: p.faceLoadFactorKHbeta,
    transverseLoadFactor: p.transverseLoadFactorKHalpha,
    oilTemperature: celsiusToKelvin(lc.oilTemperature_C),
    lubrication: lc.lubrication,
    timeShare: lc.timeShare,
  };
}

const rpm = (w: number) => (w * 60) / (2 * Math.PI);

/**
 * Each mesh of a planetary review as a gear pair review in the carrier frame: the pinion (sun, or
 * planet on the ring) at its speed relative to the carrier, with the mesh torque the engine gives
 * (engine/gearset/meshDuties.ts), and the stage's geometry for that mesh. The pair pipeline then
 * runs unchanged; its `pinionSpeed_rpm` and `pinionTorque_Nm` are the mesh's, in the carrier frame.
 */
export function planetaryMeshReviews(review: PlanetaryReview): PlanetaryMeshReviews {
  const p = review.planetary;
  const stage = planetaryStage(planetaryStageInput(p));
  const duties = review.loadCases.map((_, i) => planetaryMeshDuties(stage, planetaryDutyOf(review, stage, i)));
  const members: Record<PlanetaryMeshName, [Member, Member, GearPairGeometry]> = {
    'sun-planet': [p.sun, p.planet, stage.sunPlanet],
    'planet-ring': [p.planet, p.ring, stage.planetRing],
  };
  const meshes = PLANETARY_MESHES.map((mesh): MeshReview => {
    const [pinion, wheel, geometry] = members[mesh];
    const first = duties[0]?.[mesh];
    const gearPair: GearPair = {
      kind: geometry.kind,
      normalModule_mm: p.normalModule_mm,
      normalPressureAngle_deg: p.normalPressureAngle_deg,
      helixAngle_deg: p.helixAngle_deg,
      faceWidth_mm: p.faceWidth_mm,
      pinion: { ...pinion, profileShift: geometry.x1 },
      wheel: { ...wheel, profileShift: geometry.x2 },
      pinionMeshes: first?.pinionMeshes ?? 1,
      components: p.components,
      dynamicFactorKv: p.dynamicFactorKv,
      faceLoadFactorKHbeta: p.faceLoadFactorKHbeta,
      transverseLoadFactorKHalpha: p.transverseLoadFactorKHalpha,
    };
    const loadCases = review.loadCases.map((lc, i): PairLoadCase => {
      const d = (duties[i] as PlanetaryMeshDuties)[mesh];
      return { name: lc.name, pinionSpeed_rpm: rpm(d.pinionSpeed), pinionTorque_Nm: d.pinionTorque, applicationFactor: lc.applicationFactor, oilTemperature_C: lc.oilTemperature_C, lubrication: lc.lubrication, timeShare: lc.timeShare };
    });
    const { planetary: _p, gearPair: _g, loadCases: _l, ...rest } = review;
    return { mesh, geometry, review: { ...rest, gearPair, loadCases } };
  });
  return { stage, duties, meshes };
}

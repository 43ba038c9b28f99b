import type { GearInput, GearPairGeometry } from '../geometry/types';
import type { EngineWarning } from '../diagnostics';
import type { EngineDuty } from '../mesh/types';
import type { Metres, NewtonMetres, Radians, RadiansPerSecond } from '../units';

/** The member held still; the other two turn. */
export type HeldMember = 'ring' | 'carrier' | 'sun';
export type PlanetaryMeshName = 'sun-planet' | 'planet-ring';

/** A simple planetary stage: one sun, `planets` equal planets on one carrier, one ring. */
export interface PlanetaryStageInput {
  readonly normalModule: Metres;
  readonly normalPressureAngle: Radians;
  readonly helixAngle: Radians;
  readonly faceWidth: Metres;
  readonly planets: number;
  /** Mesh load factor Kγ ≥ 1: the most loaded planet's share over the equal share (ISO 6336-1). */
  readonly meshLoadFactor: number;
  readonly held: HeldMember;
  readonly sun: GearInput;
  readonly planet: GearInput;
  readonly ring: GearInput;
}

export interface PlanetaryStage {
  readonly input: PlanetaryStageInput;
  readonly zS: number;
  readonly zP: number;
  readonly zR: number;
  /** Sun (pinion) with planet (wheel), external. */
  readonly sunPlanet: GearPairGeometry;
  /** Planet (pinion) inside ring (wheel), internal. */
  readonly planetRing: GearPairGeometry;
  /** The carrier's centre distance, sun to planet (equal to planet to ring). */
  readonly centerDistance: Metres;
  /** Gap between the tip circles of neighbouring planets (Infinity for one planet). */
  readonly planetTipGap: Metres;
  readonly checks: readonly EngineWarning[];
}

/** Absolute speeds of the members and their speeds relative to the carrier (signed, one sense positive). */
export interface StageSpeeds {
  readonly sun: RadiansPerSecond;
  readonly planet: RadiansPerSecond;
  readonly ring: RadiansPerSecond;
  readonly carrier: RadiansPerSecond;
  readonly sunRelative: RadiansPerSecond;
  readonly planetRelative: RadiansPerSecond;
  readonly ringRelative: RadiansPerSecond;
  /** Speed of the driving member over the speed of the driven one (see {@link stageSpeeds}). */
  readonly ratio: number;
  readonly driving: 'sun' | 'carrier';
  readonly driven: 'carrier' | 'ring';
}

/**
 * One load case of a planetary stage, in SI. The input speed is the sun's, unless the sun is held,
 * then the carrier's. The sun torque is the torque the sun carries (driving or reaction); the mesh
 * forces follow from it alone.
 */
export interface PlanetaryDuty extends Omit<EngineDuty, 'pinionSpeed' | 'pinionTorque' | 'pinionMeshes'> {
  readonly inputSpeed: RadiansPerSecond;
  readonly sunTorque: NewtonMetres;
}

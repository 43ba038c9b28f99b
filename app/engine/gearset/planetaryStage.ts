import { EngineInputError, type EngineWarning } from '../diagnostics';
import { gearPairGeometry } from '../geometry/gearPair';
import type { GearInput, PairNames } from '../geometry/types';
import type { Metres } from '../units';
import type { PlanetaryStage, PlanetaryStageInput } from './types';

/** Review paths and words of the members, for messages. */
export const STAGE_FIELD = 'planetary';
const member = (m: 'sun' | 'planet' | 'ring') => ({ field: `${STAGE_FIELD}.${m}`, word: m });
export const SUN_PLANET_NAMES: PairNames = { pair: STAGE_FIELD, pinion: member('sun'), wheel: member('planet') };
export const PLANET_RING_NAMES: PairNames = { pair: STAGE_FIELD, pinion: member('planet'), wheel: member('ring') };

/**
 * Smallest gap between the tip circles of neighbouring planets before a practitioner objects,
 * as a multiple of the module: 0.5 mn (common practice [weak]); below 0 they collide.
 */
export const MIN_PLANET_TIP_GAP_PER_MODULE = 0.5;
/** Tolerance on the two centre distances, as in geometry/gearPair.ts: 0.5 % of the module. */
const CENTRE_DISTANCE_TOLERANCE_PER_MODULE = 0.005;

const withShift = (g: GearInput, x: number): GearInput => ({ ...g, profileShift: x });

/**
 * The geometry of a simple planetary stage: the sun–planet mesh (external, ISO 21771) and the
 * planet–ring mesh (internal), on one carrier, and the assembly conditions:
 *  - coaxial: both meshes have one centre distance. With no profile shifts that is zR = zS + 2 zP;
 *    with shifts, the ring's shift is derived from the sun–planet centre distance when not given,
 *    and checked against it (±0.005 mn) when given;
 *  - equal spacing: (zS + zR)/planets is a whole number (spur condition; ISO 6336 and every
 *    planetary text [memory]);
 *  - neighbouring planets clear: 2 a sin(π/planets) > daP, with a warning below a 0.5 mn gap.
 * A failed condition throws EngineInputError naming the field; nothing returns NaN.
 */
export function planetaryStage(input: PlanetaryStageInput): PlanetaryStage {
  const { planets } = input;
  const zS = input.sun.teeth;
  const zP = input.planet.teeth;
  const zR = input.ring.teeth;
  const mn = input.normalModule;
  if (!Number.isInteger(planets) || planets < 1) {
    throw new EngineInputError('planetary.planets', `${STAGE_FIELD}.planets`, 'a whole number ≥ 1', `The number of planets ${String(planets)} must be a whole number, 1 or more.`);
  }
  if (!(input.meshLoadFactor >= 1) || !Number.isFinite(input.meshLoadFactor)) {
    throw new EngineInputError('planetary.mesh-load-factor', `${STAGE_FIELD}.meshLoadFactorKgamma`, '≥ 1', `The mesh load factor Kγ = ${String(input.meshLoadFactor)} must be 1 or more: it is the most loaded planet's share over the equal share.`);
  }
  if (!(zR > zP)) {
    throw new EngineInputError('planetary.ring-smaller-than-planet', `${STAGE_FIELD}.ring.teeth`, `> ${zP} teeth`, `The ring has ${zR} teeth, no more than the planet's ${zP}: the planet cannot run inside it.`);
  }
  const shifts = [input.sun.profileShift, input.planet.profileShift, input.ring.profileShift];
  const unshifted = shifts.every((x) => x === undefined || x === 0);
  if (unshifted && zR !== zS + 2 * zP) {
    throw new EngineInputError(
      'planetary.teeth-not-coaxial',
      `${STAGE_FIELD}.ring.teeth`,
      `zR = zS + 2 zP = ${zS + 2 * zP}`,
      `Without profile shift the ring needs zS + 2 zP = ${zS} + 2·${zP} = ${zS + 2 * zP} teeth, not ${zR}: the sun–planet and planet–ring centre distances would differ. Change the ring teeth or give profile shifts.`,
    );
  }
  if ((zS + zR) % planets !== 0) {
    throw new EngineInputError(
      'planetary.not-equally-spaced',
      `${STAGE_FIELD}.planets`,
      `a divisor of zS + zR = ${zS + zR}`,
      `${planets} planets cannot be equally spaced: (zS + zR)/planets = ${zS + zR}/${planets} is not a whole number. Choose a number of planets that divides ${zS + zR}, or change the sun or ring teeth.`,
    );
  }
  const common = { normalModule: mn, normalPressureAngle: input.normalPressureAngle, helixAngle: input.helixAngle, faceWidth: input.faceWidth };
  const sunPlanet = gearPairGeometry({ ...common, kind: 'external', names: SUN_PLANET_NAMES, pinion: input.sun, wheel: input.planet });
  const a = sunPlanet.centerDistance;
  const planet = withShift(input.planet, sunPlanet.x2);
  let planetRing;
  if (input.ring.profileShift === undefined) {
    // The ring's shift follows from the carrier's centre distance (ISO 21771 with σ = −1).
    planetRing = gearPairGeometry({ ...common, kind: 'internal', names: PLANET_RING_NAMES, centerDistance: a, pinion: planet, wheel: input.ring });
  } else {
    planetRing = gearPairGeometry({ ...common, kind: 'internal', names: PLANET_RING_NAMES, pinion: planet, wheel: input.ring });
    const tol = CENTRE_DISTANCE_TOLERANCE_PER_MODULE * mn;
    if (Math.abs(planetRing.centerDistance - a) > tol) {
      throw new EngineInputError(
        'planetary.centre-distances-disagree',
        `${STAGE_FIELD}.ring.profileShift`,
        `±${(tol * 1e3).toFixed(3)} mm of ${(a * 1e3).toFixed(3)} mm`,
        `The planet–ring centre distance ${(planetRing.centerDistance * 1e3).toFixed(3)} mm disagrees with the sun–planet one ${(a * 1e3).toFixed(3)} mm: the planets cannot sit on one carrier. Leave the ring's profile shift out to derive it, or change the teeth or shifts.`,
      );
    }
  }
  const checks: EngineWarning[] = [];
  const daP = sunPlanet.tipDiameter2;
  const gap = (planets === 1 ? Infinity : 2 * a * Math.sin(Math.PI / planets) - daP) as Metres;
  if (gap <= 0) {
    throw new EngineInputError(
      'planetary.planets-collide',
      `${STAGE_FIELD}.planets`,
      `2 a sin(π/planets) > daP = ${(daP * 1e3).toFixed(3)} mm`,
      `${planets} planets collide: neighbouring planet centres are ${((2 * a * Math.sin(Math.PI / planets)) * 1e3).toFixed(3)} mm apart, less than the planet tip diameter ${(daP * 1e3).toFixed(3)} mm. Use fewer planets.`,
    );
  }
  if (gap < MIN_PLANET_TIP_GAP_PER_MODULE * mn) {
    checks.push({
      code: 'planetary.planet-tip-gap',
      severity: 'warning',
      field: `${STAGE_FIELD}.planets`,
      message: `Neighbouring planets clear each other by only ${(gap * 1e3).toFixed(3)} mm at the tips (less than 0.5 mn = ${(0.5 * mn * 1e3).toFixed(3)} mm, common practice): check the carrier and the oil's passage.`,
    });
  }
  if (input.ring.profileShift === undefined && !unshifted) {
    checks.push({
      code: 'planetary.ring-shift-derived',
      severity: 'info',
      field: `${STAGE_FIELD}.ring.profileShift`,
      message: `The ring's profile shift x = ${planetRing.x2.toFixed(4)} is derived from the sun–planet centre distance ${(a * 1e3).toFixed(3)} mm.`,
    });
  }
  return { input, zS, zP, zR, sunPlanet, planetRing, centerDistance: a, planetTipGap: gap, checks };
}

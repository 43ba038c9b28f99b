import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { EngineInputError } from '../../../app/engine/diagnostics';
import { gearPairGeometry } from '../../../app/engine/geometry/gearPair';
import { analysePlanetaryCase } from '../../../app/engine/gearset/analysePlanetaryCase';
import { planetaryMeshDuties, sunTorqueFromPower } from '../../../app/engine/gearset/meshDuties';
import { planetaryStage } from '../../../app/engine/gearset/planetaryStage';
import type { PlanetaryDuty, PlanetaryStageInput } from '../../../app/engine/gearset/types';
import { stageSpeeds } from '../../../app/engine/gearset/willis';
import { MATERIALS } from '../../../app/engine/materials';
import { analyseCase } from '../../../app/engine/mesh/analyseCase';
import { celsiusToKelvin, degreesToRadians, millimetres, micrometres, rpmToRadiansPerSecond, toMillimetres, type NewtonMetres, type RadiansPerSecond, type Watts } from '../../../app/engine/units';
import { parseReviewValue } from '../../../app/review/parse';
import { enginePolicyOf } from '../../../app/review/engineInputs';
import { oilModelsOf } from '../../../app/review/oils';

const rpm = (w: number) => (w * 60) / (2 * Math.PI);
const W = rpmToRadiansPerSecond;

/** zS 21, zP 27, zR 75 = 21 + 2·27, mn 4 mm, spur, b 40 mm: a = 4·48/2 = 96 mm on both meshes. */
const STAGE: PlanetaryStageInput = {
  normalModule: millimetres(4),
  normalPressureAngle: degreesToRadians(20),
  helixAngle: degreesToRadians(0),
  faceWidth: millimetres(40),
  planets: 3,
  meshLoadFactor: 1,
  held: 'ring',
  sun: { teeth: 21 },
  planet: { teeth: 27 },
  ring: { teeth: 75 },
};

describe('Willis equation, zS 21, zP 27, zR 75, input 1000 rpm (hand calculation)', () => {
  it('ring held: nC = 1000·21/96 = 218.75 rpm, ratio 96/21 = 4.5714; planet −781.25·21/27 = −607.64 rel., −388.89 abs.', () => {
    const s = stageSpeeds(21, 27, 75, 'ring', W(1000));
    expect(rpm(s.carrier)).toBeCloseTo(218.75, 9);
    expect(s.ratio).toBeCloseTo(96 / 21, 12);
    expect(rpm(s.sunRelative)).toBeCloseTo(781.25, 9);
    expect(rpm(s.planetRelative)).toBeCloseTo(-607.6389, 3);
    expect(rpm(s.planet)).toBeCloseTo(-388.8889, 3);
    expect(rpm(s.ringRelative)).toBeCloseTo(-218.75, 9); // 0 − nC
  });
  it('carrier held: nR = −1000·21/75 = −280 rpm, ratio −75/21 = −3.5714; planet −1000·21/27 = −777.78 rpm', () => {
    const s = stageSpeeds(21, 27, 75, 'carrier', W(1000));
    expect(rpm(s.ring)).toBeCloseTo(-280, 9);
    expect(s.ratio).toBeCloseTo(-75 / 21, 12);
    expect(rpm(s.planet)).toBeCloseTo(-777.7778, 3);
    expect(rpm(s.sunRelative)).toBeCloseTo(1000, 9);
  });
  it('sun held, carrier 1000 rpm: nR = 1000 (1 + 21/75) = 1280 rpm, ratio 75/96 = 0.78125; sun −1000, ring +280 rel.', () => {
    const s = stageSpeeds(21, 27, 75, 'sun', W(1000));
    expect(rpm(s.ring)).toBeCloseTo(1280, 9);
    expect(s.ratio).toBeCloseTo(0.78125, 12);
    expect(rpm(s.sunRelative)).toBeCloseTo(-1000, 9);
    expect(rpm(s.ringRelative)).toBeCloseTo(280, 9);
    expect(rpm(s.planetRelative)).toBeCloseTo(777.7778, 3); // 1000·21/27
  });
  it('refuses a speed that is not positive', () => {
    expect(() => stageSpeeds(21, 27, 75, 'ring', 0 as RadiansPerSecond)).toThrow(EngineInputError);
  });
});

describe('planetary stage geometry and assembly', () => {
  const st = planetaryStage(STAGE);
  it('both meshes at a = 96 mm (4·(21+27)/2 and 4·(75−27)/2), sun–planet external, planet–ring internal', () => {
    expect(toMillimetres(st.sunPlanet.centerDistance)).toBeCloseTo(96, 9);
    expect(toMillimetres(st.planetRing.centerDistance)).toBeCloseTo(96, 9);
    expect(st.sunPlanet.kind).toBe('external');
    expect(st.planetRing.kind).toBe('internal');
  });
  it('planet tip gap 2·96 sin 60° − 116 = 50.277 mm (daP = 4·27 + 8 = 116 mm)', () => {
    expect(toMillimetres(st.planetTipGap)).toBeCloseTo(50.277, 3);
  });
  const fieldOf = (f: () => unknown) => {
    try {
      f();
    } catch (e) {
      if (e instanceof EngineInputError) return e.field;
      throw e;
    }
    return null;
  };
  it('a ring that is not zS + 2 zP without shifts is refused, naming the ring teeth', () => {
    expect(fieldOf(() => planetaryStage({ ...STAGE, ring: { teeth: 77 } }))).toBe('planetary.ring.teeth');
  });
  it('a ring no larger than the planet is refused, naming the ring teeth', () => {
    expect(fieldOf(() => planetaryStage({ ...STAGE, ring: { teeth: 27 } }))).toBe('planetary.ring.teeth');
  });
  it('planets that cannot be equally spaced ((21 + 75)/5 = 19.2) are refused, naming the planets', () => {
    expect(fieldOf(() => planetaryStage({ ...STAGE, planets: 5 }))).toBe('planetary.planets');
  });
  it('six planets collide (2·96 sin 30° = 96 mm < daP = 116 mm), refused naming the planets', () => {
    expect(() => planetaryStage({ ...STAGE, planets: 6 })).toThrow(/collide/);
  });
  it('shifted sun, ring shift left out: derived so that both centre distances agree', () => {
    const s = planetaryStage({ ...STAGE, sun: { teeth: 21, profileShift: 0.3 }, planet: { teeth: 27, profileShift: 0 } });
    expect(Math.abs(s.planetRing.centerDistance - s.sunPlanet.centerDistance)).toBeLessThan(1e-12);
    expect(s.checks.map((c) => c.code)).toContain('planetary.ring-shift-derived');
  });
  it('a given ring shift that disagrees is refused, naming the ring shift', () => {
    expect(fieldOf(() => planetaryStage({ ...STAGE, sun: { teeth: 21, profileShift: 0.3 }, planet: { teeth: 27, profileShift: 0 }, ring: { teeth: 75, profileShift: 0 } }))).toBe('planetary.ring.profileShift');
  });
  it('Kγ below 1 is refused', () => {
    expect(fieldOf(() => planetaryStage({ ...STAGE, meshLoadFactor: 0.9 }))).toBe('planetary.meshLoadFactorKgamma');
  });
});

const duty = (sunTorque: number, speed = 1000): PlanetaryDuty => ({
  name: 'test',
  inputSpeed: W(speed),
  sunTorque: sunTorque as NewtonMetres,
  applicationFactor: 1,
  dynamicFactor: 1,
  faceLoadFactor: 1,
  transverseLoadFactor: 1,
  oilTemperature: celsiusToKelvin(60),
  lubrication: 'dip',
  timeShare: 1,
});

describe('mesh duties in the carrier frame', () => {
  it('T_sun 3000 N·m, Kγ 1.1, 3 planets: sun mesh 3000·1.1/3 = 1100 N·m, planet–ring 1100·27/21 = 1414.29 N·m', () => {
    const d = planetaryMeshDuties(planetaryStage({ ...STAGE, meshLoadFactor: 1.1 }), duty(3000));
    expect(d['sun-planet'].pinionTorque).toBeCloseTo(1100, 9);
    expect(d['planet-ring'].pinionTorque).toBeCloseTo(1414.2857, 3);
    expect(d['sun-planet'].pinionMeshes).toBe(3);
    expect(d['planet-ring'].pinionMeshes).toBe(2);
    expect(rpm(d['sun-planet'].pinionSpeed)).toBeCloseTo(781.25, 9); // nS − nC, ring held
    expect(rpm(d['planet-ring'].pinionSpeed)).toBeCloseTo(607.6389, 3);
  });
  it('power to sun torque: ring held 100 kW at 1000 rpm → 954.93 N·m; sun held, carrier 1000 rpm → 954.93/(1 + 75/21) = 208.89 N·m', () => {
    expect(sunTorqueFromPower(planetaryStage(STAGE), 1e5 as Watts, W(1000))).toBeCloseTo(954.9297, 3); // 1e5/(2π·1000/60)
    expect(sunTorqueFromPower(planetaryStage({ ...STAGE, held: 'sun' }), 1e5 as Watts, W(1000))).toBeCloseTo(208.8909, 3);
  });
});

describe('planetary mesh analyses', () => {
  const raw = JSON.parse(readFileSync('assets/demo/harrow-creek-conveyor-spur-pair.flankfilm.json', 'utf8'));
  const p = parseReviewValue(raw);
  if (!p.ok) throw new Error('demo invalid');
  const oil = oilModelsOf(p.review.oils)[0] ?? null;
  const policy = enginePolicyOf(p.review.policy);
  const steel = MATERIALS['steel-carburized'];
  const m = { material: steel, roughnessRa: micrometres(0.5) };
  const run = (input: PlanetaryStageInput, sunTorque: number) => analysePlanetaryCase({ stage: planetaryStage(input), sun: m, planet: m, ring: m, duty: duty(sunTorque), oil, policy, caseField: 'loadCases[0]' });

  it('one planet, Kγ = 1: the sun–planet mesh equals an external pair of the same geometry, relative speed and torque', () => {
    const one = run({ ...STAGE, planets: 1 }, 2000);
    const sp = one.meshes['sun-planet'];
    const geometry = gearPairGeometry({ normalModule: STAGE.normalModule, normalPressureAngle: STAGE.normalPressureAngle, helixAngle: STAGE.helixAngle, faceWidth: STAGE.faceWidth, pinion: { teeth: 21, profileShift: 0 }, wheel: { teeth: 27, profileShift: 0 } });
    const pair = analyseCase({ geometry, pinion: steel, wheel: steel, roughnessRa1: m.roughnessRa, roughnessRa2: m.roughnessRa, oil, policy, caseField: 'loadCases[0]', duty: { ...duty(0), pinionSpeed: W(781.25), pinionTorque: 2000 as NewtonMetres, pinionMeshes: 1 } });
    expect(Array.from(sp.mechanics.hertzPressure)).toEqual(Array.from(pair.mechanics.hertzPressure));
    expect(sp.mechanics.sumVelocity[10] as number).toBeCloseTo(pair.mechanics.sumVelocity[10] as number, 9);
    expect(sp.heat?.bulkTemperature).toBeCloseTo(pair.heat?.bulkTemperature as number, 9);
    expect(sp.heat?.contactMax).toBeCloseTo(pair.heat?.contactMax as number, 9);
    expect(sp.film?.lambdaMin).toBeCloseTo(pair.film?.lambdaMin as number, 9);
    expect(sp.scuffing?.safety).toBeCloseTo(pair.scuffing?.safety as number, 9);
  });
  it('the sun’s bulk temperature rises with the number of planets at equal torque per mesh (Xmp = (1 + n)/2)', () => {
    // zS 24, zP 24, zR 72: 96 divides by 1…4 and 2·96 sin(π/4) = 135.8 mm > daP 104 mm.
    const base = { ...STAGE, sun: { teeth: 24 }, planet: { teeth: 24 }, ring: { teeth: 72 } };
    const theta = [1, 2, 3, 4].map((n) => run({ ...base, planets: n }, 1000 * n).meshes['sun-planet'].heat?.bulkTemperature as number);
    for (let i = 1; i < theta.length; i++) expect(theta[i] as number).toBeGreaterThan(theta[i - 1] as number);
  });
  it('the planet–ring mesh carries less Hertz stress than the sun–planet mesh at the same tangential force', () => {
    const a = run(STAGE, 3000);
    const sp = a.meshes['sun-planet'].mechanics;
    const pr = a.meshes['planet-ring'].mechanics;
    expect(pr.forces.tangential).toBeCloseTo(sp.forces.tangential, 6);
    expect(pr.pitchHertzWholeLoad).toBeLessThan(sp.pitchHertzWholeLoad);
    expect(Math.max(...pr.hertzPressure)).toBeLessThan(Math.max(...sp.hertzPressure));
  });
});

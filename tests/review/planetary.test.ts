import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { EngineInputError } from '../../app/engine/diagnostics';
import { parseReviewValue } from '../../app/review/parse';
import { run } from '../../app/review/run';
import { governAcrossMeshes } from '../../app/review/planetary/acrossMeshes';
import type { OverallVerdict, Results } from '../../app/review/results';
import { operatingMaps } from '../../app/review/operatingMaps';
import { findNonFinite } from '../fuzz/fuzzer';

const DEMO = 'assets/demo/harrow-creek-ball-mill-planetary.flankfilm.json';
const PAIR_DEMO = 'assets/demo/harrow-creek-conveyor-spur-pair.flankfilm.json';
const load = (f: string) => JSON.parse(readFileSync(f, 'utf8'));
const parsed = (raw: unknown) => {
  const p = parseReviewValue(raw);
  if (!p.ok) throw new Error(JSON.stringify(p.issues));
  return p.review;
};
const issuesOf = (raw: unknown) => {
  const p = parseReviewValue(raw);
  return p.ok ? [] : p.issues.map((i) => `${i.path}: ${i.message}`);
};

describe('planetary review: run()', () => {
  const r = run(parsed(load(DEMO)));
  const pair = run(parsed(load(PAIR_DEMO)));
  it('gives planetary and two meshes whose gear and cases carry exactly a pair’s keys, and no NaN', () => {
    expect(findNonFinite(r)).toBeNull();
    expect(r.meshes?.map((m) => m.mesh)).toEqual(['sun-planet', 'planet-ring']);
    for (const m of r.meshes ?? []) {
      expect(Object.keys(m.gear).sort()).toEqual(Object.keys(pair.gear).sort());
      for (const c of m.cases) expect(Object.keys(c).sort()).toEqual(Object.keys(pair.cases[0] ?? {}).sort());
    }
  });
  it('ratio 1 + zR/zS = 1 + 87/21 = 5.142857 with the ring held; carrier 990/5.142857 = 192.5 rpm', () => {
    expect(r.planetary?.ratio).toBeCloseTo(1 + 87 / 21, 12);
    expect(r.planetary?.loadCases[0]?.carrierSpeed_rpm).toBeCloseTo(192.5, 9);
  });
  it('each mesh runs at its speed relative to the carrier: sun 990 − 192.5 = 797.5 rpm, planet 797.5·21/33 = 507.5 rpm', () => {
    expect(r.meshes?.[0]?.cases[0]?.pinionSpeed_rpm).toBeCloseTo(797.5, 9);
    expect(r.meshes?.[1]?.cases[0]?.pinionSpeed_rpm).toBeCloseTo(507.5, 9);
  });
  it('torque per planet mesh T_sun Kγ/planets: 1100 kW at 990 rpm → 10 610.33 N·m · 1.1/3 = 3890.45 N·m', () => {
    // T_sun = 1.1e6/(2π·990/60) = 10 610.33 N·m
    expect(r.meshes?.[0]?.cases[0]?.pinionTorque_Nm).toBeCloseTo(3890.454, 2);
  });
  it('the verdict per oil governs across both meshes and says which mesh governs', () => {
    expect(r.planetary?.governingMesh).toHaveLength(r.verdicts.length);
    for (const v of r.verdicts) expect(v.summary).toMatch(/^Governing mesh: (sun–planet|planet–ring)\./);
  });
  it('the operating map sweeps the governing mesh and says so', () => {
    const maps = operatingMaps(parsed(load(DEMO)), { temperatures: 3, loads: 3 });
    expect(maps?.[0]?.mesh).toBe(r.planetary?.shownMesh);
  });
});

describe('one planet, Kγ = 1: the sun–planet mesh is an external pair', () => {
  it('same results as a gear pair review with the same geometry, the relative speed and the sun torque', () => {
    const raw = load(DEMO);
    raw.planetary = { ...raw.planetary, planets: 1, meshLoadFactorKgamma: 1 };
    raw.loadCases = raw.loadCases.map((c: Record<string, unknown>) => ({ ...c, power_kW: undefined, sunTorque_Nm: 9000 }));
    const planetary = run(parsed(raw));
    const p = raw.planetary;
    const pairRaw = load(DEMO);
    delete pairRaw.planetary;
    pairRaw.gearPair = { normalModule_mm: p.normalModule_mm, faceWidth_mm: p.faceWidth_mm, pinion: p.sun, wheel: p.planet, components: [] };
    // Ring held: nS − nC = nS zR/(zS + zR) = nS·87/108.
    pairRaw.loadCases = raw.loadCases.map((c: Record<string, unknown>) => ({ name: c.name, pinionSpeed_rpm: ((c.sunSpeed_rpm as number) * 87) / 108, pinionTorque_Nm: 9000, applicationFactor: c.applicationFactor, oilTemperature_C: c.oilTemperature_C, lubrication: c.lubrication, timeShare: c.timeShare }));
    const pair = run(parsed(pairRaw));
    const sp = planetary.meshes?.[0] as NonNullable<Results['meshes']>[number];
    expect(sp.gear).toEqual(pair.gear);
    sp.cases.forEach((c, i) => {
      const q = pair.cases[i];
      for (const k of ['maxHertzStress_MPa', 'lambdaMin', 'bulkTemperature_C', 'maxContactTemperature_C', 'scuffingSafety', 'integralSafety'] as const) {
        expect(c[k] as number).toBeCloseTo(q?.[k] as number, 9);
      }
      expect(c.verdict?.code).toBe(q?.verdict?.code);
    });
  });
});

describe('verdict across meshes', () => {
  const v = (code: OverallVerdict['code'], share: number, oilFit: OverallVerdict['oilFit'] = 'meets'): OverallVerdict => ({
    oil: 'Oil',
    code,
    oilFit,
    governingLoadCase: 'Case',
    governingMethod: 'flash',
    neededFzgStage: 10,
    oilFzgStage: 12,
    chemistryNeed: 'extreme-pressure',
    oilChemistry: 'EP',
    checks: [],
    micropitting: 'unknown',
    neededMicropittingStage: null,
    oilMicropittingStage: null,
    dutyShareMet: share,
    shortfalls: oilFit === 'meets' ? [] : ['film'],
    summary: 'S',
  });
  it('the most severe mesh governs; the oil meets the need only if it does on every mesh', () => {
    const g = governAcrossMeshes([
      { mesh: 'sun-planet', verdicts: [v('ep-warranted', 1)] },
      { mesh: 'planet-ring', verdicts: [v('beyond-oil', 0.5, 'falls-short')] },
    ]);
    expect(g[0]?.mesh).toBe('planet-ring');
    expect(g[0]?.verdict.oilFit).toBe('falls-short');
    expect(g[0]?.verdict.summary).toBe('Governing mesh: planet–ring. S');
  });
  it('at equal severity the mesh that meets less of the duty governs', () => {
    const g = governAcrossMeshes([
      { mesh: 'sun-planet', verdicts: [v('ep-warranted', 0.2, 'falls-short')] },
      { mesh: 'planet-ring', verdicts: [v('ep-warranted', 0.9, 'falls-short')] },
    ]);
    expect(g[0]?.mesh).toBe('sun-planet');
    expect(g[0]?.verdict.dutyShareMet).toBe(0.2);
  });
});

describe('planetary review: bad input', () => {
  it('a review with both gearPair and planetary, or neither, is refused', () => {
    const both = { ...load(DEMO), gearPair: load(PAIR_DEMO).gearPair };
    expect(issuesOf(both).join('\n')).toMatch(/exactly one gear set/);
    const neither = load(DEMO);
    delete neither.planetary;
    expect(issuesOf(neither).join('\n')).toMatch(/exactly one gear set/);
  });
  it('a planetary load case with a pinion speed, or without a sun speed, names the field', () => {
    const raw = load(DEMO);
    raw.loadCases[0].pinionSpeed_rpm = 990;
    delete raw.loadCases[1].sunSpeed_rpm;
    const issues = issuesOf(raw).join('\n');
    expect(issues).toMatch(/loadCases\[0\]\.pinionSpeed_rpm/);
    expect(issues).toMatch(/loadCases\[1\]\.sunSpeed_rpm/);
  });
  it('with the sun held the case gives the carrier speed', () => {
    const raw = load(DEMO);
    raw.planetary.held = 'sun';
    expect(issuesOf(raw).join('\n')).toMatch(/carrierSpeed_rpm: is required when the sun is held/);
    raw.loadCases = raw.loadCases.map((c: Record<string, unknown>) => {
      const { sunSpeed_rpm, ...rest } = c;
      return { ...rest, carrierSpeed_rpm: sunSpeed_rpm };
    });
    const r = run(parsed(raw));
    expect(r.planetary?.loadCases[0]?.ringSpeed_rpm).toBeCloseTo(990 * (1 + 21 / 87), 9); // nR = nC (1 + zS/zR)
  });
  const fieldOf = (raw: unknown) => {
    try {
      run(parsed(raw));
    } catch (e) {
      if (e instanceof EngineInputError) return e.field;
      throw e;
    }
    return null;
  };
  it('teeth that do not assemble and a ring smaller than the planet name the field', () => {
    const off = load(DEMO);
    off.planetary.ring.teeth = 88;
    expect(fieldOf(off)).toBe('planetary.ring.teeth');
    const small = load(DEMO);
    small.planetary.ring.teeth = 30;
    expect(fieldOf(small)).toBe('planetary.ring.teeth');
    const spacing = load(DEMO);
    spacing.planetary.planets = 5; // (21 + 87)/5 = 21.6
    expect(fieldOf(spacing)).toBe('planetary.planets');
  });
});

import { describe, expect, it, beforeAll } from 'vitest';
import { mkdtempSync, readFileSync, writeFileSync, statSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { spawnSync } from 'node:child_process';
import { cli } from './cliHarness';

const DEMO = 'assets/demo/harrow-creek-crusher-hs-pair.flankfilm.json';
const demo = () => JSON.parse(readFileSync(DEMO, 'utf8')) as Record<string, any>;
let dir: string;
beforeAll(() => {
  dir = mkdtempSync(join(tmpdir(), 'flankfilm-cli-'));
});
function fileWith(mutate: (r: Record<string, any>) => void, name = 'r.flankfilm.json'): string {
  const r = demo();
  mutate(r);
  const p = join(dir, name);
  writeFileSync(p, JSON.stringify(r));
  return p;
}

describe('flankfilm review --json', () => {
  it('prints the keys issue 2 fixes, for every load case × oil', async () => {
    const { code, out } = await cli('review', DEMO, '--json');
    expect(code).toBe(0);
    const r = JSON.parse(out);
    expect(typeof r.flankfilm).toBe('string');
    for (const k of ['workingPressureAngle_deg', 'transverseContactRatio', 'overlapRatio', 'totalContactRatio', 'lineOfAction_mm', 'points_mm', 'checks']) expect(r.gear).toHaveProperty(k);
    expect(Object.keys(r.gear.points_mm)).toEqual(['A', 'B', 'C', 'D', 'E']);
    expect(r.cases).toHaveLength(demo().loadCases.length * demo().oils.length);
    for (const c of r.cases) {
      for (const k of ['loadCase', 'oil', 'pitchLineVelocity_mps', 'nominalContactStress_MPa', 'maxHertzStress_MPa', 'pitchHertzStress_MPa', 'pitch', 'path', 'oilAtTemperature', 'lambdaMin', 'lambdaMinPosition_mm', 'regime', 'filmFormula', 'frictionCoefficient', 'bulkTemperature_C', 'maxContactTemperature_C', 'maxContactTemperaturePosition_mm', 'scuffingTemperature_C', 'scuffingSafety', 'integralTemperature_C', 'integralScuffingTemperature_C', 'integralSafety', 'requiredFzgStage', 'scuffingProbability', 'lambdaGFMin', 'verdict']) {
        expect(c, k).toHaveProperty(k);
      }
      expect(c.path).toHaveLength(201);
      for (const k of ['position_mm', 'loadShare', 'hertzStress_MPa', 'slidingVelocity_mps', 'sumVelocity_mps', 'slideToRoll', 'filmThicknessMin_um', 'filmThicknessCentral_um', 'lambda', 'lambdaGF', 'regime', 'flashTemperature_K', 'contactTemperature_C']) {
        expect(c.path[0], k).toHaveProperty(k);
        expect(c.pitch, k).toHaveProperty(k);
      }
      expect(['aw-suffices', 'ep-warranted', 'beyond-oil']).toContain(c.verdict.code);
    }
    for (const k of ['name', 'viscosityIndex', 'viscosityIndexSource', 'isoVG', 'warnings']) expect(r.oils[0]).toHaveProperty(k);
    expect(r.verdicts[0]).toHaveProperty('governingLoadCase');
    expect(r.gradeFinder[0]).toHaveProperty('table');
    expect(out).not.toMatch(/NaN|Infinity/);
  });
  it('prints a readable summary without --json', async () => {
    const { code, out } = await cli('review', DEMO);
    expect(code).toBe(0);
    expect(out).toMatch(/εα/);
    expect(out).toMatch(/gearbox maker's lubricant list/);
  });
  it('the conveyor demo runs too', async () => {
    expect((await cli('review', 'assets/demo/harrow-creek-conveyor-spur-pair.flankfilm.json', '--json')).code).toBe(0);
  });
});

describe('bad input: exit 1, the field named, the file untouched', () => {
  const cases: Array<[string, (r: Record<string, any>) => void, RegExp]> = [
    ['wrong type', (r) => (r.gearPair.faceWidth_mm = 'wide'), /gearPair\.faceWidth_mm/],
    ['fractional teeth', (r) => (r.gearPair.pinion.teeth = 23.5), /gearPair\.pinion\.teeth/],
    ['negative teeth', (r) => (r.gearPair.pinion.teeth = -3), /gearPair\.pinion\.teeth/],
    ['teeth beyond any real gear', (r) => (r.gearPair.wheel.teeth = 100000), /gearPair\.wheel\.teeth/],
    ['missing field', (r) => delete r.gearPair.normalModule_mm, /gearPair\.normalModule_mm/],
    ['unknown format', (r) => (r.format = 'someone.else'), /format/],
    ['newer version', (r) => (r.version = 99), /version.*newer/],
    ['zero speed', (r) => (r.loadCases[0].pinionSpeed_rpm = 0), /loadCases\[0\]\.pinionSpeed_rpm/],
    ['negative speed', (r) => (r.loadCases[0].pinionSpeed_rpm = -100), /loadCases\[0\]\.pinionSpeed_rpm/],
    ['absurd temperature', (r) => (r.loadCases[1].oilTemperature_C = 900), /loadCases\[1\]\.oilTemperature_C/],
    ['KV100 ≥ KV40', (r) => (r.oils[0].kv100_mm2s = 300), /oils\[0\]\.kv100_mm2s/],
    ['non-positive viscosity', (r) => (r.oils[1].kv40_mm2s = 0), /oils\[1\]\.kv40_mm2s/],
    ['non-positive density', (r) => (r.oils[1].density15_kgm3 = -5), /oils\[1\]\.density15_kgm3/],
    ['unknown base oil', (r) => (r.oils[0].baseOil = 'whale'), /oils\[0\]\.baseOil/],
    ['unknown chemistry', (r) => (r.oils[0].chemistry = 'magic'), /oils\[0\]\.chemistry/],
    ['impossible centre distance', (r) => (r.gearPair.centerDistance_mm = 150), /centerDistance_mm/],
    ['centre distance below the no-backlash value of the shifts (the teeth jam)', (r) => (r.gearPair.centerDistance_mm = 221), /centerDistance_mm/],
    ['impossible tip diameter', (r) => (r.gearPair.pinion.tipDiameter_mm = 120), /gearPair\.pinion\.tipDiameter_mm/],
    ['tip inside the base circle', (r) => (r.gearPair.pinion.tipDiameter_mm = 80), /gearPair\.pinion\.tipDiameter_mm/],
    ['prototype-pollution key', (r) => (r.gearPair = JSON.parse(JSON.stringify(r.gearPair).replace('{', '{"__proto__":{"polluted":1},'))), /__proto__/],
    ['torque and power both given', (r) => (r.loadCases[0].pinionTorque_Nm = 100), /loadCases\[0\]\.pinionTorque_Nm/],
  ];
  for (const [name, mutate, field] of cases) {
    it(name, async () => {
      const p = fileWith(mutate, `${name.replace(/\W+/g, '-')}.flankfilm.json`);
      const before = readFileSync(p);
      const mtime = statSync(p).mtimeMs;
      const { code, err, out } = await cli('review', p, '--json');
      expect(code, err).toBe(1);
      expect(err).toMatch(field);
      expect(err).not.toMatch(/\n\s+at /); // no stack trace
      expect(out).toBe('');
      expect(readFileSync(p).equals(before)).toBe(true);
      expect(statSync(p).mtimeMs).toBe(mtime);
      expect(({} as Record<string, unknown>).polluted).toBeUndefined();
    });
  }
  it('truncated JSON', async () => {
    const p = join(dir, 'truncated.flankfilm.json');
    writeFileSync(p, readFileSync(DEMO, 'utf8').slice(0, 300));
    const { code, err } = await cli('review', p);
    expect(code).toBe(1);
    expect(err).toMatch(/not valid JSON/);
  });
  it('a file of several MB', async () => {
    const p = join(dir, 'huge.flankfilm.json');
    const r = demo();
    r.notes = 'x'.repeat(3_000_000);
    writeFileSync(p, JSON.stringify(r));
    const { code, err } = await cli('review', p);
    expect(code).toBe(1);
    expect(err).toMatch(/MB/);
  });
  it('a missing file', async () => {
    const { code, err } = await cli('review', join(dir, 'nope.json'));
    expect(code).toBe(1);
    expect(err).toMatch(/ENOENT/);
  });
});

describe('usage errors: exit 2', () => {
  it('no command, unknown command, unknown flag, no file', async () => {
    expect((await cli()).code).toBe(2);
    expect((await cli('frobnicate')).code).toBe(2);
    expect((await cli('review', DEMO, '--bogus')).code).toBe(2);
    expect((await cli('review')).code).toBe(2);
  });
});

describe('the real process', () => {
  it('npm run -s flankfilm -- review <bad file> exits 1 with one message and no stack trace', () => {
    const p = fileWith((r) => (r.gearPair.pinion.teeth = 2.5), 'proc.flankfilm.json');
    const r = spawnSync(process.execPath, ['node_modules/tsx/dist/cli.mjs', 'app/cli/main.ts', 'review', p], { encoding: 'utf8' });
    expect(r.status).toBe(1);
    expect(r.stderr).toMatch(/gearPair\.pinion\.teeth/);
    expect(r.stderr).not.toMatch(/\n\s+at /);
  });
});

import { describe, expect, it } from 'vitest';
import { demoCaseInput, demoOils, demoPair } from './demoCase';
import { analyseCase } from '../../../app/engine/mesh/analyseCase';
import { mapAxes, operatingMap, VERDICT_CODES } from '../../../app/engine/sweep/operatingMap';
import { kelvinToCelsius } from '../../../app/engine/units';
import { decideVerdict } from '../../../app/engine/verdict/decide';
import { run } from '../../../app/review/run';

const r = demoPair;
const oils = demoOils;
const input = demoCaseInput;

describe('operating map (oil temperature × load)', () => {
  it('a cell at the case temperature and 100 % load equals the full case analysis', () => {
    const results = run(r);
    for (let li = 0; li < r.loadCases.length; li++) {
      for (let oi = 0; oi < oils.length; oi++) {
        const t = r.loadCases[li]?.oilTemperature_C as number;
        const map = operatingMap(input(li, oi), { temperatures_C: Float64Array.of(t), loadFractions: Float64Array.of(1) });
        const a = analyseCase(input(li, oi));
        expect(Math.abs((map.lambdaMin[0] as number) / (a.film?.lambdaMin as number) - 1)).toBeLessThan(1e-9);
        expect(Math.abs((map.scuffingSafety[0] as number) / (a.scuffing?.safety as number) - 1)).toBeLessThan(1e-9);
        expect(Math.abs((map.integralSafety[0] as number) / (a.scuffing?.integralSafety as number) - 1)).toBeLessThan(1e-9);
        const caseResult = results.cases[li * oils.length + oi];
        expect(VERDICT_CODES[map.verdict[0] as number]).toBe(caseResult?.verdict?.code);
        expect(kelvinToCelsius(a.heat?.contactMax as never)).toBeGreaterThan(t);
      }
    }
    expect(decideVerdict).toBeTypeOf('function');
  });
  it('micropitting: a cell at the case temperature and 100 % load gives the case\'s λGF,min and Sλ (both film formulas)', () => {
    for (const filmFormula of ['dowson-higginson', 'pan-hamrock'] as const) {
      for (let li = 0; li < r.loadCases.length; li++) {
        const base = input(li, 1);
        const oil = { ...(base.oil as NonNullable<typeof base.oil>), micropittingFailureStage: 8 };
        const inp = { ...base, oil, policy: { ...base.policy, filmFormula } };
        const t = r.loadCases[li]?.oilTemperature_C as number;
        const map = operatingMap(inp, { temperatures_C: Float64Array.of(t), loadFractions: Float64Array.of(1) });
        const a = analyseCase(inp);
        expect(Math.abs((map.lambdaGFMin[0] as number) / (a.micropitting?.lambdaGFMin as number) - 1)).toBeLessThan(1e-9);
        expect(Math.abs((map.micropittingSafety?.[0] as number) / (a.micropitting?.safety as number) - 1)).toBeLessThan(1e-9);
        expect(map.lambdaGFP).toBeCloseTo(a.micropitting?.lambdaGFP as number, 12);
      }
    }
    expect(operatingMap(input(0, 1), mapAxes([20, 100], 2, 2)).micropittingSafety).toBeNull(); // the demo oils give no micropitting stage
  });
  it('λ falls with temperature and SB falls with load across the grid', () => {
    const axes = mapAxes([20, 100], 9, 8);
    const map = operatingMap(input(0, 1), axes);
    for (let row = 1; row < 9; row++) expect(map.lambdaMin[row * 8 + 3] as number).toBeLessThan(map.lambdaMin[(row - 1) * 8 + 3] as number);
    for (let col = 1; col < 8; col++) expect(map.scuffingSafety[4 * 8 + col] as number).toBeLessThan(map.scuffingSafety[4 * 8 + col - 1] as number);
  });
  it('every cell is finite or a documented +∞ safety, never NaN', () => {
    const map = operatingMap(input(1, 0), mapAxes([20, 120], 12, 12));
    for (const arr of [map.lambdaMin, map.scuffingSafety, map.integralSafety]) for (const v of arr) expect(Number.isNaN(v)).toBe(false);
    for (const v of map.lambdaMin) expect(Number.isFinite(v)).toBe(true);
  });
});

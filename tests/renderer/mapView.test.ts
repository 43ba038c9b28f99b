import { describe, it, expect } from 'vitest';
import { DEMO_REVIEWS } from '../../app/review/demo';
import { operatingMaps, type OperatingMapResult } from '../../app/review/operatingMaps';
import { parseReviewValue } from '../../app/review/parse';
import { contourSegments } from '../../app/engine/sweep/contour';
import { casePoint, cellValues, chainSegments, levelText, mapContours, mapSentences, niceTicks, oilPhrases, scuffingHoldsUpTo } from '../../renderer/components/map/mapView';

const parsed = parseReviewValue(DEMO_REVIEWS['harrow-creek-crusher-hs-pair.flankfilm.json']);
if (!parsed.ok) throw new Error('the demo must parse');
const review = parsed.review;
const maps = operatingMaps(review) as OperatingMapResult[];
const HARD = review.loadCases.findIndex((c) => c.name === 'Hard-rock peak');
const hard = maps.slice(HARD * review.oils.length, (HARD + 1) * review.oils.length);
const SB_MIN = review.policy.scuffingSafetyMin;
const say = { temperature: (c: number) => `${c.toFixed(1)} °C`, number: (x: number) => x.toFixed(1), level: levelText };

describe('iso-lines as polylines', () => {
  it('a plane r + c = 10.5 on a 20 × 20 grid chains into one line whose every point lies on it', () => {
    const segs = contourSegments(20, 20, (r, c) => r + c, 10.5);
    const lines = chainSegments(segs);
    expect(lines).toHaveLength(1);
    expect(lines[0]).toHaveLength(segs.length + 1); // each segment used once, end to end
    for (const p of lines[0] ?? []) expect(p.r + p.c).toBeCloseTo(10.5, 12); // linear interpolation is exact on a plane
    const ends = [lines[0]?.[0], lines[0]?.at(-1)];
    for (const e of ends) expect(e && (e.r === 0 || e.c === 0 || e.r === 19 || e.c === 19)).toBe(true); // an open line ends on the border
  });

  it('a closed iso-line (a cone) comes back as one ring: first point = last point', () => {
    const lines = chainSegments(contourSegments(21, 21, (r, c) => Math.hypot(r - 10, c - 10), 6.3));
    expect(lines).toHaveLength(1);
    const line = lines[0] ?? [];
    expect(line[0]?.r).toBeCloseTo(line.at(-1)?.r ?? Number.NaN, 9);
    expect(line[0]?.c).toBeCloseTo(line.at(-1)?.c ?? Number.NaN, 9);
  });

  it('the demo: the oil in service crosses SB = SB,min inside the hard-rock map; every segment is on a polyline', () => {
    const { sb, lambda } = mapContours(hard[0] as OperatingMapResult, SB_MIN, review.policy.lambdaTarget);
    expect(sb.length).toBeGreaterThan(0);
    expect(lambda.length).toBeGreaterThan(0);
    const chained = chainSegments(sb);
    expect(chained.reduce((n, l) => n + l.length - 1, 0)).toBe(sb.length);
  });
});

describe('the micropitting line λGF,min = λGFP (ISO/TS 6336-22)', () => {
  it('is absent without the oil\'s micropitting stage (the demo oils give none); with stage 8 the hard-rock map of the oil in service crosses λGFP', () => {
    expect(mapContours(hard[0] as OperatingMapResult, SB_MIN, review.policy.lambdaTarget).micropitting).toEqual([]);
    const withStage = { ...review, oils: review.oils.map((o) => ({ ...o, micropittingFailureStage: 8 })) };
    const m = (operatingMaps(withStage, { temperatures: 24, loads: 24 }) as OperatingMapResult[])[HARD * review.oils.length] as OperatingMapResult;
    expect(m.lambdaGFP).not.toBeNull();
    const lgfp = m.lambdaGFP as number;
    const all = m.lambdaGFMin.flat();
    const segs = mapContours(m, SB_MIN, review.policy.lambdaTarget).micropitting;
    expect(Math.min(...all)).toBeLessThan(lgfp); // measured: λGF,min 0.23 … 8.7 on this map against λGFP 0.25
    expect(Math.max(...all)).toBeGreaterThan(lgfp);
    expect(segs.length).toBeGreaterThan(0);
    for (const row of m.micropittingSafety ?? []) for (const v of row) expect(Number.isFinite(v)).toBe(true);
  });
});

describe('the case point and the read-out', () => {
  it('sits at its oil temperature and 100 % on the evenly spaced axes (mapAxes: policy range, 10–150 %)', () => {
    const m = hard[0] as OperatingMapResult;
    const [t0, t1] = review.policy.temperatureRange_C;
    const p = casePoint(m, 68);
    expect(p.r).toBeCloseTo(((68 - t0) / (t1 - t0)) * 59, 12);
    expect(p.c).toBeCloseTo(((100 - 10) / 140) * 59, 12);
    expect(p.cell).toEqual({ r: Math.round(p.r), c: Math.round(p.c) });
    expect(p.inside).toBe(true);
    expect(casePoint(m, t1 + 20).inside).toBe(false);
    expect(casePoint(m, t1 + 20).cell.r).toBe(59); // held on the map's edge
  });

  it('reads a cell straight from the grids', () => {
    const m = hard[1] as OperatingMapResult;
    const v = cellValues(m, { r: 12, c: 40 });
    expect([v.temperature_C, v.loadPercent, v.lambdaMin, v.scuffingSafety, v.integralSafety, v.verdict]).toEqual([
      m.temperatures_C[12], m.loadPercent[40], m.lambdaMin[12]?.[40], m.scuffingSafety[12]?.[40], m.integralSafety[12]?.[40], m.verdict[12]?.[40],
    ]);
  });
});

describe('sentences read off the grids', () => {
  it('"holds up to" is the last load of the unbroken run of SB ≥ SB,min from the lightest load', () => {
    for (const m of maps) {
      for (const r of [0, 30, 59]) {
        const row = m.scuffingSafety[r] ?? [];
        const firstFail = row.findIndex((x) => x !== null && x < SB_MIN);
        const want = firstFail === 0 ? null : (m.loadPercent[firstFail === -1 ? row.length - 1 : firstFail - 1] ?? null);
        expect(scuffingHoldsUpTo(m, r, SB_MIN)).toBe(want);
      }
    }
  });

  it('each claim "X still holds SB ≥ SB,min; Y does not" is true of the named cell', () => {
    const names = oilPhrases(review.oils);
    expect(names).toEqual(['the oil in service', 'the proposed oil']); // the demo's roles
    const out = mapSentences(hard, names, SB_MIN, 68, say);
    expect(out[0]).toMatch(/^At [\d.]+ °C \(the row nearest/);
    const claims = out.slice(1);
    expect(claims.length).toBeGreaterThan(0);
    for (const s of claims) {
      const m = /^At ([\d.]+) °C and ([\d.]+) % load, (.+) still holds SB ≥ 1\.5; (.+) does not/.exec(s);
      expect(m, s).not.toBeNull();
      const a = names.indexOf(m?.[3] ?? '');
      const b = names.indexOf(m?.[4] ?? '');
      const r = hard[0]?.temperatures_C.findIndex((t) => t.toFixed(1) === m?.[1]) ?? -1;
      const c = hard[0]?.loadPercent.findIndex((l) => l.toFixed(1) === m?.[2]) ?? -1;
      expect([a, b, r, c].every((x) => x >= 0), s).toBe(true);
      expect(hard[a]?.scuffingSafety[r]?.[c] ?? Infinity).toBeGreaterThanOrEqual(SB_MIN);
      expect(hard[b]?.scuffingSafety[r]?.[c] ?? Infinity).toBeLessThan(SB_MIN);
    }
  });

  it('names oils by their name when a role is shared', () => {
    expect(oilPhrases([{ name: 'A', role: 'proposed' }, { name: 'B', role: 'proposed' }])).toEqual(['“A”', '“B”']);
  });
});

describe('ticks', () => {
  it('are 1, 2 or 5 × 10ⁿ apart and inside the range', () => {
    expect(niceTicks(10, 150, 7)).toEqual([20, 40, 60, 80, 100, 120, 140]);
    expect(niceTicks(68, 158, 6)).toEqual([80, 100, 120, 140]); // 20–70 °C in °F (°F = 1.8 °C + 32)
    expect(niceTicks(20, 70, 6)).toEqual([20, 30, 40, 50, 60, 70]);
    expect(niceTicks(-40, 0, 4)).toEqual([-40, -30, -20, -10, 0]);
  });
});

import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { parseReviewValue } from '../../app/review/parse';
import { run } from '../../app/review/run';
import type { Review } from '../../app/review/schema';
import { ehlPointSetup, EhlPointError } from '../../app/review/ehlPoint';
import { ehlAtPoint } from '../../app/review/ehlAtPoint';
import { FZG_PINION_SPEED_RPM, FZG_STAGE_TORQUE_NM } from '../reference/fzgTestGears';

const DEMOS = ['assets/demo/harrow-creek-crusher-hs-pair.flankfilm.json', 'assets/demo/harrow-creek-conveyor-spur-pair.flankfilm.json'];

function load(path: string, mutate: (r: Record<string, any>) => void = () => {}): Review {
  const raw = JSON.parse(readFileSync(path, 'utf8'));
  mutate(raw);
  const p = parseReviewValue(raw);
  if (!p.ok) throw new Error(JSON.stringify(p.issues));
  return p.review;
}

/**
 * The FZG A/8.3/90 test as a review: type A gear (ISO 14635-1, Höhn et al. 2008 Table 1), 2170 rpm,
 * 90 °C oil, dip; an ISO VG 100 mineral reference oil [memory], Ra 0.3 µm [memory].
 */
function fzgReview(stages: number[]): Review {
  return load(DEMOS[1] as string, (r) => {
    r.gearPair = {
      normalModule_mm: 4.5, normalPressureAngle_deg: 20, helixAngle_deg: 0, faceWidth_mm: 20, centerDistance_mm: 91.5,
      pinion: { teeth: 16, profileShift: 0.8532, tipDiameter_mm: 88.77, roughnessRa_um: 0.3, material: 'steel-carburized' },
      wheel: { teeth: 24, profileShift: -0.5, tipDiameter_mm: 112.5, roughnessRa_um: 0.3, material: 'steel-carburized' },
      components: [],
    };
    r.loadCases = stages.map((s) => ({ name: `FZG stage ${s}`, pinionSpeed_rpm: FZG_PINION_SPEED_RPM, pinionTorque_Nm: FZG_STAGE_TORQUE_NM[s - 1], applicationFactor: 1, oilTemperature_C: 90, lubrication: 'dip', timeShare: 1 / stages.length }));
    r.oils = [{ name: 'FZG reference VG 100', role: 'in-service', kv40_mm2s: 100, kv100_mm2s: 11.1, density15_kgm3: 880, baseOil: 'mineral', chemistry: 'r-and-o', fzgFailureStage: 12 }];
    r.policy = { temperatureRange_C: [20, 150] };
  });
}

describe('solver inputs at a point, as run() takes them', () => {
  it('at C and at least λ: the same oil temperature, film formula and position as the path results', () => {
    const review = load(DEMOS[0] as string);
    const results = run(review);
    for (const c of results.cases) {
      const atC = ehlPointSetup(review, { caseName: c.loadCase, oilName: c.oil as string, at: 'C' });
      expect(atC.filmTemperature_C).toBeCloseTo(c.bulkTemperature_C as number, 9);
      expect(atC.position_mm).toBeCloseTo(c.pitch.position_mm, 9);
      expect(atC.hertzStress_MPa).toBeCloseTo(c.pitch.hertzStress_MPa, 6);
      expect(atC.formulaHMin_um).toBeCloseTo(c.pitch.filmThicknessMin_um as number, 9);
      expect(atC.formulaHCentral_um).toBeCloseTo(c.pitch.filmThicknessCentral_um as number, 9);
      expect(atC.input.uMean * 2).toBeCloseTo(c.pitch.sumVelocity_mps, 9);
      const lm = ehlPointSetup(review, { caseName: c.loadCase, oilName: c.oil as string, at: 'lambda-min' });
      expect(lm.position_mm).toBeCloseTo(c.lambdaMinPosition_mm as number, 9);
      expect(lm.formulaHMin_um / lm.compositeRoughness_um).toBeCloseTo(c.lambdaMin as number, 9); // λ = h_min/σ
    }
  });

  it('refuses an unknown case or oil and a point outside A–E, saying which', () => {
    const review = load(DEMOS[0] as string);
    const name = review.loadCases[0]?.name as string;
    expect(() => ehlPointSetup(review, { caseName: 'nope', at: 'C' })).toThrow(EhlPointError);
    expect(() => ehlPointSetup(review, { caseName: 'nope', at: 'C' })).toThrow(/no load case named "nope"/);
    expect(() => ehlPointSetup(review, { caseName: name, oilName: 'nope', at: 'C' })).toThrow(/no oil named/);
    expect(() => ehlPointSetup(review, { caseName: name, at: { position_mm: 0.5 } })).toThrow(/outside the path of contact A–E/);
    try {
      ehlPointSetup(review, { caseName: name, at: { position_mm: 1e6 } });
    } catch (e) {
      expect((e as EhlPointError).what).toBe('point');
    }
  });
});

describe('convergence from a Hertzian start', () => {
  it('FZG A/8.3/90, stages 4–12, at C and at least λ', () => {
    const stages = [4, 6, 8, 10, 12];
    const review = fzgReview(stages);
    for (const s of stages) {
      for (const at of ['C', 'lambda-min'] as const) {
        const r = ehlAtPoint(review, { caseName: `FZG stage ${s}`, at });
        expect(r.converged, `stage ${s} at ${at}: ${r.stopReason}, residual ${r.residual}`).toBe(true);
        expect(r.hMin_um).toBeGreaterThan(0);
        // the published fit, as a loose sanity band at these points (Pan–Hamrock 1989 [memory])
        expect(r.hMin_um / r.panHamrockIsothermal.hMin_um).toBeGreaterThan(0.6);
        expect(r.hMin_um / r.panHamrockIsothermal.hMin_um).toBeLessThan(1.3);
      }
    }
  });

  it("the demo's duty: every case, oil and characteristic point", () => {
    for (const path of DEMOS) {
      const review = load(path);
      for (const c of review.loadCases) for (const o of review.oils) for (const at of ['A', 'C', 'E', 'lambda-min'] as const) {
        const r = ehlAtPoint(review, { caseName: c.name, oilName: o.name, at });
        expect(r.converged, `${c.name} / ${o.name} at ${at}: ${r.stopReason}, residual ${r.residual}`).toBe(true);
        expect(r.profile.every((q) => Number.isFinite(q.p_MPa) && Number.isFinite(q.h_um))).toBe(true);
      }
    }
  });
});

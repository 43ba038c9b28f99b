import { describe, expect, it } from 'vitest';
import { fzgTypeAReview } from './fzgReview';
import { run } from '../../app/review/run';
import type { Results } from '../../app/review/results';
import { FZG_STAGE_TORQUE_NM } from './fzgTestGears';

/**
 * Verdicts on the FZG type A test gear itself (ISO 14635-1: z 16/24, m 4.5 mm, a 91.5 mm, b 20 mm,
 * x1 0.8532, x2 −0.5, da 88.77/112.5 mm [src: Höhn et al. 2008, Table 1]) at its test condition
 * A/8.3/90 (2170 rpm, 90 °C, dip). The test defines the scale: an oil of failure stage S reaches its
 * scuffing temperature at stage S's torque, so with SB,min = 1.5 the duty must sit well below the
 * oil's failure stage. Oils: a VG 100 mineral oil, the class of the FZG reference oils [memory].
 */
const oil = (name: string, role: string, chemistry: string, fzgFailureStage: number) => ({
  name,
  role,
  kv40_mm2s: 100,
  kv100_mm2s: 11.1,
  density15_kgm3: 880,
  baseOil: 'mineral',
  chemistry,
  fzgFailureStage,
});
const EP12 = oil('EP gear oil, FZG 12', 'proposed', 'extreme-pressure', 12);
const RO6 = oil('R&O oil, FZG 6', 'in-service', 'r-and-o', 6);

function fzgReview(torque: number, oils: unknown[], scuffingMethods: 'flash' | 'integral' | 'both'): Results {
  return run(fzgTypeAReview([{ name: `T1 = ${torque} N·m`, pinionTorque_Nm: torque }], oils, { scuffingMethods }));
}

describe('FZG A gear with a stage-12 EP oil, flash temperature method alone (ISO/TS 6336-20, SB,min 1.5)', () => {
  it('183.4 N·m (load stage 7, ISO 14635-1): anti-wear chemistry suffices', () => {
    const r = fzgReview(183.4, [EP12], 'flash');
    expect(r.cases[0]?.verdict?.code).toBe('aw-suffices');
    expect(r.need?.chemistry).not.toBe('extreme-pressure');
  });
  it('330 N·m (between stages 9 and 10): EP chemistry warranted, stage 11 or 12 needed, and the stage-12 EP oil meets it', () => {
    const r = fzgReview(330, [EP12], 'flash');
    const v = r.cases[0]?.verdict;
    expect(v?.code).toBe('ep-warranted');
    expect([11, 12]).toContain(v?.neededFzgStage);
    expect(v?.shortfalls).not.toContain('fzg-stage');
    expect(v?.governingMethod).toBe('flash');
  });
  it('534.5 N·m (load stage 12, the oil\'s own failure load): beyond oil chemistry', () => {
    expect(fzgReview(534.5, [EP12], 'flash').cases[0]?.verdict?.code).toBe('beyond-oil');
  });
});

describe('FZG A gear, both methods: no absurd verdict on the test gear itself', () => {
  it('load stage 4 (60.8 N·m) with a stage-12 EP oil: anti-wear chemistry suffices (it was "EP warranted" with θintS = θMT alone)', () => {
    const r = fzgReview(FZG_STAGE_TORQUE_NM[3], [EP12], 'both');
    expect(r.cases[0]?.verdict?.code).toBe('aw-suffices');
    expect(r.cases[0]?.verdict?.shortfalls).toEqual(['film']); // the test gear runs at λ ≈ 0.3: only the film is short
  });
  it('load stage 6 (135.3 N·m): not beyond oil (it was "beyond oil" before)', () => {
    expect(fzgReview(FZG_STAGE_TORQUE_NM[5], [EP12], 'both').cases[0]?.verdict?.code).not.toBe('beyond-oil');
  });
  it('with both methods the more demanding governs: the need is the larger of the two stages', () => {
    const r = fzgReview(183.4, [EP12], 'both');
    const c = r.cases[0]!;
    const num = (s: number | '>12' | null) => (s === '>12' ? 13 : (s ?? 0));
    expect(num(c.verdict?.neededFzgStage ?? null)).toBe(Math.max(num(c.requiredFzgStage), num(c.requiredFzgStageIntegral)));
    expect(r.need?.governingMethod).toBe(num(c.requiredFzgStageIntegral) > num(c.requiredFzgStage) ? 'integral' : 'flash');
  });
});

describe('change findings on the FZG A gear (flash method; the need follows from the FZG scale above)', () => {
  // 302 N·m is load stage 9: with SB,min 1.5 the duty needs stage 11 (θS(11) = 352 °C against θB,max ≈ 259 °C).
  it('R&O FZG 6 → EP FZG 12 on a duty that needs stage 11: supported, with conditions where the film stays short', () => {
    const r = fzgReview(302, [RO6, EP12], 'flash');
    expect(r.need?.fzgStageFlash).toBe(11);
    const ch = r.changes.find((c) => c.to === EP12.name);
    expect(ch?.from).toBe(RO6.name);
    expect(ch?.finding).toBe('supported-with-conditions'); // the FZG A gear runs in boundary lubrication (λmin ≈ 0.1)
    expect(ch?.conditions.join(' ')).toMatch(/λmin ≥ 1/); // the policy's λ target (default 1)
    expect(ch?.statement).toMatch(/below the λ target/);
    expect(ch?.byCase[0]?.before.oilFzgStage).toBe(6);
    expect(ch?.byCase[0]?.after.oilFzgStage).toBe(12);
  });
  it('with a λ target the film meets and a micropitting stage that meets the need, the same change is supported without conditions', () => {
    const r = fzgReviewWithTarget(302, [RO6, { ...EP12, micropittingFailureStage: 10 }], 0.05);
    expect(r.cases[1]?.verdict?.micropitting).toBe('meets');
    expect(r.changes[0]?.finding).toBe('supported');
  });
  it('the same change with the proposed oil\'s micropitting stage not given, where the screen flags micropitting (λGF,min < 1): supported with a condition that asks for it', () => {
    const r = fzgReviewWithTarget(302, [RO6, EP12], 0.05);
    expect(r.cases[1]?.micropitting?.lambdaGFMin).toBeLessThan(1);
    expect(r.changes[0]?.finding).toBe('supported-with-conditions');
    expect(r.changes[0]?.conditions.join(' ')).toMatch(/micropitting failure stage .* not given/);
  });
  it('the reverse change, EP FZG 12 → R&O FZG 6, is not supported: short on chemistry and FZG stage', () => {
    const r = fzgReview(302, [{ ...EP12, role: 'in-service' }, { ...RO6, role: 'proposed' }], 'flash');
    const ch = r.changes[0];
    expect(ch?.finding).toBe('not-supported');
    expect(ch?.statement).toMatch(/not supported/);
    expect(ch?.statement).toMatch(/chemistry/);
    expect(ch?.statement).toMatch(/FZG stage/);
  });
});

function fzgReviewWithTarget(torque: number, oils: unknown[], lambdaTarget: number): Results {
  return run(fzgTypeAReview([{ name: 'stage 9', pinionTorque_Nm: torque }], oils, { scuffingMethods: 'flash', lambdaTarget }));
}

import { describe, expect, it } from 'vitest';
import { fzgTypeAReview } from '../reference/fzgReview';
import { run } from '../../app/review/run';

/**
 * The governing case is the one with the least margin, not the first listed (a safety decision
 * follows its weakest case). FZG type A gear (ISO 14635-1, Höhn 2008 Table 1) at 2170 rpm, 90 °C:
 * load stages 6 and 7 (135.3 and 183.4 N·m, ISO 14635-1) both give "anti-wear chemistry suffices"
 * by the flash method with a stage-12 oil; stage 7 has the smaller SB because the flash
 * temperature rises with load (ISO/TS 6336-20).
 */
const review = (policy: Record<string, unknown>) =>
  fzgTypeAReview(
    [
      { name: 'stage 6', pinionTorque_Nm: 135.3, timeShare: 0.9 },
      { name: 'stage 7', pinionTorque_Nm: 183.4, timeShare: 0.1 },
    ],
    [{ name: 'EP 12', kv40_mm2s: 100, kv100_mm2s: 11.1, density15_kgm3: 880, baseOil: 'mineral', chemistry: 'extreme-pressure', fzgFailureStage: 12 }],
    policy,
  );

describe('governing case', () => {
  it('same verdict word in both cases: the one with the smaller SB/SB,min governs, although it is listed second and has the smaller time share', () => {
    const r = run(review({ scuffingMethods: 'flash' }));
    expect(r.cases.map((c) => c.verdict?.code)).toEqual(['aw-suffices', 'aw-suffices']);
    expect((r.cases[1]?.scuffingSafety ?? 9) < (r.cases[0]?.scuffingSafety ?? 0)).toBe(true);
    expect(r.verdicts[0]?.governingLoadCase).toBe('stage 7');
    expect(r.need?.governingLoadCase).toBe('stage 7');
  });
  it('the worst figure of each check names its case and its pass or fail against the policy minimum', () => {
    const r = run(review({ scuffingMethods: 'both' }));
    const sb = r.verdicts[0]?.checks.find((k) => k.quantity === 'scuffingSafety');
    expect(sb?.loadCase).toBe('stage 7');
    expect(sb?.pass).toBe((sb?.value ?? 0) >= 1.5);
    const lam = r.verdicts[0]?.checks.find((k) => k.quantity === 'lambdaMin');
    expect(lam?.pass).toBe(false); // the FZG A gear runs in boundary lubrication (λ < 1), common practice for the test
  });
  it('with the flash method alone no integral figure is checked, and the need has no integral stage', () => {
    const r = run(review({ scuffingMethods: 'flash' }));
    expect(r.cases[0]?.verdict?.checks.map((k) => k.symbol)).toEqual(['SB', 'λmin', 'Sλ']);
    expect(r.need?.fzgStageIntegral).toBeNull();
    expect(r.need?.methods).toBe('flash');
  });
  it('the need reads as sentences: the micropitting part inside the first, each sentence ending in a full stop', () => {
    const r = run(review({ scuffingMethods: 'both' }));
    const statement = r.need?.statement ?? '';
    expect(r.need?.micropittingStage).not.toBeNull(); // the micropitting need is known, so its part is in the statement
    expect(statement).toContain('against micropitting');
    expect(statement).not.toMatch(/\.;|\)\s+[A-Z]|;\s*$/);
    expect(statement).toMatch(/\.$/);
    expect(statement.indexOf('against micropitting')).toBeLessThan(statement.indexOf('Governed by'));
  });
});

describe('the retired integral-method calibration', () => {
  it('a file that still carries policy.integralFlashCalibration opens, and the factor no longer changes anything', () => {
    const withKey = run(review({ scuffingMethods: 'both', integralFlashCalibration: 0.44 }));
    const without = run(review({ scuffingMethods: 'both' }));
    expect(withKey.cases[1]?.integralSafety).toBe(without.cases[1]?.integralSafety);
  });
});

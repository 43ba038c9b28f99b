import { describe, expect, it } from 'vitest';
import { decideVerdict } from '../../../app/engine/verdict/decide';
import type { VerdictFacts, VerdictPolicy } from '../../../app/engine/verdict/types';

/** Policy defaults: AW floor FZG 10 (DIN 51524-2 HLP), EP floor FZG 12 (DIN 51517-3 CLP), SB,min 1.5, SintS,min 1.8. */
const policy: VerdictPolicy = { lambdaTarget: 1, scuffingSafetyMin: 1.5, integralSafetyMin: 1.8, antiWearOilFzgStage: 10, epOilFzgStage: 12, shockApplicationFactor: 1.75, scuffingMethods: 'both', micropittingSafetyMin: 1 };

// Synthetic facts for the rule logic, not a gear: the expected codes follow from the published
// floors above (and common practice where a rule says so), which is what these tests check.
const base: VerdictFacts = {
  caseName: 'case',
  oilName: 'oil',
  chemistry: 'anti-wear',
  baseOil: 'mineral',
  oilFzgStage: 11,
  oilIsoVG: 220,
  applicationFactor: 1.25,
  oilTemperature_C: 60,
  pitchLineVelocity_mps: 5,
  maxHertzStress_MPa: 1200,
  lambdaMin: 1.4,
  lambdaGFMin: 2.4,
  regime: 'mixed',
  compositeRoughness_um: 0.5,
  filmMin_um: 0.7,
  maxContactTemperature_C: 150,
  scuffingTemperature_C: 352,
  scuffingTemperatureAtLeast: false,
  scuffingSafety: 3.2,
  integralSafety: 2.5,
  integralSafetyAtEpFloor: 2.9,
  requiredStage: 7,
  requiredStageIntegral: 6,
  scuffingProbability: 0.001,
  micropitting: null,
  components: [],
  otherOils: [],
  role: 'proposed',
};
const with_ = (o: Partial<VerdictFacts>): VerdictFacts => ({ ...base, ...o });

describe('verdict codes from the published floors', () => {
  it('aw-suffices: stage 7 needed ≤ the AW floor 10 (DIN 51524-2), mixed film, no escalation', () => {
    const v = decideVerdict(base, policy);
    expect(v.code).toBe('aw-suffices');
    expect(v.oilFit).toBe('meets'); // an AW oil of stage 11 ≥ 7, λ 1.4 ≥ 1
  });
  it('ep-warranted: stage 11 needed lies above the AW floor 10 and within the EP floor 12 (DIN 51517-3)', () => {
    const v = decideVerdict(with_({ requiredStage: 11 }), policy);
    expect(v.code).toBe('ep-warranted');
    expect(v.oilFit).toBe('falls-short'); // anti-wear chemistry where EP is warranted
    expect(decideVerdict(with_({ requiredStage: 11, chemistry: 'extreme-pressure', oilFzgStage: '>12' }), policy).oilFit).toBe('meets');
  });
  it('beyond-oil: a need above stage 12, the EP floor — no oil in scope gives SB ≥ 1.5; the reasons say what to change', () => {
    const v = decideVerdict(with_({ requiredStage: '>12', chemistry: 'extreme-pressure', oilFzgStage: '>12' }), policy);
    expect(v.code).toBe('beyond-oil');
    expect(v.oilFit).toBe('falls-short');
    const text = v.reasons.map((r) => r.text).join(' ');
    for (const lever of ['load', 'speed', 'sump', 'Ra', 'tip relief', 'material']) expect(text).toContain(lever);
  });
  it('beyond-oil: the integral method fails even with an oil at the EP floor (SintS < 1.8, ISO/TS 6336-21 policy minimum)', () => {
    expect(decideVerdict(with_({ integralSafetyAtEpFloor: 1.6 }), policy).code).toBe('beyond-oil');
  });
});

describe('escalation and fit rules', () => {
  it('shock duty (KA ≥ 1.75) with boundary lubrication escalates to EP (common practice)', () => {
    const v = decideVerdict(with_({ applicationFactor: 2, regime: 'boundary', lambdaMin: 0.5 }), policy);
    expect(v.code).toBe('ep-warranted');
    expect(v.reasons.map((r) => r.rule)).toContain('escalation.shock-boundary');
  });
  it('shock duty with a good film does not escalate', () => {
    expect(decideVerdict(with_({ applicationFactor: 2 }), policy).code).toBe('aw-suffices');
  });
  it('boundary alone does not make EP warranted, but rules out an R&O oil (at least AW chemistry)', () => {
    const boundary = { regime: 'boundary' as const, lambdaMin: 0.6 };
    const aw = decideVerdict(with_({ ...boundary }), policy);
    expect(aw.code).toBe('aw-suffices');
    const rando = decideVerdict(with_({ ...boundary, chemistry: 'r-and-o' }), policy);
    expect(rando.code).toBe('aw-suffices');
    expect(rando.oilFit).toBe('falls-short');
    expect(rando.reasons.find((r) => r.rule === 'oil.chemistry')?.text).toMatch(/at least anti-wear/);
  });
  it('an R&O oil with a full film and a low need meets', () => {
    expect(decideVerdict(with_({ chemistry: 'r-and-o', regime: 'full-film', lambdaMin: 3.5, oilFzgStage: 8 }), policy).oilFit).toBe('meets');
  });
  it('a λ shortfall asks for a grade, not for EP', () => {
    const v = decideVerdict(with_({ lambdaMin: 0.8 }), policy);
    expect(v.code).toBe('aw-suffices');
    expect(v.oilFit).toBe('falls-short');
    expect(v.gradeAdvice).toMatch(/grade finder/);
    expect(v.reasons.find((r) => r.rule === 'film.lambda-target')?.text).toMatch(/EP chemistry does not/);
  });
  it('an oil whose own stage is below the need falls short', () => {
    expect(decideVerdict(with_({ oilFzgStage: 6 }), policy).oilFit).toBe('falls-short');
  });
  it('every reason carries its threshold and source', () => {
    for (const r of decideVerdict(with_({ requiredStage: 11, regime: 'boundary', lambdaMin: 0.5, applicationFactor: 2 }), policy).reasons) {
      expect(r.threshold.length).toBeGreaterThan(3);
      expect(r.source.length).toBeGreaterThan(3);
    }
  });
});

describe('cautions', () => {
  it('always defer to the maker, local codes and a licensed engineer', () => {
    const c = decideVerdict(base, policy).cautions.find((x) => x.id === 'defer');
    expect(c?.kind).toBe('triggered');
    expect(c?.text).toMatch(/gearbox maker's lubricant list/);
    expect(c?.text).toMatch(/licensed engineer/);
  });
  it('yellow metals with EP chemistry trigger the copper-corrosion caution; without EP it stays standing', () => {
    const ep = decideVerdict(with_({ components: ['bronze-bushing'], chemistry: 'extreme-pressure', requiredStage: 11 }), policy);
    expect(ep.cautions.find((x) => x.id === 'yellow-metals')?.kind).toBe('triggered');
    const aw = decideVerdict(with_({ components: ['bronze-bushing'] }), policy);
    expect(aw.cautions.find((x) => x.id === 'yellow-metals')?.kind).toBe('standing');
  });
  it('a backstop triggers the friction caution; a hot sump the oxidation caution; a change of chemistry the flushing caution', () => {
    const v = decideVerdict(with_({ components: ['backstop'], oilTemperature_C: 85, otherOils: [{ chemistry: 'r-and-o', baseOil: 'mineral', role: 'in-service' }] }), policy);
    const kind = (id: string) => v.cautions.find((x) => x.id === id)?.kind;
    expect(kind('friction-sensitive')).toBe('triggered');
    expect(kind('oxidation')).toBe('triggered');
    expect(kind('flushing')).toBe('triggered');
    expect(kind('food-contact')).toBe('standing');
  });
});

describe('micropitting: a finding of its own, never a reason for EP (ISO/TS 6336-22 [memory]; EP caveat common practice)', () => {
  const mp = (safety: number | null, oilStage: number | '>10' | null, requiredStage: number | '>10' = 8) =>
    with_({ micropitting: { lambdaGFMin: 0.3, lambdaGFP: safety === null ? null : 0.3 / safety, safety, safetyAtLeast: oilStage === '>10', oilStage, requiredStage, materialFactor: 1 } });
  it('short: a shortfall of the oil, and the code is the one without micropitting', () => {
    const v = decideVerdict(mp(0.8, 7), policy);
    expect(v.micropitting).toBe('short');
    expect(v.shortfalls).toContain('micropitting');
    expect(v.oilFit).toBe('falls-short');
    expect(v.code).toBe(decideVerdict(base, policy).code);
    expect(v.reasons.find((r) => r.rule === 'micropitting.safety')?.text).toMatch(/some EP additive systems lower it/);
  });
  it('meets at Sλ ≥ Sλ,min; an oil rated above 10 meets a need within the scale on its lower bound', () => {
    expect(decideVerdict(mp(1.2, 9), policy).micropitting).toBe('meets');
    expect(decideVerdict(mp(0.9, '>10', 9), policy).micropitting).toBe('meets');
    expect(decideVerdict(mp(0.9, '>10', '>10'), policy).micropitting).toBe('short');
  });
  it('unknown without a stage: no shortfall, and the reason asks for the stage', () => {
    const v = decideVerdict(mp(null, null), policy);
    expect(v.micropitting).toBe('unknown');
    expect(v.shortfalls).not.toContain('micropitting');
    expect(v.reasons.find((r) => r.rule === 'micropitting.safety')?.text).toMatch(/not given/);
  });
  it('a policy minimum of 0.7 turns the Sλ = 0.8 oil into one that meets', () => {
    expect(decideVerdict(mp(0.8, 7), { ...policy, micropittingSafetyMin: 0.7 }).micropitting).toBe('meets');
  });
});

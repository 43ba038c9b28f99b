import { describe, expect, it } from 'vitest';
import { DEMO_REVIEWS } from '../../app/review/demo';
import { parseReviewValue } from '../../app/review/parse';
import { run } from '../../app/review/run';
import { gearSetKind } from '../../renderer/state/gearSet';
import { docReducer, draftPower, draftTorque, initialDocState, type Draft } from '../../renderer/state/reviewState';

const demo = (f: string) => structuredClone(DEMO_REVIEWS[f]) as Draft;
const PAIR = 'harrow-creek-conveyor-spur-pair.flankfilm.json';
const STAGE = 'harrow-creek-ball-mill-planetary.flankfilm.json';
const apply = (draft: Draft, ...actions: Parameters<typeof docReducer>[1][]) => actions.reduce((s, a) => docReducer(s, a), docReducer(initialDocState, { type: 'load', draft, handle: null })).draft as Draft;
const valid = (d: Draft) => {
  const p = parseReviewValue(d);
  if (!p.ok) throw new Error(JSON.stringify(p.issues));
  return p.review;
};

describe('gear set kind, chosen first', () => {
  it('external → planetary gives a valid stage review that runs; the pinion speed and torque become the sun’s', () => {
    const d = apply(demo(PAIR), { type: 'setGearSet', kind: 'planetary' });
    expect(gearSetKind(d)).toBe('planetary');
    expect(d.gearPair).toBeUndefined();
    const r = valid(d);
    expect(r.loadCases[0]?.sunSpeed_rpm).toBe(300); // the demo's pinion speed
    expect(r.loadCases[0]?.sunTorque_Nm).toBe(7000);
    expect(run(r).meshes).toHaveLength(2);
  });
  it('planetary → external and → internal give valid pair reviews', () => {
    for (const kind of ['external', 'internal'] as const) {
      const d = apply(demo(STAGE), { type: 'setGearSet', kind });
      expect(gearSetKind(d)).toBe(kind);
      const r = valid(d);
      expect(r.planetary).toBeUndefined();
      expect(r.loadCases[0]?.pinionSpeed_rpm).toBe(990);
      expect(() => run(r)).not.toThrow();
    }
  });
  it('external ↔ internal only sets the kind (and a ring with room for the pinion)', () => {
    const d = apply(demo(PAIR), { type: 'setGearSet', kind: 'internal' });
    expect((d.gearPair as Record<string, unknown>).kind).toBe('internal');
    expect(valid(d).gearPair?.wheel.teeth).toBe(77); // 77 ≥ 19 + 10 kept
    const back = apply(d, { type: 'setGearSet', kind: 'external' });
    expect('kind' in (back.gearPair as Record<string, unknown>)).toBe(false);
  });
  it('holding the sun moves each case’s input speed to the carrier; power ↔ torque uses P = T_sun (1 + zR/zS) ωC', () => {
    const d = apply(demo(STAGE), { type: 'setHeld', held: 'sun' });
    const r = valid(d);
    expect(r.loadCases[0]?.carrierSpeed_rpm).toBe(990);
    expect(r.loadCases[0]?.sunSpeed_rpm).toBeUndefined();
    // Case 0 gives 1100 kW at 990 rpm: T_sun = 1.1e6/((1 + 87/21)·2π·990/60) = 2063.12 N·m.
    expect(draftTorque(d, 0)).toBeCloseTo(2063.12, 1);
    // Case 1 gives 14 000 N·m at 60 rpm: P = 14 000·(108/21)·2π·60/60/1000 = 452.39 kW.
    expect(draftPower(d, 1)).toBeCloseTo(452.39, 1);
  });
  it('typing the torque on a planetary case keeps the sun torque and drops the power', () => {
    const d = apply(demo(STAGE), { type: 'setDrive', index: 0, given: 'torque', value: 9000 });
    const lc = (d.loadCases as Record<string, unknown>[])[0] as Record<string, unknown>;
    expect(lc.sunTorque_Nm).toBe(9000);
    expect(lc.power_kW).toBeUndefined();
    expect(lc.pinionTorque_Nm).toBeUndefined();
  });
});

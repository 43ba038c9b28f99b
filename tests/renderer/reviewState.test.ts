import { describe, it, expect } from 'vitest';
import { DEMO_REVIEWS } from '../../app/review/demo';
import { parseReviewValue } from '../../app/review/parse';
import { getIn, setIn } from '../../renderer/state/paths';
import { docReducer, draftPower, draftText, draftTorque, initialDocState, type Draft } from '../../renderer/state/reviewState';
import { newLoadCase, newReviewDraft } from '../../renderer/state/templates';
import { diffInputs } from '../../app/review/audit/diff';
import { undoEdit } from '../../app/review/audit/undo';

const demo = () => structuredClone(DEMO_REVIEWS['harrow-creek-crusher-hs-pair.flankfilm.json']) as Draft;
const loaded = () => docReducer(initialDocState, { type: 'load', draft: demo(), handle: null });

describe('paths', () => {
  it('setIn copies along the path and shares the rest', () => {
    const root = { a: { b: 1 }, c: [{ d: 2 }, { d: 3 }] };
    const next = setIn(root, ['c', 1, 'd'], 4);
    expect(next.c[1]?.d).toBe(4);
    expect(root.c[1]?.d).toBe(3);
    expect(next.a).toBe(root.a);
    expect(next.c[0]).toBe(root.c[0]);
  });
  it('setIn with undefined removes the key (an optional input left empty)', () => {
    const next = setIn({ gearPair: { centerDistance_mm: 200, faceWidth_mm: 70 } }, ['gearPair', 'centerDistance_mm'], undefined);
    expect(next.gearPair).toEqual({ faceWidth_mm: 70 });
    expect('centerDistance_mm' in next.gearPair).toBe(false);
  });
  it('getIn reads through arrays and returns undefined past the end', () => {
    expect(getIn(demo(), ['loadCases', 1, 'name'])).toBe('Hard-rock peak');
    expect(getIn(demo(), ['loadCases', 9, 'name'])).toBeUndefined();
  });
});

describe('docReducer', () => {
  it('an edit returns a new state, dirty, with a newer edition; the old state is untouched', () => {
    const s0 = loaded();
    const s1 = docReducer(s0, { type: 'set', path: ['gearPair', 'faceWidth_mm'], value: 72 });
    expect(s1).not.toBe(s0);
    expect(s1.dirty).toBe(true);
    expect(s1.edition).toBe(s0.edition + 1);
    expect(getIn(s1.draft, ['gearPair', 'faceWidth_mm'])).toBe(72);
    expect(getIn(s0.draft, ['gearPair', 'faceWidth_mm'])).toBe(70);
  });
  it('setting the same value is no edit', () => {
    const s0 = loaded();
    expect(docReducer(s0, { type: 'set', path: ['gearPair', 'faceWidth_mm'], value: 70 })).toBe(s0);
  });
  it('torque typed over a power-given case keeps exactly one of the two, and the schema accepts it', () => {
    const s1 = docReducer(loaded(), { type: 'setDrive', index: 0, given: 'torque', value: 1500 });
    const c = getIn(s1.draft, ['loadCases', 0]) as Record<string, unknown>;
    expect(c.pinionTorque_Nm).toBe(1500);
    expect('power_kW' in c).toBe(false);
    expect(parseReviewValue(s1.draft).ok).toBe(true);
    const s2 = docReducer(s1, { type: 'setDrive', index: 0, given: 'power', value: 150 });
    const c2 = getIn(s2.draft, ['loadCases', 0]) as Record<string, unknown>;
    expect(c2.power_kW).toBe(150);
    expect('pinionTorque_Nm' in c2).toBe(false);
  });
  it('P = T1 ω1: 1000 N·m at 1500 rpm is 157.08 kW, and back', () => {
    const s = docReducer(loaded(), { type: 'setDrive', index: 0, given: 'torque', value: 1000 });
    const withSpeed = docReducer(s, { type: 'set', path: ['loadCases', 0, 'pinionSpeed_rpm'], value: 1500 });
    expect(draftPower(withSpeed.draft!, 0)).toBeCloseTo((1000 * 2 * Math.PI * 1500) / 60 / 1000, 9); // ω = 2π n/60 (definition)
    expect(draftPower(withSpeed.draft!, 0)).toBeCloseTo(157.0796, 4);
    const back = docReducer(withSpeed, { type: 'setDrive', index: 0, given: 'power', value: 157.07963267948966 });
    expect(draftTorque(back.draft!, 0)).toBeCloseTo(1000, 9);
  });
  it('adds and removes load cases and oils; toggles a component', () => {
    let s = loaded();
    s = docReducer(s, { type: 'addItem', list: 'oils', item: { name: 'x' } });
    expect((getIn(s.draft, ['oils']) as unknown[]).length).toBe(3);
    s = docReducer(s, { type: 'removeItem', list: 'loadCases', index: 0 });
    expect(getIn(s.draft, ['loadCases', 0, 'name'])).toBe('Hard-rock peak');
    s = docReducer(s, { type: 'toggleComponent', component: 'clutch', on: true });
    expect(getIn(s.draft, ['gearPair', 'components'])).toEqual(['backstop', 'clutch']);
    s = docReducer(s, { type: 'toggleComponent', component: 'backstop', on: false });
    expect(getIn(s.draft, ['gearPair', 'components'])).toEqual(['clutch']);
  });
  it('saved clears dirty and keeps the handle and name; load resets', () => {
    const s = docReducer(docReducer(loaded(), { type: 'set', path: ['title'], value: 'T' }), { type: 'saved', handle: 'doc-00000000-0000-4000-8000-000000000000', name: 'x.flankfilm.json' });
    expect(s.dirty).toBe(false);
    expect(s.handle).toBe('doc-00000000-0000-4000-8000-000000000000');
    expect(s.name).toBe('x.flankfilm.json');
  });
  it('the text written is a valid review file; a new review waits for the user’s own values', () => {
    expect(parseReviewValue(JSON.parse(draftText(demo()))).ok).toBe(true);
    const fresh = parseReviewValue(newReviewDraft('helical'));
    expect(fresh.ok).toBe(false);
    if (!fresh.ok) expect(fresh.issues.map((i) => i.path)).toContain('gearPair.normalModule_mm');
    expect(JSON.stringify(newReviewDraft('spur'))).not.toMatch(/Harrow|DEMO|invented/i);
  });
  it('a new load case keeps the machine’s speed and oil temperature, leaves the load to enter, and takes the time left over', () => {
    const cases = [{ name: 'A', pinionSpeed_rpm: 300, pinionTorque_Nm: 7000, oilTemperature_C: 55, lubrication: 'dip', timeShare: 0.85 }];
    const next = newLoadCase(cases[0], cases);
    expect(next).toMatchObject({ name: 'Load case 2', pinionSpeed_rpm: 300, oilTemperature_C: 55, lubrication: 'dip', timeShare: 0.15 });
    expect(next.pinionTorque_Nm).toBeUndefined();
    expect(next.power_kW).toBeUndefined();
    // shares already fill the time: the new share is left to be entered
    expect(newLoadCase(cases[0], [{ ...cases[0], timeShare: 1 }]).timeShare).toBeUndefined();
  });
});

describe('changes since signing, as the editor makes them', () => {
  const inputs = (d: Draft) => {
    const { format: _f, version: _v, signoff: _s, ...rest } = d;
    return rest as never;
  };

  it('two edits are two changes: a KV40 that leaves the VI to ASTM D2270 names the VI on the line of the KV40', () => {
    const signed = inputs(demo());
    let s = docReducer(loaded(), { type: 'set', path: ['loadCases', 1, 'oilTemperature_C'], value: 75 });
    s = docReducer(s, { type: 'set', path: ['oils', 0, 'kv40_mm2s'], value: 240 });
    expect(getIn(s.draft, ['oils', 0, 'viscosityIndex'])).toBeUndefined(); // the demo's VI 97 follows the new KV40
    const changes = diffInputs(signed, inputs(s.draft!));
    expect(changes.map((c) => c.path)).toEqual(['loadCases[1].oilTemperature_C', 'oils[0].kv40_mm2s']);
    expect(changes[1]!.along?.map((c) => c.path)).toEqual(['oils[0].viscosityIndex']);
    // "undo this change" on each, through the editor, gives the signed inputs back, VI and all
    for (const c of [...changes].reverse()) {
      const u = undoEdit(s.draft, signed, c);
      s = docReducer(s, { type: 'set', path: u.path, value: u.value });
    }
    expect(diffInputs(signed, inputs(s.draft!))).toEqual([]);
    expect(getIn(s.draft, ['oils', 0])).toMatchObject({ kv40_mm2s: 220, viscosityIndex: 97 });
  });
});

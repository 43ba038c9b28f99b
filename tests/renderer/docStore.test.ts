import { describe, expect, it } from 'vitest';
import { DEMO_REVIEWS } from '../../app/review/demo';
import { sameFieldProps } from '../../renderer/components/fields/sameProps';
import { DocStore } from '../../renderer/state/docStore';
import type { FieldPath } from '../../renderer/state/paths';
import type { Draft } from '../../renderer/state/reviewState';

const demo = () => structuredClone(DEMO_REVIEWS['harrow-creek-crusher-hs-pair.flankfilm.json']) as Draft;
const FACE: FieldPath = ['gearPair', 'faceWidth_mm'];
const TORQUE: FieldPath = ['loadCases', 0, 'pinionTorque_Nm'];
const OIL_TEMP: FieldPath = ['loadCases', 1, 'oilTemperature_C'];

/** A store with the demo open and a counter of notifications per watched field (and for the whole document). */
function watched(...paths: FieldPath[]) {
  const store = new DocStore();
  store.dispatch({ type: 'load', draft: demo(), handle: null });
  const told = new Map<string, number>();
  const unsubscribe = paths.map((p) => store.subscribeField(p, () => told.set(p.join('.'), (told.get(p.join('.')) ?? 0) + 1)));
  let doc = 0;
  store.subscribe(() => (doc += 1));
  return { store, count: (p: FieldPath) => told.get(p.join('.')) ?? 0, docCount: () => doc, unsubscribe };
}

describe('DocStore: an edit tells only the inputs it changes', () => {
  it('setting one field notifies that field and the document, not the other fields', () => {
    const { store, count, docCount } = watched(FACE, TORQUE, OIL_TEMP);
    store.dispatch({ type: 'set', path: TORQUE, value: 1234 });
    expect(count(TORQUE)).toBe(1);
    expect(count(FACE)).toBe(0);
    expect(count(OIL_TEMP)).toBe(0);
    expect(docCount()).toBe(1);
    expect(store.valueAt(TORQUE)).toBe(1234);
    expect(store.getState().edition).toBe(2);
  });

  it('an edit that changes nothing notifies nobody and keeps the state', () => {
    const { store, count, docCount } = watched(FACE);
    const before = store.getState();
    store.dispatch({ type: 'set', path: FACE, value: store.valueAt(FACE) });
    expect(store.getState()).toBe(before);
    expect(count(FACE)).toBe(0);
    expect(docCount()).toBe(0);
  });

  it('the parts of the draft an edit did not touch keep their identity (stable snapshots)', () => {
    const { store } = watched();
    const wheel = store.valueAt(['gearPair', 'wheel']);
    const oils = store.valueAt(['oils']);
    store.dispatch({ type: 'set', path: FACE, value: 71 });
    expect(store.valueAt(['gearPair', 'wheel'])).toBe(wheel);
    expect(store.valueAt(['oils'])).toBe(oils);
    expect(store.valueAt(['gearPair'])).not.toBe(undefined);
  });

  it('a value the schema refuses gives its field a message, told to that field only; the messages array stays the same object', () => {
    const { store, count } = watched(FACE, OIL_TEMP);
    store.dispatch({ type: 'set', path: FACE, value: 'wide' });
    expect(count(FACE)).toBe(1);
    expect(count(OIL_TEMP)).toBe(0);
    expect(store.getParsed().review).toBeNull();
    const first = store.messagesAt('gearPair.faceWidth_mm');
    expect(first).toEqual(['enter a number']);
    expect(store.messagesAt('gearPair.faceWidth_mm')).toBe(first);
    // Another edit while the draft stays invalid: the issues are parsed afresh, the face width's words are the same.
    store.dispatch({ type: 'set', path: OIL_TEMP, value: 65 });
    expect(count(FACE)).toBe(1);
    expect(count(OIL_TEMP)).toBe(1);
    expect(store.messagesAt('gearPair.faceWidth_mm')).toBe(first);
    expect(store.messagesAt('loadCases[1].oilTemperature_C')).toEqual([]);
    // Mended: the message goes, and the field is told.
    store.dispatch({ type: 'set', path: FACE, value: 70 });
    expect(count(FACE)).toBe(2);
    expect(store.messagesAt('gearPair.faceWidth_mm')).toEqual([]);
    expect(store.getParsed().review).not.toBeNull();
  });

  it("run()'s refusal shows at its field while the draft is valid, and not while it is invalid", () => {
    const { store, count } = watched(FACE, TORQUE);
    store.setEngineError({ field: 'gearPair.faceWidth_mm', code: 'engine.input', message: 'too narrow for the module' });
    expect(count(FACE)).toBe(1);
    expect(count(TORQUE)).toBe(0);
    expect(store.messagesAt('gearPair.faceWidth_mm')).toEqual(['too narrow for the module']);
    store.dispatch({ type: 'set', path: OIL_TEMP, value: 'warm' });
    expect(store.messagesAt('gearPair.faceWidth_mm')).toEqual([]);
    expect(count(FACE)).toBe(2);
    store.setEngineError(null);
    store.dispatch({ type: 'set', path: OIL_TEMP, value: 65 });
    expect(store.messagesAt('gearPair.faceWidth_mm')).toEqual([]);
  });

  it('opening another review tells every field whose value differs, and one that unsubscribed is told nothing', () => {
    const { store, count, unsubscribe } = watched(FACE, TORQUE, OIL_TEMP);
    unsubscribe[2]?.();
    const other = demo();
    (other.gearPair as Record<string, unknown>).faceWidth_mm = 90;
    (other.loadCases as Record<string, unknown>[])[1]!.oilTemperature_C = 77;
    store.dispatch({ type: 'load', draft: other, handle: null });
    expect(count(FACE)).toBe(1);
    expect(count(TORQUE)).toBe(0);
    expect(count(OIL_TEMP)).toBe(0);
    expect(store.valueAt(OIL_TEMP)).toBe(77);
  });

  it('parsedOf answers for the state a render holds, even an older one', () => {
    const { store } = watched();
    const old = store.getState().draft;
    store.dispatch({ type: 'set', path: FACE, value: 'x' });
    expect(store.parsedOf(store.getState().draft).review).toBeNull();
    expect(store.parsedOf(old).review).not.toBeNull();
  });
});

describe('sameFieldProps: the memoised inputs compare paths and options by their elements', () => {
  const f = () => undefined;
  it('equal when paths and options are new arrays with the same elements, and callbacks differ', () => {
    expect(sameFieldProps({ path: ['oils', 0, 'name'], options: [['a', 'A'] as const], onValue: f }, { path: ['oils', 0, 'name'], options: [['a', 'A'] as const], onValue: () => 1 })).toBe(true);
  });
  it('unequal when a path element, an option, a value or the set of props differs', () => {
    expect(sameFieldProps({ path: ['oils', 0, 'name'] }, { path: ['oils', 1, 'name'] })).toBe(false);
    expect(sameFieldProps({ options: [['a', 'A']] }, { options: [['a', 'B']] })).toBe(false);
    expect(sameFieldProps({ value: 1 as number | undefined }, { value: 2 })).toBe(false);
    expect(sameFieldProps({ value: 1 as number | undefined, note: undefined as string | undefined }, { value: 1, note: 'from the torque' })).toBe(false);
    expect(sameFieldProps<{ note?: string }>({}, { note: undefined })).toBe(false);
  });
});

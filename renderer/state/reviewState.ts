import { getIn, setIn, type FieldPath } from './paths';
import { caseKeys, gearSetRoot, powerFactor, withGearSet, withHeld, type GearSetKind } from './gearSet';
import { VISCOSITY_INDEX_FOLLOWS as VI } from '../../app/review/followingInputs';

/** The review being edited, as plain JSON (it may be invalid while the user types). */
export type Draft = Record<string, unknown>;

export interface DocState {
  readonly draft: Draft | null;
  /** Main's opaque handle for the file the review lives in (main alone holds paths); null for the demo or a new review. */
  readonly handle: string | null;
  /** The file's name, for the window and the notices; null without a file. */
  readonly name: string | null;
  readonly dirty: boolean;
  /** Bumped by every edit: the recompute of an older edition is dropped (latest wins). */
  readonly edition: number;
  /**
   * Oils (by index) whose viscosity index the user typed since the review was opened. Only such a
   * VI survives a change of KV40 or KV100; any other is dropped, and D2270 computes it afresh.
   */
  readonly typedVi: readonly number[];
  /** Bumped when another review is opened (not when the same one comes back signed): its results start afresh. */
  readonly opened: number;
}

export const initialDocState: DocState = { draft: null, handle: null, name: null, dirty: false, edition: 0, typedVi: [], opened: 0 };

export type DocAction =
  | { type: 'load'; draft: Draft; handle: string | null; name?: string | null; dirty?: boolean; sameReview?: boolean }
  | { type: 'set'; path: FieldPath; value: unknown }
  | { type: 'setDrive'; index: number; given: 'torque' | 'power'; value: unknown }
  | { type: 'addItem'; list: 'loadCases' | 'oils'; item: Record<string, unknown> }
  | { type: 'removeItem'; list: 'loadCases' | 'oils'; index: number }
  | { type: 'toggleComponent'; component: string; on: boolean }
  | { type: 'setGearSet'; kind: GearSetKind }
  | { type: 'setHeld'; held: 'ring' | 'carrier' | 'sun' }
  | { type: 'saved'; handle: string; name: string };

export function docReducer(state: DocState, action: DocAction): DocState {
  switch (action.type) {
    case 'load':
      return { draft: action.draft, handle: action.handle, name: action.name ?? null, dirty: action.dirty ?? false, edition: state.edition + 1, typedVi: action.sameReview ? state.typedVi : [], opened: state.opened + (action.sameReview ? 0 : 1) };
    case 'saved':
      return { ...state, handle: action.handle, name: action.name, dirty: false };
    default: {
      if (!state.draft) return state;
      const typedVi = trackTypedVi(state.typedVi, action);
      const draft = dropStaleVi(edit(state.draft, action), action, typedVi);
      return draft === state.draft ? state : { ...state, draft, dirty: true, edition: state.edition + 1, typedVi };
    }
  }
}

/** Which oils have a VI the user typed, after this action (removing an oil shifts the indices after it). */
function trackTypedVi(typed: readonly number[], action: DocAction): readonly number[] {
  if (action.type === 'set' && action.path[0] === VI.list && action.path[2] === VI.field && typeof action.path[1] === 'number') {
    const i = action.path[1];
    const rest = typed.filter((t) => t !== i);
    return action.value === undefined ? rest : [...rest, i];
  }
  if (action.type === 'removeItem' && action.list === 'oils') return typed.filter((t) => t !== action.index).map((t) => (t > action.index ? t - 1 : t));
  return typed;
}

/**
 * A new KV40 or KV100 makes a VI the user did not type stale: drop it, so ASTM D2270 computes it
 * from the new pair. The audit lists the dropped VI with the viscosity's change (followingInputs.ts).
 */
function dropStaleVi(draft: Draft, action: DocAction, typed: readonly number[]): Draft {
  if (action.type !== 'set' || action.path[0] !== VI.list || typeof action.path[1] !== 'number') return draft;
  const i = action.path[1];
  if (!VI.causes.includes(action.path[2] as string) || typed.includes(i)) return draft;
  return getIn(draft, [VI.list, i, VI.field]) === undefined ? draft : setIn(draft, [VI.list, i, VI.field], undefined);
}

function edit(draft: Draft, action: Exclude<DocAction, { type: 'load' | 'saved' }>): Draft {
  switch (action.type) {
    case 'set':
      return Object.is(getIn(draft, action.path), action.value) ? draft : setIn(draft, action.path, action.value);
    case 'setDrive': {
      // A load case gives exactly one of torque and power; the one typed last is the one given.
      const torque = caseKeys(draft).torque;
      // Text that is not (yet) a number is kept at its field and leaves the other one alone.
      if (typeof action.value !== 'number') return setIn(draft, ['loadCases', action.index, action.given === 'torque' ? torque : 'power_kW'], action.value);
      const keep = action.given === 'torque' ? torque : 'power_kW';
      const drop = action.given === 'torque' ? 'power_kW' : torque;
      const next = setIn(draft, ['loadCases', action.index, drop], undefined);
      return setIn(next, ['loadCases', action.index, keep], action.value);
    }
    case 'addItem': {
      const list = (getIn(draft, [action.list]) as unknown[] | undefined) ?? [];
      return setIn(draft, [action.list], [...list, action.item]);
    }
    case 'removeItem': {
      const list = (getIn(draft, [action.list]) as unknown[] | undefined) ?? [];
      return setIn(draft, [action.list], list.filter((_, i) => i !== action.index));
    }
    case 'toggleComponent': {
      const root = gearSetRoot(draft);
      const list = ((getIn(draft, [root, 'components']) as string[] | undefined) ?? []).filter((c) => c !== action.component);
      return setIn(draft, [root, 'components'], action.on ? [...list, action.component] : list);
    }
    case 'setGearSet':
      return withGearSet(draft, action.kind);
    case 'setHeld':
      return withHeld(draft, action.held);
  }
}

/** Speed (rpm), torque and power of a load case in the draft, under the gear set's keys. */
function driveOf(draft: Draft, index: number) {
  const c = getIn(draft, ['loadCases', index]) as Record<string, unknown> | undefined;
  const k = caseKeys(draft);
  return c ? { speed: c[k.speed], torque: c[k.torque], power: c.power_kW, factor: powerFactor(draft) } : undefined;
}

/** The torque of a load case in the draft (the pinion's, or the sun's), given or from the power; undefined if neither is a number. */
export function draftTorque(draft: Draft, index: number): number | undefined {
  const c = driveOf(draft, index);
  if (!c) return undefined;
  if (typeof c.torque === 'number') return c.torque;
  if (typeof c.power === 'number' && typeof c.speed === 'number' && c.speed > 0) return (c.power * 1000) / (c.factor * ((2 * Math.PI * c.speed) / 60));
  return undefined;
}

/** The power of a load case in the draft, given or from the torque (P = T·ω, see gearSet.ts powerFactor); undefined if neither is a number. */
export function draftPower(draft: Draft, index: number): number | undefined {
  const c = driveOf(draft, index);
  if (!c) return undefined;
  if (typeof c.power === 'number') return c.power;
  if (typeof c.torque === 'number' && typeof c.speed === 'number') return (c.torque * c.factor * ((2 * Math.PI * c.speed) / 60)) / 1000;
  return undefined;
}

/** Serialise the draft as the review file's text. */
export const draftText = (draft: Draft): string => `${JSON.stringify(draft, null, 2)}\n`;

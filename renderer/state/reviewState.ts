import { getIn, setIn, type FieldPath } from './paths';
import { caseKeys, gearSetRoot, powerFactor, withGearSet, withHeld, type GearSetKind } from './gearSet';

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
}

export const initialDocState: DocState = { draft: null, handle: null, name: null, dirty: false, edition: 0 };

export type DocAction =
  | { type: 'load'; draft: Draft; handle: string | null; name?: string | null; dirty?: boolean }
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
      return { draft: action.draft, handle: action.handle, name: action.name ?? null, dirty: action.dirty ?? false, edition: state.edition + 1 };
    case 'saved':
      return { ...state, handle: action.handle, name: action.name, dirty: false };
    default: {
      if (!state.draft) return state;
      const draft = edit(state.draft, action);
      return draft === state.draft ? state : { ...state, draft, dirty: true, edition: state.edition + 1 };
    }
  }
}

function edit(draft: Draft, action: Exclude<DocAction, { type: 'load' | 'saved' }>): Draft {
  switch (action.type) {
    case 'set':
      return Object.is(getIn(draft, action.path), action.value) ? draft : setIn(draft, action.path, action.value);
    case 'setDrive': {
      // A load case gives exactly one of torque and power; the one typed last is the one given.
      const torque = caseKeys(draft).torque;
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

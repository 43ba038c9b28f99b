import { getIn } from './paths';
import type { Draft } from './reviewState';

export type GearSetKind = 'external' | 'internal' | 'planetary';

/** The gear set a draft describes: a planetary stage, else a pair of its kind. */
export function gearSetKind(draft: Draft | null): GearSetKind {
  if (draft && typeof draft.planetary === 'object' && draft.planetary !== null) return 'planetary';
  return getIn(draft, ['gearPair', 'kind']) === 'internal' ? 'internal' : 'external';
}

/** Where the gear set lives in the draft. */
export const gearSetRoot = (draft: Draft | null): 'gearPair' | 'planetary' => (gearSetKind(draft) === 'planetary' ? 'planetary' : 'gearPair');

type Rec = Record<string, unknown>;
const rec = (x: unknown): Rec => (x && typeof x === 'object' ? (x as Rec) : {});
const SHARED = ['normalModule_mm', 'normalPressureAngle_deg', 'helixAngle_deg', 'faceWidth_mm', 'components', 'dynamicFactorKv', 'faceLoadFactorKHbeta', 'transverseLoadFactorKHalpha'] as const;
const pick = (from: Rec, keys: readonly string[]): Rec => Object.fromEntries(keys.filter((k) => from[k] !== undefined).map((k) => [k, from[k]]));
const member = (m: unknown, teeth: number): Rec => {
  const { profileShift: _x, tipDiameter_mm: _d, ...rest } = rec(m);
  return { roughnessRa_um: 0.8, material: 'steel-carburized', ...rest, teeth };
};

/**
 * The draft with another gear set, keeping what carries over: module, angles, face width, factors,
 * parts in the oil circuit, the members' roughness and material, and each load case's speed and
 * torque (the pinion's become the sun's and back). Teeth that would not fit the new kind are
 * replaced by a set that assembles (zR = zS + 2 zP), shifts and tip diameters are dropped, for the
 * user to enter again. Switching between external and internal pairs only sets the kind.
 */
export function withGearSet(draft: Draft, kind: GearSetKind): Draft {
  const from = gearSetKind(draft);
  if (from === kind) return draft;
  if (from !== 'planetary' && kind !== 'planetary') {
    const gp = rec(draft.gearPair);
    const { kind: _k, ...rest } = gp;
    const wheel = rec(gp.wheel);
    const z1 = Number(rec(gp.pinion).teeth) || 20;
    // A ring needs more teeth than its pinion (and 10 more, common practice).
    const z2 = kind === 'internal' && !(Number(wheel.teeth) >= z1 + 10) ? z1 * 3 : wheel.teeth;
    const next = { ...rest, wheel: { ...wheel, teeth: z2 }, ...(kind === 'internal' ? { kind } : {}) };
    return { ...draft, gearPair: next };
  }
  const { gearPair, planetary, ...base } = draft;
  const cases = Array.isArray(draft.loadCases) ? (draft.loadCases as unknown[]).map(rec) : [];
  if (kind === 'planetary') {
    const gp = rec(gearPair);
    const zS = 21;
    const zP = 33;
    const stage = { ...pick(gp, SHARED), planets: 3, meshLoadFactorKgamma: 1, held: 'ring', sun: member(gp.pinion, zS), planet: member(gp.wheel, zP), ring: member(gp.wheel, zS + 2 * zP) };
    const loadCases = cases.map(({ pinionSpeed_rpm, pinionTorque_Nm, ...c }) => ({ ...c, sunSpeed_rpm: pinionSpeed_rpm, ...(pinionTorque_Nm !== undefined ? { sunTorque_Nm: pinionTorque_Nm } : {}) }));
    return { ...base, planetary: stage, loadCases };
  }
  const p = rec(planetary);
  const wheel = kind === 'internal' ? member(p.ring, Number(rec(p.ring).teeth) || 60) : member(p.planet, Number(rec(p.planet).teeth) || 40);
  const pair: Rec = { ...pick(p, SHARED), pinion: member(p.sun, Number(rec(p.sun).teeth) || 20), wheel, ...(kind === 'internal' ? { kind } : {}) };
  const loadCases = cases.map(({ sunSpeed_rpm, carrierSpeed_rpm, sunTorque_Nm, ...c }) => ({ ...c, pinionSpeed_rpm: sunSpeed_rpm ?? carrierSpeed_rpm, ...(sunTorque_Nm !== undefined ? { pinionTorque_Nm: sunTorque_Nm } : {}) }));
  return { ...base, gearPair: pair, loadCases };
}

/** The draft with another held member; the load cases' input speed moves between sun and carrier. */
export function withHeld(draft: Draft, held: 'ring' | 'carrier' | 'sun'): Draft {
  const p = rec(draft.planetary);
  if (p.held === held) return draft;
  const [from, to] = held === 'sun' ? ['sunSpeed_rpm', 'carrierSpeed_rpm'] : ['carrierSpeed_rpm', 'sunSpeed_rpm'];
  const cases = Array.isArray(draft.loadCases) ? (draft.loadCases as unknown[]).map(rec) : [];
  const loadCases = cases.map((c) => {
    if (c[from] === undefined) return c;
    const { [from]: speed, ...rest } = c;
    return { ...rest, [to]: speed };
  });
  return { ...draft, planetary: { ...p, held }, loadCases };
}

/** The load-case keys of the draft's gear set: speed and torque. */
export function caseKeys(draft: Draft | null): { speed: string; torque: string; speedLabel: string; torqueLabel: string } {
  if (gearSetKind(draft) !== 'planetary') return { speed: 'pinionSpeed_rpm', torque: 'pinionTorque_Nm', speedLabel: 'Pinion speed n1', torqueLabel: 'Pinion torque T1' };
  const sunHeld = getIn(draft, ['planetary', 'held']) === 'sun';
  return sunHeld
    ? { speed: 'carrierSpeed_rpm', torque: 'sunTorque_Nm', speedLabel: 'Carrier speed nC', torqueLabel: 'Sun torque (reaction)' }
    : { speed: 'sunSpeed_rpm', torque: 'sunTorque_Nm', speedLabel: 'Sun speed nS', torqueLabel: 'Sun torque' };
}

/**
 * Torque ↔ power factor of a draft's load case: P = T ω f, with f = 1 for a pair and a sun that
 * drives, and f = 1 + zR/zS when the sun is held and the carrier drives (engine/gearset/meshDuties.ts).
 */
export function powerFactor(draft: Draft | null): number {
  if (gearSetKind(draft) !== 'planetary' || getIn(draft, ['planetary', 'held']) !== 'sun') return 1;
  const zS = getIn(draft, ['planetary', 'sun', 'teeth']);
  const zR = getIn(draft, ['planetary', 'ring', 'teeth']);
  return typeof zS === 'number' && typeof zR === 'number' && zS > 0 ? 1 + zR / zS : 1;
}

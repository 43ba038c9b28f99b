/**
 * Flankfilm's words and colours (NAMES.md), shared by the CLI, the record and the screen: the
 * verdicts, states, regimes and decisions in our wording, and the Okabe–Ito palette, where every
 * colour always goes with a word and an icon shape.
 */
import type { Regime } from '../engine/film/regime';
import type { Decision, Oil } from './schema';
import type { MaterialPreset } from '../engine/materials';
import type { ChangeFindingCode, OilFit, PlanetaryMesh, PlanetaryResult, ScuffingMethods, Shortfall, VerdictCode } from './results';
export { BASE_OIL_WORDS, CHEMISTRY_WORDS, METHOD_WORDS } from '../engine/verdict/words';

export const VERDICT_WORDS: Readonly<Record<VerdictCode, string>> = {
  'aw-suffices': 'Anti-wear chemistry suffices',
  'ep-warranted': 'EP chemistry warranted',
  'beyond-oil': 'Beyond oil chemistry',
};

/** Short forms for narrow table cells; always next to the icon. */
export const VERDICT_SHORT: Readonly<Record<VerdictCode, string>> = {
  'aw-suffices': 'AW suffices',
  'ep-warranted': 'EP warranted',
  'beyond-oil': 'Beyond oil',
};

export const MESH_WORDS: Readonly<Record<PlanetaryMesh, string>> = {
  'sun-planet': 'sun–planet',
  'planet-ring': 'planet–ring',
};

export const HELD_WORDS: Readonly<Record<PlanetaryResult['held'], string>> = {
  ring: 'ring held',
  carrier: 'carrier held',
  sun: 'sun held',
};

export const DECISION_WORDS: Readonly<Record<Decision, string>> = {
  approved: 'Approved',
  'approved-with-conditions': 'Approved with conditions',
  'not-approved': 'Not approved',
};

export const REGIME_WORDS: Readonly<Record<Regime, string>> = {
  boundary: 'boundary',
  mixed: 'mixed',
  'full-film': 'full film (EHL)',
};

export const MATERIAL_WORDS: Readonly<Record<MaterialPreset, string>> = {
  'steel-carburized': 'Steel, case carburized',
  'steel-through-hardened': 'Steel, through hardened',
  'steel-nitrided': 'Steel, nitrided',
};

export const ROLE_WORDS: Readonly<Record<Oil['role'], string>> = {
  'in-service': 'In service',
  proposed: 'Proposed',
  candidate: 'Candidate',
};

export const OIL_FIT_WORDS: Readonly<Record<OilFit, string>> = {
  meets: 'meets the need',
  'falls-short': 'short of the need',
};

export const CHANGE_WORDS: Readonly<Record<ChangeFindingCode, string>> = {
  supported: 'Change supported',
  'supported-with-conditions': 'Change supported with conditions',
  'not-supported': 'Change not supported',
};

export const CHANGE_COLOURS: Readonly<Record<ChangeFindingCode, string>> = {
  supported: '#009E73',
  'supported-with-conditions': '#E69F00',
  'not-supported': '#D55E00',
};

export const SHORTFALL_SHORT: Readonly<Record<Shortfall, string>> = {
  chemistry: 'chemistry',
  'fzg-stage': 'FZG stage',
  film: 'film (a grade matter)',
  micropitting: 'micropitting class',
};

/** The order in which shortfalls are named. */
export const SHORTFALL_ORDER: readonly Shortfall[] = ['chemistry', 'fzg-stage', 'film', 'micropitting'];

export const METHODS_WORDS: Readonly<Record<ScuffingMethods, string>> = {
  both: 'flash and integral temperature methods (the more demanding governs)',
  flash: 'flash temperature method (ISO/TS 6336-20) alone',
  integral: 'integral temperature method (ISO/TS 6336-21) alone',
};

/** Okabe–Ito (M. Okabe, K. Ito, "Color Universal Design", 2008). */
export const OKABE_ITO = {
  black: '#000000',
  orange: '#E69F00',
  skyBlue: '#56B4E9',
  bluishGreen: '#009E73',
  yellow: '#F0E442',
  blue: '#0072B2',
  vermillion: '#D55E00',
  reddishPurple: '#CC79A7',
} as const;

export const VERDICT_COLOURS: Readonly<Record<VerdictCode, string>> = {
  'aw-suffices': OKABE_ITO.bluishGreen,
  'ep-warranted': OKABE_ITO.orange,
  'beyond-oil': OKABE_ITO.vermillion,
};

export const REGIME_COLOURS: Readonly<Record<Regime, string>> = {
  'full-film': OKABE_ITO.bluishGreen,
  mixed: OKABE_ITO.orange,
  boundary: OKABE_ITO.vermillion,
};

/** The micropitting finding as a short label (ISO/TS 6336-22). */
export const MICROPITTING_LABELS: Readonly<Record<'meets' | 'short' | 'unknown', string>> = {
  meets: 'meets',
  short: 'short: a higher micropitting class is needed',
  unknown: 'unknown: micropitting stage not given',
};

/** The record's words and colours (NAMES.md): Okabe–Ito palette, each colour with a word and a shape. */
import type { Regime } from '../engine/film/regime';
import type { Decision } from '../review/schema';
import type { OilFit, ReviewStatus, VerdictCode } from '../review/results';

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

export const STATUS_LABELS: Readonly<Record<ReviewStatus, string>> = {
  draft: 'Draft',
  signed: 'Signed',
  'changed-since-signing': 'Changed since signing',
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

export const OIL_FIT_WORDS: Readonly<Record<OilFit, string>> = {
  meets: 'this oil meets the need',
  'falls-short': 'this oil falls short',
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

export const INK = '#1a1a1a';
export const GREY = '#666666';
export const RULE = '#b0b0b0';
export const FAINT = '#efefef';

/** The standing caution the record carries on its cover and beside every verdict. */
export const DEFER_TEXT =
  'This record is an engineering aid, not an approval. Follow the gearbox maker’s lubricant list and instructions, local codes and regulations, and the judgement of a licensed engineer; confirm every oil with its supplier’s current data sheet.';

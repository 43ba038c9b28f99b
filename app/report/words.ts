/** The record's words and colours: the shared vocabulary (app/review/vocabulary.ts) plus the record's inks. */
export { VERDICT_WORDS, VERDICT_SHORT, DECISION_WORDS, REGIME_WORDS, OIL_FIT_WORDS, OKABE_ITO, VERDICT_COLOURS, REGIME_COLOURS } from '../review/vocabulary';
export { STATUS_WORDS as STATUS_LABELS } from '../review/status';

export const INK = '#1a1a1a';
export const GREY = '#666666';
export const RULE = '#b0b0b0';
export const FAINT = '#efefef';

/** The standing caution the record carries on its cover and beside every verdict. */
export const DEFER_TEXT =
  'This record is an engineering aid, not an approval. Follow the gearbox maker’s lubricant list and instructions, local codes and regulations, and the judgement of a licensed engineer; confirm every oil with its supplier’s current data sheet.';

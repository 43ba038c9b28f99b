/** The fleet's words: what a person reads in the summary, the table and the record. */
import type { FleetShortfall } from './types';

export const FLEET_SHORTFALL_WORDS: Readonly<Record<FleetShortfall, string>> = {
  chemistry: 'chemistry',
  'fzg-stage': 'FZG stage',
  film: 'film (λ below target: a grade matter)',
  micropitting: 'micropitting (a higher micropitting class is needed)',
  'beyond-oil': 'beyond oil chemistry (change the design or duty)',
  'not-computed': 'not computed (see the message)',
};

/** Short forms for a table cell. */
export const FLEET_SHORTFALL_SHORT: Readonly<Record<FleetShortfall, string>> = {
  chemistry: 'chemistry',
  'fzg-stage': 'FZG stage',
  film: 'film λ',
  micropitting: 'micropitting',
  'beyond-oil': 'beyond oil',
  'not-computed': 'not computed',
};

export const MEETS_WORD = 'meets the need';
export const SHORT_WORD = 'short on';

export function shortfallList(s: readonly FleetShortfall[], short = false): string {
  const words = short ? FLEET_SHORTFALL_SHORT : FLEET_SHORTFALL_WORDS;
  return s.map((x) => words[x]).join(', ');
}

/** A cell in words: "meets the need" or "short on chemistry, FZG stage". */
export function cellWords(meets: boolean, s: readonly FleetShortfall[], short = false): string {
  return meets ? MEETS_WORD : `${SHORT_WORD} ${shortfallList(s, short) || 'the need'}`;
}

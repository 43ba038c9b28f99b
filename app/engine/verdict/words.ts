import type { BaseOil, Chemistry } from '../oil/types';
import type { ScuffingMethod } from './types';

/**
 * Words for the engine's codes, as a person reads them in a reason. The gear-oil classes are named
 * as the trade names them: R&O (DIN 51517-2 CL), EP (DIN 51517-3 CLP); anti-wear oils are most
 * often classed as hydraulic oils, DIN 51524-2 HLP.
 */
export const CHEMISTRY_WORDS: Readonly<Record<Chemistry, string>> = {
  // No brackets of their own: these words often stand inside brackets, "oil (R&O, rust and oxidation inhibited)".
  'r-and-o': 'R&O, rust and oxidation inhibited',
  'anti-wear': 'AW, anti-wear',
  'extreme-pressure': 'EP, extreme pressure',
};

export const BASE_OIL_WORDS: Readonly<Record<BaseOil, string>> = {
  mineral: 'mineral',
  pao: 'PAO (synthetic hydrocarbon)',
  'pag-insoluble': 'PAG, water-insoluble',
  'pag-soluble': 'PAG, water-soluble',
  ester: 'ester',
  'phosphate-ester': 'phosphate ester',
  traction: 'traction fluid',
};

export const METHOD_WORDS: Readonly<Record<ScuffingMethod, string>> = {
  flash: 'flash temperature method (ISO/TS 6336-20)',
  integral: 'integral temperature method (ISO/TS 6336-21)',
};

/** A stage need in words: 13 or '>12' is beyond the A/8.3/90 scale. */
export function stageWords(s: number | '>12'): string {
  return s === '>12' || s > 12 ? 'above 12' : String(s);
}

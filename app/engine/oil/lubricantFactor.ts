import type { EngineWarning } from '../diagnostics';
import type { BaseOil } from './types';

/**
 * Lubricant factor XL of the ISO/TS 6336-20 flash-temperature method, by base oil
 * (ISO/TS 6336-20 table [memory]): mineral 1.0, PAO 0.8, PAG not water-soluble 0.7,
 * PAG water-soluble 0.6, traction fluid 1.5, phosphate ester 1.3.
 * Esters are not tabulated: 1.0 (as mineral) is used and a warning says so.
 */

const XL: Readonly<Record<Exclude<BaseOil, 'ester'>, number>> = {
  mineral: 1.0,
  pao: 0.8,
  'pag-insoluble': 0.7,
  'pag-soluble': 0.6,
  traction: 1.5,
  'phosphate-ester': 1.3,
};

export interface LubricantFactor {
  readonly value: number;
  readonly warning: EngineWarning | null;
}

/**
 * @param baseOil - base stock
 * @param field - input path of the base oil, named in the warning, e.g. `oils[0].baseOil`
 * @returns XL (dimensionless) and, for ester, an `oil.lubricant-factor-untabulated` warning
 */
export function lubricantFactor(baseOil: BaseOil, field = 'baseOil'): LubricantFactor {
  if (baseOil === 'ester') {
    return {
      value: 1.0,
      warning: {
        code: 'oil.lubricant-factor-untabulated',
        severity: 'warning',
        field,
        message: 'ISO/TS 6336-20 gives no lubricant factor XL for ester oils; XL = 1.0 (as mineral oil) is used.',
      },
    };
  }
  return { value: XL[baseOil], warning: null };
}

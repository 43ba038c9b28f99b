import type { EngineWarning } from '../diagnostics';
import { EngineInputError } from '../diagnostics';
import type { Kelvin, PascalSeconds, PerPascal } from '../units';
import { ZERO_CELSIUS_K } from '../units';
import type { BaseOil } from './types';

/**
 * Pressure–viscosity coefficient α (Barus, η = η0 e^{αp}) of an oil, in 1/Pa (= m²/N).
 *
 * At 38 °C, by base oil, α38 = k · η38^n with η38 the dynamic viscosity at 38 °C **in Pa·s**:
 * - mineral: k = 2.657e−8, n = 0.1348 (ISO/TR 15144-1 form [memory]);
 * - PAO: k = 1.747e−8, n = 0.0552; PAG, not water-soluble: k = 1.530e−8, n = 0.1544; PAG,
 *   water-soluble: k = 1.042e−8, n = 0.0288 (the base-oil correlations of ISO/TR 15144-1 as we
 *   recall them [memory], not checked against the text);
 * - ester 12.8 GPa⁻¹, traction fluid 31 GPa⁻¹ (fixed; measured values for an "advanced ester" and
 *   a "synthetic traction fluid" at 38 °C, Jones et al. 1975, NASA TN D-8024 [memory]) and
 *   phosphate ester 20 GPa⁻¹ (fixed; common practice, no single source). These three raise an
 *   `oil.pressure-viscosity-typical` warning: enter the supplier's value.
 *
 * Why Pa·s: with η38 in Pa·s a VG 100 mineral oil (η38 ≈ 0.097 Pa·s) gives α38 ≈ 19 GPa⁻¹,
 * inside the 15–30 GPa⁻¹ that practice expects for mineral oils near 40 °C; with mPa·s the same
 * oil would give ≈ 50 GPa⁻¹, far outside it (and k = 2.657e−8 m²/N is itself a typical mineral α).
 * tests/engine/oil/pressureViscosity.test.ts holds VG 32…680 inside 15–30 GPa⁻¹ at 40 °C.
 *
 * Temperature (ISO/TR 15144-1 form [memory]), θ in °C:
 *   α(θ) = α38 [1 + 516 (1/(θ + 273) − 1/311)]
 * used for every base oil (for the non-mineral ones, common practice in the absence of their own
 * law). It falls with temperature: ×0.99 at 40 °C, ×0.72 at 100 °C, ×0.43 at 200 °C.
 */

const TEMPERATURE_CONSTANT_K = 516;
const REFERENCE_K = 311; // 38 °C in the published form
const CELSIUS_OFFSET = 273; // the published form writes θ + 273

interface Alpha38Law {
  readonly k: number;
  readonly n: number;
  readonly source: string;
  readonly typical: boolean;
}

const LAWS: Readonly<Record<BaseOil, Alpha38Law>> = {
  mineral: { k: 2.657e-8, n: 0.1348, source: 'ISO/TR 15144-1 mineral-oil correlation [memory]', typical: false },
  pao: { k: 1.747e-8, n: 0.0552, source: 'ISO/TR 15144-1 PAO correlation [memory]', typical: false },
  'pag-insoluble': { k: 1.53e-8, n: 0.1544, source: 'ISO/TR 15144-1 PAG (not water-soluble) correlation [memory]', typical: false },
  'pag-soluble': { k: 1.042e-8, n: 0.0288, source: 'ISO/TR 15144-1 PAG (water-soluble) correlation [memory]', typical: false },
  ester: { k: 12.8e-9, n: 0, source: 'typical ester value, Jones et al. 1975, NASA TN D-8024 [memory]', typical: true },
  'phosphate-ester': { k: 20e-9, n: 0, source: 'typical phosphate-ester value (common practice)', typical: true },
  traction: { k: 31e-9, n: 0, source: 'typical traction-fluid value, Jones et al. 1975, NASA TN D-8024 [memory]', typical: true },
};

export interface Alpha38Default {
  /** α at 38 °C, 1/Pa. */
  readonly alpha38: PerPascal;
  /** Where the value comes from, for the record. */
  readonly source: string;
  /** Set when the value is a typical figure rather than a viscosity correlation. */
  readonly warning: EngineWarning | null;
}

/**
 * Default α at 38 °C for a base oil.
 * @param baseOil - base stock
 * @param eta38 - dynamic viscosity at 38 °C, Pa·s (> 0)
 * @param field - input path of the α input, named in the warning, e.g. `oils[0].pressureViscosity_1perGPa`
 * @throws EngineInputError when eta38 is not a positive finite number.
 */
export function alpha38Default(baseOil: BaseOil, eta38: PascalSeconds, field = 'pressureViscosity_1perGPa'): Alpha38Default {
  if (!Number.isFinite(eta38) || eta38 <= 0) {
    throw new EngineInputError('input.not-positive', field, '> 0 Pa·s', `${field}: the dynamic viscosity at 38 °C (${String(eta38)} Pa·s) must be greater than 0.`);
  }
  const law = LAWS[baseOil];
  const alpha38 = (law.k * Math.pow(eta38, law.n)) as PerPascal;
  const warning: EngineWarning | null = law.typical
    ? {
        code: 'oil.pressure-viscosity-typical',
        severity: 'warning',
        field,
        message: `No viscosity correlation for ${baseOil}: a typical α38 of ${(alpha38 * 1e9).toFixed(1)} GPa⁻¹ is used (${law.source}); enter the supplier's value.`,
      }
    : null;
  return { alpha38, source: law.source, warning };
}

/**
 * α at temperature t from α38: α(θ) = α38 [1 + 516 (1/(θ + 273) − 1/311)], θ = t − 273.15 K in °C.
 * Allocation-free (hot loop).
 * @param alpha38 - α at 38 °C, 1/Pa
 * @param t - temperature, K (the factor stays positive below about 510 °C)
 * @param field - temperature input path named in errors
 * @throws EngineInputError when the factor is not positive (t above about 783 K) or t is not finite.
 */
export function pressureViscosityAt(alpha38: PerPascal, t: Kelvin, field = 'temperature'): PerPascal {
  const factor = 1 + TEMPERATURE_CONSTANT_K * (1 / (t - ZERO_CELSIUS_K + CELSIUS_OFFSET) - 1 / REFERENCE_K);
  if (!(factor > 0) || !(t > 0) || factor === Infinity) {
    throw new EngineInputError(
      'oil.pressure-viscosity-range',
      field,
      '< 510 °C',
      `${field} = ${String(t - ZERO_CELSIUS_K)} °C is outside the range of the α temperature law (α would not be positive).`,
    );
  }
  return (alpha38 * factor) as PerPascal;
}

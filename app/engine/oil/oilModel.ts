import type { EngineWarning } from '../diagnostics';
import { EngineInputError } from '../diagnostics';
import type { Kelvin, KilogramsPerCubicMetre, PascalSeconds, PerKelvin, PerPascal, SquareMetresPerSecond } from '../units';
import { celsiusToKelvin, ZERO_CELSIUS_K } from '../units';
import { DENSITY_TEMPERATURE_SLOPE, oilDensity } from './density';
import { isoViscosityGrade } from './isoGrade';
import { lubricantFactor } from './lubricantFactor';
import { alpha38Default, pressureViscosityAt } from './pressureViscosity';
import type { BaseOil } from './types';
import { BASE_OILS } from './types';
import { D2270_MIN_KV100, viscosityIndex } from './viscosityIndex';
import type { WaltherConstants } from './walther';
import { D341_MAX_VISCOSITY, D341_MIN_VISCOSITY, fitWalther, waltherLogSlope, waltherTemperature, waltherViscosity } from './walther';

/** Data-sheet values of one oil, in SI. */
export interface OilData {
  /** Kinematic viscosity at 40 °C, m²/s. */
  readonly kv40: SquareMetresPerSecond;
  /** Kinematic viscosity at 100 °C, m²/s (below kv40). */
  readonly kv100: SquareMetresPerSecond;
  /** Density at 15 °C, kg/m³. */
  readonly density15: KilogramsPerCubicMetre;
  readonly baseOil: BaseOil;
  /** Viscosity index from the data sheet; checked against ASTM D2270. */
  readonly viscosityIndex?: number;
  /** Pressure–viscosity coefficient α from the data sheet, 1/Pa; used at every temperature. */
  readonly pressureViscosity?: PerPascal;
}

export interface OilModel {
  /** ν(T), m²/s: ASTM D341 Walther line through KV40 and KV100. */
  kinematicViscosity(t: Kelvin, temperatureField?: string): SquareMetresPerSecond;
  /** η(T) = ν(T) ρ(T), Pa·s. */
  dynamicViscosity(t: Kelvin, temperatureField?: string): PascalSeconds;
  /** ρ(T) = ρ15 − 0.7 (θ − 15), kg/m³. */
  density(t: Kelvin, temperatureField?: string): KilogramsPerCubicMetre;
  /** α(T), 1/Pa: the data-sheet value if given, else the base-oil default with its temperature law. */
  pressureViscosity(t: Kelvin, temperatureField?: string): PerPascal;
  /** β = −(1/η) dη/dT = −d ln ν/dT + 0.7/ρ(T), 1/K (analytic). */
  temperatureViscosity(t: Kelvin, temperatureField?: string): PerKelvin;
  readonly viscosityIndex: { readonly value: number; readonly source: 'ASTM D2270' | 'data sheet' };
  /** ISO 3448 grade, or null between grades. */
  readonly isoVG: number | null;
  /** ISO/TS 6336-20 lubricant factor XL. */
  readonly lubricantFactor: number;
  readonly warnings: EngineWarning[];
  /** The fitted Walther constants (for the record). */
  readonly walther: WaltherConstants;
  /** Where α comes from. */
  readonly pressureViscositySource: string;
  /** Temperatures the per-call functions accept: −40…200 °C, narrowed to the D341 viscosity range. */
  readonly temperatureRange: { readonly min: Kelvin; readonly max: Kelvin };
}

const T40 = celsiusToKelvin(40);
const T100 = celsiusToKelvin(100);
const T38 = celsiusToKelvin(38);
const T_MIN = celsiusToKelvin(-40);
const T_MAX = celsiusToKelvin(200);
const VI_TOLERANCE = 2;
const MM2S = 1e6;

const celsiusText = (t: number): string => `${Number((t - ZERO_CELSIUS_K).toFixed(1))} °C`;

function requirePositiveKv(field: string, v: SquareMetresPerSecond): void {
  if (!Number.isFinite(v) || v <= 0) {
    throw new EngineInputError('input.not-positive', field, '> 0 mm²/s', `${field} = ${String(v * MM2S)} mm²/s must be greater than 0.`);
  }
}

/**
 * The oil model: everything the film and heat models need from an oil's data sheet.
 * - ν(T): ASTM D341 Walther line through KV40 (313.15 K) and KV100 (373.15 K);
 * - ρ(T): ρ15 − 0.7 (θ − 15) kg/m³ (ISO/TR 15144-1 form [memory]);
 * - η(T) = ν ρ; β = −(1/η) dη/dT from the analytic Walther slope plus the density slope;
 * - α(T): the data-sheet value at every temperature, else the base-oil default at 38 °C
 *   (see pressureViscosity.ts) times the ISO/TR 15144-1 temperature factor;
 * - VI by ASTM D2270 (a data-sheet VI is only compared: more than 2 points apart gives
 *   `oil.vi-mismatch`; below KV100 = 2 mm²/s, where D2270 does not apply, the data-sheet VI is used);
 * - ISO 3448 grade; ISO/TS 6336-20 lubricant factor XL.
 *
 * The per-call functions are allocation-free (A, B, α38 precomputed) and accept T in
 * −40…200 °C, narrowed where ν would leave the D341 range 0.21…2e7 mm²/s; outside, an
 * EngineInputError on `temperatureField` (default `${field}.temperature`).
 *
 * @param data - data-sheet values in SI
 * @param field - path of this oil in the review, e.g. `oils[0]`, prefixed to input names in messages
 * @throws EngineInputError on `${field}.kv40_mm2s` / `.kv100_mm2s` (not positive, KV100 ≥ KV40,
 *   outside D341 or, without a data-sheet VI, KV100 < 2 mm²/s), `.density15_kgm3` (ρ not positive
 *   anywhere up to 200 °C), `.viscosityIndex` (not finite), `.pressureViscosity_1perGPa` (not positive),
 *   `.baseOil` (unknown).
 */
export function makeOilModel(data: OilData, field: string): OilModel {
  const f = {
    kv40: `${field}.kv40_mm2s`,
    kv100: `${field}.kv100_mm2s`,
    density: `${field}.density15_kgm3`,
    vi: `${field}.viscosityIndex`,
    alpha: `${field}.pressureViscosity_1perGPa`,
    baseOil: `${field}.baseOil`,
    temperature: `${field}.temperature`,
  };
  const { kv40, kv100, density15, baseOil } = data;

  if (!(BASE_OILS as readonly string[]).includes(baseOil)) {
    throw new EngineInputError('input.unknown-value', f.baseOil, BASE_OILS.join(' | '), `${f.baseOil} = ${String(baseOil)} is not one of ${BASE_OILS.join(', ')}.`);
  }
  requirePositiveKv(f.kv40, kv40);
  requirePositiveKv(f.kv100, kv100);
  if (kv100 >= kv40) {
    throw new EngineInputError(
      'oil.kv100-not-below-kv40',
      f.kv100,
      `< ${String(kv40 * MM2S)} mm²/s`,
      `${f.kv100} = ${String(kv100 * MM2S)} mm²/s must be below ${f.kv40} = ${String(kv40 * MM2S)} mm²/s: oils thin as they warm.`,
    );
  }
  if (!Number.isFinite(density15) || density15 <= 0) {
    throw new EngineInputError('input.not-positive', f.density, '> 0 kg/m³', `${f.density} = ${String(density15)} kg/m³ must be greater than 0.`);
  }
  oilDensity(density15, T_MAX, f.density); // linear and falling: positive at 200 °C means positive throughout

  const walther = fitWalther(kv40, T40, kv100, T100, f.kv40, f.kv100);
  const tMin = Math.max(T_MIN, waltherTemperature(walther, D341_MAX_VISCOSITY)) as Kelvin;
  const tMax = Math.min(T_MAX, waltherTemperature(walther, D341_MIN_VISCOSITY)) as Kelvin;
  const rangeText = `${celsiusText(tMin)}…${celsiusText(tMax)}`;
  // No warning when the range is narrowed (VG 680 and up at −40 °C): only a call outside it fails.
  const warnings: EngineWarning[] = [];

  // Viscosity index.
  const sheetVi = data.viscosityIndex;
  if (sheetVi !== undefined && !Number.isFinite(sheetVi)) {
    throw new EngineInputError('input.not-finite', f.vi, 'finite', `${f.vi} = ${String(sheetVi)} must be a finite number.`);
  }
  let vi: OilModel['viscosityIndex'];
  if (kv100 < D2270_MIN_KV100 && sheetVi !== undefined) {
    vi = { value: sheetVi, source: 'data sheet' };
    warnings.push({
      code: 'oil.vi-from-data-sheet',
      severity: 'info',
      field: f.vi,
      message: `${f.kv100} = ${String(kv100 * MM2S)} mm²/s is below the 2 mm²/s where ASTM D2270 starts; the data-sheet VI ${String(sheetVi)} is used unchecked.`,
    });
  } else {
    const computed = viscosityIndex(kv40, kv100, field);
    vi = { value: computed.value, source: 'ASTM D2270' };
    if (sheetVi !== undefined && Math.abs(sheetVi - computed.value) > VI_TOLERANCE) {
      warnings.push({
        code: 'oil.vi-mismatch',
        severity: 'warning',
        field: f.vi,
        message: `${f.vi} = ${String(sheetVi)} differs from ${String(computed.value)} computed by ASTM D2270 from KV40 and KV100 by more than ${String(VI_TOLERANCE)}; the computed value is used.`,
      });
    }
  }

  // Pressure–viscosity coefficient.
  const userAlpha = data.pressureViscosity;
  let alpha38 = 0 as PerPascal;
  let pressureViscositySource: string;
  if (userAlpha !== undefined) {
    if (!Number.isFinite(userAlpha) || userAlpha <= 0) {
      throw new EngineInputError('input.not-positive', f.alpha, '> 0 1/GPa', `${f.alpha} = ${String(userAlpha * 1e9)} 1/GPa must be greater than 0.`);
    }
    pressureViscositySource = 'data sheet (used at every temperature)';
  } else {
    const eta38 = (waltherViscosity(walther, T38) * oilDensity(density15, T38, f.density)) as PascalSeconds;
    const d = alpha38Default(baseOil, eta38, f.alpha);
    alpha38 = d.alpha38;
    pressureViscositySource = d.source;
    if (d.warning) warnings.push(d.warning);
  }

  const xl = lubricantFactor(baseOil, f.baseOil);
  if (xl.warning) warnings.push(xl.warning);

  const outOfRange = (t: Kelvin, temperatureField: string): never => {
    throw new EngineInputError(
      'oil.temperature-range',
      temperatureField,
      rangeText,
      `${temperatureField} = ${Number.isFinite(t) ? celsiusText(t) : String(t)} is outside ${rangeText}, the range of the oil model for ${field}.`,
    );
  };

  const density = (t: Kelvin, temperatureField: string = f.temperature): KilogramsPerCubicMetre => {
    if (!(t >= tMin && t <= tMax)) outOfRange(t, temperatureField);
    return oilDensity(density15, t, f.density);
  };
  const kinematicViscosity = (t: Kelvin, temperatureField: string = f.temperature): SquareMetresPerSecond => {
    if (!(t >= tMin && t <= tMax)) outOfRange(t, temperatureField);
    return waltherViscosity(walther, t);
  };

  return {
    kinematicViscosity,
    density,
    dynamicViscosity: (t, temperatureField = f.temperature) =>
      (kinematicViscosity(t, temperatureField) * oilDensity(density15, t, f.density)) as PascalSeconds,
    pressureViscosity: (t, temperatureField = f.temperature) => {
      if (!(t >= tMin && t <= tMax)) outOfRange(t, temperatureField);
      return userAlpha !== undefined ? userAlpha : pressureViscosityAt(alpha38, t, temperatureField);
    },
    temperatureViscosity: (t, temperatureField = f.temperature) => {
      if (!(t >= tMin && t <= tMax)) outOfRange(t, temperatureField);
      return (-waltherLogSlope(walther, t) + DENSITY_TEMPERATURE_SLOPE / oilDensity(density15, t, f.density)) as PerKelvin;
    },
    viscosityIndex: vi,
    isoVG: isoViscosityGrade(kv40, f.kv40),
    lubricantFactor: xl.value,
    warnings,
    walther,
    pressureViscositySource,
    temperatureRange: { min: tMin, max: tMax },
  };
}

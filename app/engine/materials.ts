import { MICROPITTING_MATERIAL_FACTOR_WW } from './micropitting/materialFactor';
import { thermalContactCoefficient } from './heat/blokFlash';
import type { JoulesPerKilogramKelvin, KilogramsPerCubicMetre, Pascals, ThermalContactCoefficient, WattsPerMetreKelvin } from './units';

/** Flank material data the engine needs, in SI. */
export interface Material {
  readonly youngsModulus: Pascals;
  readonly poissonRatio: number;
  readonly thermalConductivity: WattsPerMetreKelvin;
  readonly density: KilogramsPerCubicMetre;
  readonly specificHeat: JoulesPerKilogramKelvin;
  /** Structural factor XW of ISO/TS 6336-20 (flank treatment). */
  readonly structuralFactorXW: number;
  /** Material factor WW of the micropitting method (ISO/TS 6336-22); absent = 1, case-carburized steel. */
  readonly micropittingFactorWW?: number;
}

export const MATERIAL_PRESETS = ['steel-carburized', 'steel-through-hardened', 'steel-nitrided'] as const;
export type MaterialPreset = (typeof MATERIAL_PRESETS)[number];

/**
 * Steel: E = 206 GPa and ν = 0.3 are the ISO 6336-1 values for steel. The thermal data
 * (k = 50 W/(m·K), ρ = 7800 kg/m³, c = 470 J/(kg·K), so √(kρc) ≈ 13.5 N/(mm·s^0.5·K)) are
 * typical handbook values for gear steels [memory], consistent with the ≈13.6 that
 * ISO/TS 6336-20 uses for steel [memory]. XW per flank treatment from ISO/TS 6336-20 [memory]:
 * carburized (average retained austenite) 1.0, through-hardened 1.0, nitrided 1.5. WW of the
 * micropitting method: micropitting/materialFactor.ts.
 */
const STEEL = {
  youngsModulus: 206e9 as Pascals,
  poissonRatio: 0.3,
  thermalConductivity: 50 as WattsPerMetreKelvin,
  density: 7800 as KilogramsPerCubicMetre,
  specificHeat: 470 as JoulesPerKilogramKelvin,
};

export const MATERIALS: Readonly<Record<MaterialPreset, Material>> = {
  'steel-carburized': { ...STEEL, structuralFactorXW: 1.0, micropittingFactorWW: MICROPITTING_MATERIAL_FACTOR_WW['case-carburized'] },
  'steel-through-hardened': { ...STEEL, structuralFactorXW: 1.0, micropittingFactorWW: MICROPITTING_MATERIAL_FACTOR_WW['through-hardened'] },
  'steel-nitrided': { ...STEEL, structuralFactorXW: 1.5, micropittingFactorWW: MICROPITTING_MATERIAL_FACTOR_WW.nitrided },
};

/** Thermal contact coefficient B_M = √(k ρ c), W·s^0.5/(m²·K) (Blok 1937). */
export function materialContactCoefficient(m: Material): ThermalContactCoefficient {
  return thermalContactCoefficient(m.thermalConductivity, m.density, m.specificHeat);
}

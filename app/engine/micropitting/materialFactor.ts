/**
 * Material factor WW of the micropitting method, by flank material and treatment. A higher WW asks
 * for a thicker film (λGFP = 1.4 WW λGFT). Guide values, ISO/TS 6336-22 (ISO/TR 15144-1) [memory;
 * only the 1.0 for case-carburized steel is held firmly, the others are weak]:
 * - case-carburized steel (the test gear's material): 1.0
 * - through-hardened steel: 0.5
 * - induction- or flame-hardened steel: 0.65
 * - gas-nitrided steel: 1.5
 */
export const MICROPITTING_MATERIAL_FACTOR_WW = {
  'case-carburized': 1.0,
  'through-hardened': 0.5,
  'induction-hardened': 0.65,
  nitrided: 1.5,
} as const;

/** WW where a material does not give it: case-carburized steel, as the C-GF test gear. */
export const DEFAULT_MICROPITTING_MATERIAL_FACTOR_WW = MICROPITTING_MATERIAL_FACTOR_WW['case-carburized'];

/** The pair's WW: the larger of pinion and wheel (the more demanding side). */
export function pairMaterialFactorWW(pinion: number | undefined, wheel: number | undefined): number {
  return Math.max(pinion ?? DEFAULT_MICROPITTING_MATERIAL_FACTOR_WW, wheel ?? DEFAULT_MICROPITTING_MATERIAL_FACTOR_WW);
}

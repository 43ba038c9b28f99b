/**
 * Oil vocabulary shared by the engine and the review schema. The tuples are `as const`, so
 * `z.enum(BASE_OILS)` accepts them and the union types follow from them.
 */

/**
 * Base stock. The PAG split follows ISO/TS 6336-20's lubricant-factor table [memory]:
 * water-insoluble and water-soluble polyalkylene glycols behave differently.
 */
export const BASE_OILS = ['mineral', 'pao', 'pag-insoluble', 'pag-soluble', 'ester', 'phosphate-ester', 'traction'] as const;
export type BaseOil = (typeof BASE_OILS)[number];

/** Additive chemistry: rust-and-oxidation inhibited, anti-wear (AW), extreme pressure (EP). */
export const CHEMISTRIES = ['r-and-o', 'anti-wear', 'extreme-pressure'] as const;
export type Chemistry = (typeof CHEMISTRIES)[number];

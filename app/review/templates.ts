import { policySchema, REVIEW_FORMAT, REVIEW_VERSION } from './schema';

/**
 * Starting templates for a new review. They hold engineering defaults only (the ISO 53 basic
 * rack's 20° pressure angle, KA = 1, dip lubrication, the policy's defaults); every value that
 * belongs to the user's own gearbox, duty or oil is left out, so the review does not compute until
 * it is filled in and each missing value is marked at its field. Nothing here comes from the demo.
 */
export const TEMPLATES = ['spur', 'helical'] as const;
export type TemplateKind = (typeof TEMPLATES)[number];

export const TEMPLATE_WORDS: Readonly<Record<TemplateKind, { readonly name: string; readonly detail: string }>> = {
  spur: { name: 'Spur pair', detail: 'Straight teeth (β = 0°), 20° pressure angle' },
  helical: { name: 'Helical pair', detail: 'Helix angle 15° to start with (common practice for industrial reducers), 20° normal pressure angle' },
};

/** What the user must enter before the review computes (in words, for the screen and the CLI). */
export const TO_FILL_IN = [
  'the gear data: normal module, face width, tooth numbers, flank roughness',
  'each load case: pinion speed, torque or power, oil temperature, share of time',
  'each oil: name, viscosity at 40 °C and 100 °C, density, base oil, additive chemistry, FZG failure stage',
  'the record details: review id and date',
] as const;

const NOTE = `New review. Fill in: ${TO_FILL_IN.join('; ')}.`;

/** A new, unfilled review of the chosen kind (plain JSON, as the file holds it). */
export function newReview(kind: TemplateKind): Record<string, unknown> {
  return {
    format: REVIEW_FORMAT,
    version: REVIEW_VERSION,
    title: kind === 'spur' ? 'New review, spur pair' : 'New review, helical pair',
    revision: 0,
    notes: NOTE,
    displayUnits: 'si',
    gearPair: {
      // ISO 53 basic rack profile: 20° pressure angle.
      normalPressureAngle_deg: 20,
      // Helical: 15° is a usual starting point for industrial reducers (common practice); change it to the drawing's.
      helixAngle_deg: kind === 'spur' ? 0 : 15,
      pinion: { material: 'steel-carburized' },
      wheel: { material: 'steel-carburized' },
      pinionMeshes: 1,
      components: [],
      // ISO 6336-2 factors Flankfilm does not compute: 1 until the user has them.
      dynamicFactorKv: 1,
      faceLoadFactorKHbeta: 1,
      transverseLoadFactorKHalpha: 1,
    },
    loadCases: [newCase(1)],
    oils: [
      { name: 'In-service oil', role: 'in-service' },
      { name: 'Proposed oil', role: 'proposed' },
    ],
    // The policy's defaults, written out so each shows at its field.
    policy: policySchema.parse({}),
  };
}

/** A load case with only the engineering defaults (KA = 1 per ISO 6336-1 for uniform duty, dip lubrication). */
export function newCase(number: number): Record<string, unknown> {
  return { name: `Load case ${number}`, applicationFactor: 1, lubrication: 'dip', timeShare: 1 };
}

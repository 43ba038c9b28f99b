import { policySchema, REVIEW_FORMAT, REVIEW_VERSION } from './schema';

/**
 * Starting templates for a new review. They hold engineering defaults only (the ISO 53 basic
 * rack's 20° pressure angle, KA = 1, dip lubrication, the policy's defaults); every value that
 * belongs to the user's own gearbox, duty or oil is left out, so the review does not compute until
 * it is filled in and each missing value is marked at its field. Nothing here comes from the demo.
 */
export const TEMPLATES = ['spur', 'helical', 'internal', 'planetary'] as const;
export type TemplateKind = (typeof TEMPLATES)[number];

export const TEMPLATE_WORDS: Readonly<Record<TemplateKind, { readonly name: string; readonly detail: string }>> = {
  spur: { name: 'Spur pair', detail: 'Straight teeth (β = 0°), 20° pressure angle' },
  helical: { name: 'Helical pair', detail: 'Helix angle 15° to start with (common practice for industrial reducers), 20° normal pressure angle' },
  internal: { name: 'Internal pair', detail: 'A pinion meshing inside a ring with internal teeth, straight teeth, 20° pressure angle' },
  planetary: { name: 'Planetary stage', detail: 'Sun, equal planets on one carrier and a ring, straight teeth, 20° pressure angle; both meshes (sun–planet, planet–ring) are reviewed' },
};

const OILS_TO_FILL_IN = 'each oil: name, viscosity at 40 °C and 100 °C, density, base oil, additive chemistry, FZG failure stage';
const RECORD_TO_FILL_IN = 'the record details: review id and date';

/** What the user must enter before a review of this kind computes (in words, for the screen and the CLI). */
export function toFillIn(kind: TemplateKind): readonly string[] {
  if (kind === 'planetary') {
    return [
      'the stage: normal module, face width, number of planets, the member held, the tooth numbers and flank roughness of sun, planet and ring',
      'each load case: sun speed (the carrier\'s when the sun is held), torque or power, oil temperature, share of time',
      OILS_TO_FILL_IN,
      RECORD_TO_FILL_IN,
    ];
  }
  return [
    `the gear data: normal module, face width, tooth numbers, flank roughness${kind === 'internal' ? ' (the wheel is the ring, with internal teeth)' : ''}`,
    'each load case: pinion speed, torque or power, oil temperature, share of time',
    OILS_TO_FILL_IN,
    RECORD_TO_FILL_IN,
  ];
}

const TITLES: Readonly<Record<TemplateKind, string>> = {
  spur: 'New review, spur pair',
  helical: 'New review, helical pair',
  internal: 'New review, internal pair',
  planetary: 'New review, planetary stage',
};

/** ISO 6336-2 factors Flankfilm does not compute: 1 until the user has them. */
const FACTORS_NOT_COMPUTED = { dynamicFactorKv: 1, faceLoadFactorKHbeta: 1, transverseLoadFactorKHalpha: 1 } as const;

/** A new, unfilled review of the chosen kind (plain JSON, as the file holds it). */
export function newReview(kind: TemplateKind): Record<string, unknown> {
  const gearSet =
    kind === 'planetary'
      ? {
          planetary: {
            // ISO 53 basic rack profile: 20° pressure angle; straight teeth until the drawing says otherwise.
            normalPressureAngle_deg: 20,
            helixAngle_deg: 0,
            // Kγ = 1 (equal sharing between the planets) until the gearbox maker gives a figure (see its help).
            meshLoadFactorKgamma: 1,
            sun: { material: 'steel-carburized' },
            planet: { material: 'steel-carburized' },
            ring: { material: 'steel-carburized' },
            components: [],
            ...FACTORS_NOT_COMPUTED,
          },
        }
      : {
          gearPair: {
            ...(kind === 'internal' ? { kind: 'internal' } : {}),
            // ISO 53 basic rack profile: 20° pressure angle.
            normalPressureAngle_deg: 20,
            // Helical: 15° is a usual starting point for industrial reducers (common practice); change it to the drawing's.
            helixAngle_deg: kind === 'helical' ? 15 : 0,
            pinion: { material: 'steel-carburized' },
            wheel: { material: 'steel-carburized' },
            pinionMeshes: 1,
            components: [],
            ...FACTORS_NOT_COMPUTED,
          },
        };
  return {
    format: REVIEW_FORMAT,
    version: REVIEW_VERSION,
    title: TITLES[kind],
    revision: 0,
    // No notes: they are the user's, and they go into the record (what is to be filled in is marked at each field).
    displayUnits: 'si',
    ...gearSet,
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

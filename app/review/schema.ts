import { z } from 'zod';
import { MATERIAL_PRESETS } from '../engine/materials';
import { BASE_OILS, CHEMISTRIES } from '../engine/oil/types';
import { SCUFFING_METHODS } from '../engine/mesh/types';

/**
 * The review file, version 1 (`*.flankfilm.json`). Units are in the key names; the file is the
 * only place where mm, °C, N·m, kW and mm²/s appear — toEngine.ts converts them to SI.
 * Objects are strict: an unknown key (a typo, or `__proto__`) is an error with its path.
 */
export const REVIEW_FORMAT = 'flankfilm.review';
export const REVIEW_VERSION = 1;
/**
 * The most points along the path a review computes in all (load cases × oils × policy.pathPoints,
 * at least one oil counted): 100 analyses at the default 201 points. The operating maps of the
 * record sweep the same points 3600 times, so this bounds the record's time and memory as well
 * (tests/cli/resourceBounds.test.ts measures the largest reviews accepted).
 */
export const MAX_REVIEW_POINTS = 20_100;

const finite = () => z.number().refine(Number.isFinite, { message: 'must be a finite number' });
const positive = (max: number, unit: string) =>
  finite().gt(0, { message: `must be greater than 0 ${unit}` }).lte(max, { message: `must be at most ${max} ${unit}` });
/**
 * Text a person reads on screen, in the CLI, the CSV and the PDF: no control characters (ESC,
 * BEL, NUL … would reach the terminal and the PDF metadata) and no bidirectional overrides
 * (which reorder what is shown). `line` is one line; `prose` allows tabs and line breaks.
 */
const CONTROL = /[\u0000-\u001f\u007f-\u009f\u2028\u2029\u202a-\u202e\u2066-\u2069]/;
const CONTROL_IN_PROSE = /[\u0000-\u0008\u000b\u000c\u000e-\u001f\u007f-\u009f\u202a-\u202e\u2066-\u2069]/;
const NO_CONTROL = { message: 'must not hold control characters (such as ESC, BEL or NUL) or direction overrides' };
const line = (max: number) => z.string().max(max).refine((t) => !CONTROL.test(t), NO_CONTROL);
const prose = (max: number) => z.string().max(max).refine((t) => !CONTROL_IN_PROSE.test(t), NO_CONTROL);

/** A positive size with a least meaningful value: a 1e-320 would pass > 0 and underflow in the physics. */
/** A least value above 0 (so one message for a value too small, 0 and negatives included). */
const atLeast = (min: number, max: number, unit: string) => finite().gte(min, { message: `must be at least ${min} ${unit}` }).lte(max, { message: `must be at most ${max} ${unit}` });

export const materialSchema = z.union([
  z.enum(MATERIAL_PRESETS),
  z.strictObject({
    // Least values: below any gear material (polymers included), so a 1e-320 cannot underflow the contact.
    youngsModulus_GPa: atLeast(0.5, 1000, 'GPa'),
    poissonRatio: finite().gte(0).lt(0.5),
    thermalConductivity_WmK: atLeast(0.1, 1000, 'W/(m·K)'),
    density_kgm3: atLeast(500, 30000, 'kg/m³'),
    specificHeat_JkgK: atLeast(100, 10000, 'J/(kg·K)'),
    structuralFactorXW: atLeast(0.1, 3, ''),
    /** Micropitting material factor WW (ISO/TS 6336-22): 1 case-carburized, 0.5 through-hardened, 0.65 induction-hardened, 1.5 nitrided steel [memory]. */
    micropittingFactorWW: atLeast(0.1, 3, '').optional(),
  }),
]);

export const COMPONENTS = ['bronze-bushing', 'brass-cage', 'yellow-metal', 'backstop', 'clutch', 'food-contact', 'paint-or-seal-sensitive'] as const;

/** Field help for the profile shift (the sign convention matters on a ring). */
export const PROFILE_SHIFT_HELP =
  'Profile shift coefficient x, sign as ISO 21771 gives it: x > 0 moves the basic rack towards the tooth tips and thickens the tooth at the reference circle. On an external gear that is away from the axis; on a ring (internal teeth) it is towards the axis, so the ring\'s inner (tip) diameter shrinks.';

export const gearSchema = z.strictObject({
  teeth: z.number().int({ message: 'must be a whole number of teeth' }).gte(5, { message: 'must be at least 5 teeth' }).lte(1000, { message: 'must be at most 1000 teeth' }),
  profileShift: finite().gte(-3).lte(3).optional().describe(PROFILE_SHIFT_HELP),
  tipDiameter_mm: positive(20000, 'mm').optional().describe('Tip diameter da; for a ring, its inner diameter. Else d + 2 mn (1 + x), for a ring d − 2 mn (1 + x).'),
  roughnessRa_um: finite().gte(0.01, { message: 'must be at least 0.01 µm' }).lte(25, { message: 'must be at most 25 µm' }),
  material: materialSchema,
});

export const GEAR_PAIR_KINDS = ['external', 'internal'] as const;

export const gearPairSchema = z.strictObject({
  /**
   * External pair (when absent), or internal: the wheel is a ring with internal teeth and the
   * pinion runs inside it. No schema default, so reviews written before it keep their fingerprint.
   */
  kind: z.enum(GEAR_PAIR_KINDS).optional().describe('external (default) or internal: the wheel is a ring with internal teeth, its tip diameter is its inner diameter'),
  normalModule_mm: positive(100, 'mm').gte(0.1, { message: 'must be at least 0.1 mm' }),
  normalPressureAngle_deg: finite().gte(10).lte(35).default(20),
  helixAngle_deg: finite().gte(0).lte(45).default(0),
  faceWidth_mm: atLeast(0.5, 5000, 'mm'),
  centerDistance_mm: positive(50000, 'mm').optional(),
  pinion: gearSchema,
  wheel: gearSchema,
  /** Number of gears the pinion meshes with, n_p for Xmp = (1 + n_p)/2 (ISO/TS 6336-20). */
  pinionMeshes: z.number().int().gte(1).lte(4).default(1),
  /** Parts in the oil's circuit that change the cautions (yellow metals, backstops …). */
  components: z.array(z.enum(COMPONENTS)).max(20).default([]),
  /** ISO 6336-2 factors that Flankfilm does not compute; 1 unless given. */
  dynamicFactorKv: finite().gte(1).lte(5).default(1),
  faceLoadFactorKHbeta: finite().gte(1).lte(5).default(1),
  transverseLoadFactorKHalpha: finite().gte(1).lte(5).default(1),
});

export const loadCaseSchema = z
  .strictObject({
    name: line(120).min(1),
    /** Gear pair reviews. */
    pinionSpeed_rpm: atLeast(0.1, 100000, 'rpm').optional(),
    pinionTorque_Nm: atLeast(0.001, 1e8, 'N·m').optional(),
    /** Planetary reviews: the sun's speed (unless the sun is held), its torque or the power. */
    sunSpeed_rpm: atLeast(0.1, 100000, 'rpm').optional().describe('Planetary stage: speed of the sun (not when the sun is held)'),
    carrierSpeed_rpm: atLeast(0.1, 100000, 'rpm').optional().describe('Planetary stage with the sun held: speed of the carrier'),
    sunTorque_Nm: atLeast(0.001, 1e8, 'N·m').optional().describe('Planetary stage: torque on the sun (driving or, when the sun is held, reaction)'),
    power_kW: atLeast(0.001, 1e6, 'kW').optional(),
    applicationFactor: finite().gte(1, { message: 'must be at least 1 (ISO 6336-1)' }).lte(4).default(1),
    oilTemperature_C: finite().gte(-40, { message: 'must be at least −40 °C' }).lte(200, { message: 'must be at most 200 °C' }),
    lubrication: z.enum(['dip', 'spray']),
    timeShare: finite().gt(0).lte(1).default(1),
  })
  .superRefine((c, ctx) => {
    const n = Number(c.pinionTorque_Nm !== undefined) + Number(c.sunTorque_Nm !== undefined) + Number(c.power_kW !== undefined);
    if (n !== 1) {
      const path = c.sunTorque_Nm !== undefined || c.sunSpeed_rpm !== undefined || c.carrierSpeed_rpm !== undefined ? 'sunTorque_Nm' : 'pinionTorque_Nm';
      ctx.addIssue({ code: 'custom', path: [path], message: `give exactly one of ${path} or power_kW` });
    }
  });

export const HELD_MEMBERS = ['ring', 'carrier', 'sun'] as const;

/** Help for Kγ, with guide values. */
export const MESH_LOAD_FACTOR_HELP =
  'Mesh load factor Kγ: the most loaded planet\'s share of the sun torque over the equal share (≥ 1). Default 1 (ideal sharing, e.g. a floating sun with few planets). Guide values for usual accuracy [memory, weak]: 3 planets about 1.1, 4 about 1.25, 5 about 1.35, 6 about 1.45; take the gearbox maker\'s figure where there is one.';

/**
 * A simple planetary stage: sun, equal planets on one carrier, ring; one member held. Geometry is
 * common to the three members; each member has the gear fields of a pair.
 */
export const planetarySchema = z.strictObject({
  normalModule_mm: positive(100, 'mm').gte(0.1, { message: 'must be at least 0.1 mm' }),
  normalPressureAngle_deg: finite().gte(10).lte(35).default(20),
  helixAngle_deg: finite().gte(0).lte(45).default(0),
  faceWidth_mm: atLeast(0.5, 5000, 'mm'),
  planets: z.number().int({ message: 'must be a whole number of planets' }).gte(1, { message: 'must be at least 1 planet' }).lte(12, { message: 'must be at most 12 planets' }),
  meshLoadFactorKgamma: finite().gte(1, { message: 'must be at least 1' }).lte(2, { message: 'must be at most 2' }).default(1).describe(MESH_LOAD_FACTOR_HELP),
  held: z.enum(HELD_MEMBERS).describe('The member held still: ring (sun drives the carrier), carrier (sun drives the ring) or sun (carrier drives the ring)'),
  sun: gearSchema,
  planet: gearSchema,
  ring: gearSchema.describe('The ring, with internal teeth: its tip diameter is its inner diameter'),
  components: z.array(z.enum(COMPONENTS)).max(20).default([]),
  dynamicFactorKv: finite().gte(1).lte(5).default(1),
  faceLoadFactorKHbeta: finite().gte(1).lte(5).default(1),
  transverseLoadFactorKHalpha: finite().gte(1).lte(5).default(1),
});

/** FVA 54 micropitting failure load stage on the C-GF gear (90 °C, 8.3 m/s): a whole number 5…10, or ">10". */
export const micropittingStageSchema = z.union(
  [
    z.number({ message: 'must be a whole number from 5 to 10, or ">10" (FVA 54 micropitting load stage)' }).int({ message: 'must be a whole number from 5 to 10, or ">10" (FVA 54 micropitting load stage)' }).gte(5, { message: 'must be at least 5 (the FVA 54 micropitting test starts at load stage 5), or ">10"' }).lte(10, { message: 'must be at most 10; an oil that passed stage 10 is ">10"' }),
    z.literal('>10'),
  ],
  { message: 'must be a whole number from 5 to 10, or ">10" (FVA 54 micropitting load stage)' },
);

export const FZG_STAGES = [1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12] as const;
export const fzgStageSchema = z.union([z.number().int().gte(1).lte(12), z.literal('>12')]);

export const oilSchema = z
  .strictObject({
    name: line(120).min(1),
    role: z.enum(['in-service', 'proposed', 'candidate']).default('candidate'),
    kv40_mm2s: positive(100000, 'mm²/s'),
    kv100_mm2s: positive(10000, 'mm²/s').gte(2, { message: 'must be at least 2 mm²/s (ASTM D2270 range)' }),
    viscosityIndex: finite().gte(-100).lte(500).optional(),
    density15_kgm3: positive(2500, 'kg/m³').gte(500, { message: 'must be at least 500 kg/m³' }),
    baseOil: z.enum(BASE_OILS),
    chemistry: z.enum(CHEMISTRIES),
    fzgFailureStage: fzgStageSchema,
    /** FVA 54 micropitting failure load stage (C-GF gear, 90 °C, 8.3 m/s); absent when unknown. */
    micropittingFailureStage: micropittingStageSchema.optional(),
    pressureViscosity_1perGPa: atLeast(1, 100, '1/GPa').optional(),
  })
  .superRefine((o, ctx) => {
    if (o.kv100_mm2s >= o.kv40_mm2s) {
      ctx.addIssue({ code: 'custom', path: ['kv100_mm2s'], message: `must be below kv40_mm2s (${o.kv40_mm2s} mm²/s): oils thin as they warm` });
    }
  });

export const FILM_FORMULAS = ['dowson-higginson', 'pan-hamrock'] as const;

export const policySchema = z
  .strictObject({
    lambdaTarget: finite().gt(0).lte(10).default(1.0),
    scuffingSafetyMin: finite().gte(1).lte(5).default(1.5),
    integralSafetyMin: finite().gte(1).lte(5).default(1.8),
    antiWearOilFzgStage: z.number().int().gte(1).lte(12).default(10),
    epOilFzgStage: z.number().int().gte(1).lte(12).default(12),
    temperatureRange_C: z.tuple([finite().gte(-40).lte(200), finite().gte(-40).lte(200)]).default([20, 100]),
    pathPoints: z.number().int().gte(11).lte(5001).default(201),
    thermalFilmCorrection: z.boolean().default(true),
    filmFormula: z.enum(FILM_FORMULAS).default('dowson-higginson'),
    boundaryBelowLambda: finite().gt(0).lte(10).default(1),
    fullFilmFromLambda: finite().gt(0).lte(20).default(3),
    /** A measured or agreed μ instead of the ISO/TS 6336-20 estimate. */
    frictionCoefficient: finite().gt(0).lte(0.3).optional(),
    /** Relative spread of the scuffing temperature, σ/θS (AGMA 925 style [memory]). */
    scuffingTemperatureSpread: finite().gt(0).lte(0.5).default(0.15),
    /** KA at and above which the duty counts as shock duty for the EP escalation rule (common practice). */
    shockApplicationFactor: finite().gte(1).lte(4).default(1.75),
    /** Scuffing methods the verdict uses: flash (ISO/TS 6336-20), integral (ISO/TS 6336-21) or both (the more demanding governs). */
    scuffingMethods: z.enum(SCUFFING_METHODS).default('both'),
    /** Sλ,min of the micropitting method, ISO/TS 6336-22 (default 1 [memory, weak]). */
    micropittingSafetyMin: finite().gt(0).lte(5).default(1),
  })
  .superRefine((p, ctx) => {
    if (p.temperatureRange_C[0] >= p.temperatureRange_C[1]) ctx.addIssue({ code: 'custom', path: ['temperatureRange_C'], message: 'the lower end must be below the upper end' });
    if (p.antiWearOilFzgStage > p.epOilFzgStage) ctx.addIssue({ code: 'custom', path: ['antiWearOilFzgStage'], message: 'must not exceed epOilFzgStage' });
    if (p.boundaryBelowLambda >= p.fullFilmFromLambda) ctx.addIssue({ code: 'custom', path: ['boundaryBelowLambda'], message: 'must be below fullFilmFromLambda' });
  });

export const DECISIONS = ['approved', 'approved-with-conditions', 'not-approved'] as const;

/**
 * The inputs of a review: everything but its format, version and sign-off. The review is these
 * plus those; a sign-off keeps a copy of them as signed (its `signedState`).
 */
const reviewBodyShape = {
  title: line(200).min(1),
  id: line(100).optional(),
  revision: z.number().int().gte(0).lte(100000).default(0),
  /** Date the review was prepared (ISO 8601); the record uses it as its creation date. */
  date: z.iso.date().optional(),
  notes: prose(10000).optional(),
  displayUnits: z.enum(['si', 'us']).default('si'),
  /** A gear pair, or (instead) a planetary stage. */
  gearPair: gearPairSchema.optional(),
  planetary: planetarySchema.optional(),
  loadCases: z.array(loadCaseSchema).min(1).max(20),
  oils: z.array(oilSchema).max(10),
  policy: policySchema.default(() => policySchema.parse({})),
};

/** The inputs as signed, defaults filled in (app/review/audit compares them with the file). */
export const signedStateSchema = z.strictObject(reviewBodyShape);

/** Earlier signings kept in a sign-off's history, newest last; older ones are dropped. */
export const MAX_SIGNOFF_HISTORY = 10;

const signoffShape = {
  reviewer: line(200).min(1),
  role: line(200).min(1),
  organisation: line(200).optional(),
  decision: z.enum(DECISIONS),
  conditions: prose(4000).optional(),
  signedAt: z.iso.datetime({ offset: true }),
  engineVersion: line(50).min(1),
  fingerprint: z.string().regex(/^[0-9a-f]{64}$/, { message: 'must be a SHA-256 hex digest' }),
  /** The inputs this sign-off covers; absent in files signed before it was kept (no field-level audit). */
  signedState: signedStateSchema.optional(),
};

/** An earlier signing of the same review, as it was when it was replaced. */
export const earlierSignoffSchema = z.strictObject(signoffShape);

export const signoffSchema = z.strictObject({
  ...signoffShape,
  history: z.array(earlierSignoffSchema).max(MAX_SIGNOFF_HISTORY).optional(),
});

/**
 * Every load case gives the input speed of its gear set: the pinion's on a gear pair, the sun's on a
 * planetary stage (the carrier's when the sun is held). Checked on the file as written, so a new
 * review marks the speed at once, while other fields are still missing.
 */
function inputSpeedGiven(raw: unknown, ctx: z.RefinementCtx): void {
  const r = raw as { gearPair?: unknown; planetary?: unknown; loadCases?: unknown };
  if (typeof r !== 'object' || r === null || !Array.isArray(r.loadCases) || (r.gearPair === undefined) === (r.planetary === undefined)) return;
  const sunHeld = r.planetary !== undefined && (r.planetary as { held?: unknown } | null)?.held === 'sun';
  const [key, why] = r.gearPair !== undefined ? ['pinionSpeed_rpm', 'is required for a gear pair'] : sunHeld ? ['carrierSpeed_rpm', 'is required when the sun is held'] : ['sunSpeed_rpm', 'is required for a planetary stage'];
  r.loadCases.forEach((c: unknown, i: number) => {
    if (typeof c === 'object' && c !== null && (c as Record<string, unknown>)[key] === undefined) ctx.addIssue({ code: 'custom', path: ['loadCases', i, key], message: why });
  });
}

export const reviewSchema = z
  .strictObject({
    format: z.literal(REVIEW_FORMAT),
    version: z.literal(REVIEW_VERSION),
    ...reviewBodyShape,
    signoff: signoffSchema.optional(),
  })
  .superRefine((r, ctx) => {
    // A planetary stage computes two meshes.
    const work = r.loadCases.length * Math.max(1, r.oils.length) * r.policy.pathPoints * (r.planetary ? 2 : 1);
    if (work > MAX_REVIEW_POINTS) {
      ctx.addIssue({
        code: 'custom',
        path: ['policy', 'pathPoints'],
        message: `load cases × oils × path points${r.planetary ? ' × 2 meshes' : ''} = ${r.loadCases.length} × ${Math.max(1, r.oils.length)} × ${r.policy.pathPoints}${r.planetary ? ' × 2' : ''} = ${work}, more than the ${MAX_REVIEW_POINTS} a review may compute (so that its results and its record finish in under 30 s and 1 GB): use fewer load cases, oils or path points`,
      });
    }
    if ((r.gearPair === undefined) === (r.planetary === undefined)) {
      ctx.addIssue({ code: 'custom', path: [r.gearPair === undefined ? 'gearPair' : 'planetary'], message: 'give exactly one gear set: gearPair or planetary' });
      return;
    }
    r.loadCases.forEach((c, i) => {
      const need = (key: string, why: string) => ctx.addIssue({ code: 'custom', path: ['loadCases', i, key], message: why });
      const forbid = (keys: readonly string[], why: string) => {
        for (const k of keys) if ((c as Record<string, unknown>)[k] !== undefined) need(k, why);
      };
      if (r.gearPair) {
        forbid(['sunSpeed_rpm', 'carrierSpeed_rpm', 'sunTorque_Nm'], 'belongs to a planetary stage; a gear pair gives pinionSpeed_rpm and pinionTorque_Nm or power_kW');
      } else if (r.planetary) {
        // (the speed each case must give is checked by inputSpeedGiven)
        const sunHeld = r.planetary.held === 'sun';
        forbid(sunHeld ? ['sunSpeed_rpm'] : ['carrierSpeed_rpm'], sunHeld ? 'must be absent: the sun is held' : 'is given only when the sun is held; give sunSpeed_rpm');
        forbid(['pinionSpeed_rpm', 'pinionTorque_Nm'], 'belongs to a gear pair; a planetary stage gives sunSpeed_rpm and sunTorque_Nm or power_kW');
      }
    });
  })
  // Checked even while other fields are missing, so a new review marks the input speed at once.
  .check(z.superRefine(inputSpeedGiven, { when: () => true }));

/** A review as written in a file (defaults may be absent). */
export type ReviewInput = z.input<typeof reviewSchema>;
/** A review after parsing (every default filled in). */
export type Review = z.output<typeof reviewSchema>;
export type Policy = z.output<typeof policySchema>;
export type Oil = z.output<typeof oilSchema>;
export type LoadCase = z.output<typeof loadCaseSchema>;
export type GearPair = z.output<typeof gearPairSchema>;
export type Planetary = z.output<typeof planetarySchema>;
export type HeldMember = (typeof HELD_MEMBERS)[number];
/** A load case of a gear pair review (the pinion speed is given). */
export type PairLoadCase = LoadCase & { pinionSpeed_rpm: number };
/** A review of a gear pair: what the per-pair pipeline runs (a planetary review runs it per mesh). */
export type PairReview = Omit<Review, 'gearPair' | 'planetary' | 'loadCases'> & { gearPair: GearPair; planetary?: undefined; loadCases: PairLoadCase[] };

/** The review as a gear pair review, or null when it is a planetary stage. */
export function asPairReview(r: Review): PairReview | null {
  if (!r.gearPair) return null;
  // The schema requires pinionSpeed_rpm on every load case of a gear pair review.
  return r as PairReview;
}
export type Signoff = z.output<typeof signoffSchema>;
export type EarlierSignoff = z.output<typeof earlierSignoffSchema>;
/** The inputs of a review without format, version and sign-off (what a sign-off keeps as signed). */
export type SignedState = z.output<typeof signedStateSchema>;
export type FzgStage = z.output<typeof fzgStageSchema>;
export type Decision = (typeof DECISIONS)[number];

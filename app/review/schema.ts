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

const finite = () => z.number().refine(Number.isFinite, { message: 'must be a finite number' });
const positive = (max: number, unit: string) =>
  finite().gt(0, { message: `must be greater than 0 ${unit}` }).lte(max, { message: `must be at most ${max} ${unit}` });

export const materialSchema = z.union([
  z.enum(MATERIAL_PRESETS),
  z.strictObject({
    youngsModulus_GPa: positive(1000, 'GPa'),
    poissonRatio: finite().gte(0).lt(0.5),
    thermalConductivity_WmK: positive(1000, 'W/(m·K)'),
    density_kgm3: positive(30000, 'kg/m³'),
    specificHeat_JkgK: positive(10000, 'J/(kg·K)'),
    structuralFactorXW: positive(3, ''),
    /** Micropitting material factor WW (ISO/TS 6336-22): 1 case-carburized, 0.5 through-hardened, 0.65 induction-hardened, 1.5 nitrided steel [memory]. */
    micropittingFactorWW: positive(3, '').optional(),
  }),
]);

export const COMPONENTS = ['bronze-bushing', 'brass-cage', 'yellow-metal', 'backstop', 'clutch', 'food-contact', 'paint-or-seal-sensitive'] as const;

const gearSchema = z.strictObject({
  teeth: z.number().int({ message: 'must be a whole number of teeth' }).gte(5, { message: 'must be at least 5 teeth' }).lte(1000, { message: 'must be at most 1000 teeth' }),
  profileShift: finite().gte(-3).lte(3).optional(),
  tipDiameter_mm: positive(20000, 'mm').optional(),
  roughnessRa_um: finite().gte(0.01, { message: 'must be at least 0.01 µm' }).lte(25, { message: 'must be at most 25 µm' }),
  material: materialSchema,
});

export const gearPairSchema = z.strictObject({
  normalModule_mm: positive(100, 'mm').gte(0.1, { message: 'must be at least 0.1 mm' }),
  normalPressureAngle_deg: finite().gte(10).lte(35).default(20),
  helixAngle_deg: finite().gte(0).lte(45).default(0),
  faceWidth_mm: positive(5000, 'mm'),
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
    name: z.string().min(1).max(120),
    pinionSpeed_rpm: positive(100000, 'rpm'),
    pinionTorque_Nm: positive(1e8, 'N·m').optional(),
    power_kW: positive(1e6, 'kW').optional(),
    applicationFactor: finite().gte(1, { message: 'must be at least 1 (ISO 6336-1)' }).lte(4).default(1),
    oilTemperature_C: finite().gte(-40, { message: 'must be at least −40 °C' }).lte(200, { message: 'must be at most 200 °C' }),
    lubrication: z.enum(['dip', 'spray']),
    timeShare: finite().gt(0).lte(1).default(1),
  })
  .superRefine((c, ctx) => {
    const n = Number(c.pinionTorque_Nm !== undefined) + Number(c.power_kW !== undefined);
    if (n !== 1) {
      ctx.addIssue({ code: 'custom', path: ['pinionTorque_Nm'], message: 'give exactly one of pinionTorque_Nm or power_kW' });
    }
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
    name: z.string().min(1).max(120),
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
    pressureViscosity_1perGPa: positive(100, '1/GPa').optional(),
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

export const signoffSchema = z.strictObject({
  reviewer: z.string().min(1).max(200),
  role: z.string().min(1).max(200),
  organisation: z.string().max(200).optional(),
  decision: z.enum(DECISIONS),
  conditions: z.string().max(4000).optional(),
  signedAt: z.iso.datetime({ offset: true }),
  engineVersion: z.string().min(1).max(50),
  fingerprint: z.string().regex(/^[0-9a-f]{64}$/, { message: 'must be a SHA-256 hex digest' }),
});

export const reviewSchema = z.strictObject({
  format: z.literal(REVIEW_FORMAT),
  version: z.literal(REVIEW_VERSION),
  title: z.string().min(1).max(200),
  id: z.string().max(100).optional(),
  revision: z.number().int().gte(0).lte(100000).default(0),
  /** Date the review was prepared (ISO 8601); the record uses it as its creation date. */
  date: z.iso.date().optional(),
  notes: z.string().max(10000).optional(),
  displayUnits: z.enum(['si', 'us']).default('si'),
  gearPair: gearPairSchema,
  loadCases: z.array(loadCaseSchema).min(1).max(20),
  oils: z.array(oilSchema).max(10),
  policy: policySchema.default(() => policySchema.parse({})),
  signoff: signoffSchema.optional(),
});

/** A review as written in a file (defaults may be absent). */
export type ReviewInput = z.input<typeof reviewSchema>;
/** A review after parsing (every default filled in). */
export type Review = z.output<typeof reviewSchema>;
export type Policy = z.output<typeof policySchema>;
export type Oil = z.output<typeof oilSchema>;
export type LoadCase = z.output<typeof loadCaseSchema>;
export type GearPair = z.output<typeof gearPairSchema>;
export type Signoff = z.output<typeof signoffSchema>;
export type FzgStage = z.output<typeof fzgStageSchema>;
export type Decision = (typeof DECISIONS)[number];

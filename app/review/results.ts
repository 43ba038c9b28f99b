/**
 * The results of a review, as `run()` returns them and `flankfilm review --json` prints them.
 * Display units are in the key names (mm, MPa, m/s, µm, °C). This shape is the one path to the
 * screen, the record (PDF) and the CSV: nothing downstream recomputes physics.
 */
import type { Regime } from '../engine/film/regime';
import type { EngineWarning } from '../engine/diagnostics';

export type VerdictCode = 'aw-suffices' | 'ep-warranted' | 'beyond-oil';
export type OilFit = 'meets' | 'falls-short';
export type FzgStageNeeded = number | '>12';
export type ReviewStatus = 'draft' | 'signed' | 'changed-since-signing';

export interface PointResult {
  position_mm: number;
  /** Roll angle-like coordinate from A (0) to E (1), for charts. */
  pathFraction: number;
  loadShare: number;
  hertzStress_MPa: number;
  /** Tangential flank velocities v1 = ω1 ρ1 (pinion) and v2 = ω2 ρ2 (wheel). */
  pinionFlankVelocity_mps: number;
  wheelFlankVelocity_mps: number;
  slidingVelocity_mps: number;
  sumVelocity_mps: number;
  slideToRoll: number;
  /** Specific sliding ζ1 = (v1 − v2)/v1 of the pinion and ζ2 = (v2 − v1)/v2 of the wheel. */
  specificSlidingPinion: number;
  specificSlidingWheel: number;
  filmThicknessMin_um: number | null;
  filmThicknessCentral_um: number | null;
  lambda: number | null;
  lambdaGF: number | null;
  regime: Regime | null;
  flashTemperature_K: number | null;
  contactTemperature_C: number | null;
}

/**
 * The per-point values along the path of contact, one typed array per quantity (index = point,
 * A to E), in the units of PointResult's keys. Results keep the path in columns so a recompute
 * allocates a few arrays rather than an object per point, and the worker's message carries them as
 * blocks; `pathPoints` (pathSeries.ts) builds the PointResult objects where they are wanted (the JSON
 * `review --json` prints, the CSV). The arrays are read, never written.
 */
export interface PathSeries {
  readonly n: number;
  readonly position_mm: Float64Array;
  readonly pathFraction: Float64Array;
  readonly loadShare: Float64Array;
  readonly hertzStress_MPa: Float64Array;
  readonly pinionFlankVelocity_mps: Float64Array;
  readonly wheelFlankVelocity_mps: Float64Array;
  readonly slidingVelocity_mps: Float64Array;
  readonly sumVelocity_mps: Float64Array;
  readonly slideToRoll: Float64Array;
  readonly specificSlidingPinion: Float64Array;
  readonly specificSlidingWheel: Float64Array;
  /** The film, with an oil (null for a case without one). */
  readonly film: {
    readonly filmThicknessMin_um: Float64Array;
    readonly filmThicknessCentral_um: Float64Array;
    readonly lambda: Float64Array;
    readonly lambdaGF: Float64Array;
    /** The regime at each point as an index into REGIMES (engine/mesh/film.ts): 0 boundary, 1 mixed, 2 full film. */
    readonly regime: Uint8Array;
  } | null;
  /** Flash and contact temperature, with an oil (null for a case without one). */
  readonly heat: {
    readonly flashTemperature_K: Float64Array;
    readonly contactTemperature_C: Float64Array;
  } | null;
}

export interface OilAtTemperature {
  /** The film is computed at the bulk temperature θM; this is that temperature. */
  temperature_C: number;
  viscosity_mm2s: number;
  dynamicViscosity_mPas: number;
  density_kgm3: number;
  pressureViscosity_1perGPa: number;
  temperatureViscosity_1perK: number;
}

export interface VerdictReason {
  /** Stable rule id, e.g. `scuffing.required-stage`. */
  rule: string;
  /** One sentence with the numbers. */
  text: string;
  /** Threshold compared against, in words, e.g. "SB,min = 1.5 (policy)". */
  threshold: string;
  source: string;
}

export interface Caution {
  id: string;
  text: string;
  /** Standing cautions appear on every verdict; triggered ones follow from the inputs. */
  kind: 'standing' | 'triggered';
}

export type Shortfall = 'film' | 'fzg-stage' | 'chemistry' | 'micropitting';
export type ScuffingMethod = 'flash' | 'integral';
export type ScuffingMethods = ScuffingMethod | 'both';
/** The chemistry class a duty needs; `beyond-oil` when no oil in scope gives the margin. */
export type ChemistryNeed = 'r-and-o' | 'anti-wear' | 'extreme-pressure' | 'beyond-oil';

/** One figure against its policy limit: SB ≥ SB,min, SintS ≥ SintS,min, λmin ≥ λ target. */
export interface LimitCheck {
  quantity: 'scuffingSafety' | 'integralSafety' | 'lambdaMin' | 'micropittingSafety';
  /** The symbol as a person reads it: SB, SintS, λmin, Sλ. */
  symbol: string;
  value: number | null;
  limit: number;
  /** null when the figure is not defined (no temperature rise). */
  pass: boolean | null;
}

/** A micropitting failure stage (FVA 54, C-GF gear): 5 … 10, or beyond the test's scale. */
export type MicropittingStageNeeded = number | '>10';
/** The micropitting finding: the oil meets Sλ,min, falls short (a higher class is needed), or its stage is unknown. */
export type MicropittingFinding = 'meets' | 'short' | 'unknown';

/** Micropitting by ISO/TS 6336-22, per case × oil. */
export interface MicropittingResult {
  /** The duty's least λGF in the area at risk (A…B and D…E). */
  lambdaGFMin: number;
  lambdaGFMinPosition_mm: number;
  /** λGF,min of the C-GF test gear with this oil at its failure stage (null: stage unknown). */
  lambdaGFT: number | null;
  /** λGFP = 1.4 WW λGFT (null: stage unknown). */
  lambdaGFP: number | null;
  /** Sλ = λGF,min/λGFP (null: stage unknown). */
  safety: number | null;
  /** True for an oil rated ">10": Sλ is computed at stage 10 and is a lower bound. */
  safetyAtLeast: boolean;
  safetyMin: number;
  materialFactorWW: number;
  /** The oil's FVA 54 failure stage, null when not given. */
  failureStage: MicropittingStageNeeded | null;
  /** The smallest failure stage with Sλ ≥ Sλ,min. */
  requiredFailureStage: MicropittingStageNeeded;
  /** λGFT of the test gear with this oil per stage 5 … 10. */
  lambdaGFTByStage: Array<{ stage: number; lambdaGFT: number }>;
  finding: MicropittingFinding;
  /** One sentence, in words. */
  note: string;
}

export interface CaseVerdict {
  code: VerdictCode;
  oilFit: OilFit | null;
  /** What the oil falls short on: its film λ (a grade matter), its FZG stage, or its chemistry. */
  shortfalls: Shortfall[];
  /** The chemistry class this case needs with this oil. */
  chemistryNeed: ChemistryNeed;
  /** The FZG stage this case needs by the policy's methods. */
  neededFzgStage: FzgStageNeeded;
  /** The method that sets the stage needed. */
  governingMethod: ScuffingMethod;
  /** Each figure against its policy limit, for the methods in use. */
  checks: LimitCheck[];
  /** The micropitting finding (ISO/TS 6336-22): not a reason for EP chemistry. */
  micropitting: MicropittingFinding;
  reasons: VerdictReason[];
  cautions: Caution[];
}

export interface CaseResult {
  loadCase: string;
  oil: string | null;
  pinionSpeed_rpm: number;
  pinionTorque_Nm: number;
  applicationFactor: number;
  oilTemperature_C: number;
  /** On the working pitch circle dw1. */
  pitchLineVelocity_mps: number;
  /** On the reference circle d1 (as ISO 6336 quotes v for Kv). */
  referenceLineVelocity_mps: number;
  nominalContactStress_MPa: number;
  /** The ISO 6336-2 edition of σH (its Zβ), to print beside the figure. */
  nominalContactStressEdition: string;
  nominalContactStressBasic_MPa: number;
  maxHertzStress_MPa: number;
  maxHertzStressPosition_mm: number;
  pitchHertzStress_MPa: number;
  pitch: PointResult;
  /** Every point A…E in columns; `pathPoints(c.path)` gives them as PointResult objects. */
  path: PathSeries;
  // issue 3: oil and film
  oilAtTemperature: OilAtTemperature | null;
  lambdaMin: number | null;
  lambdaMinPosition_mm: number | null;
  regime: Regime | null;
  filmFormula: string | null;
  thermalFilmFactor: number | null;
  filmNote: string | null;
  // issue 4: heat, scuffing, verdict
  frictionCoefficient: number | null;
  frictionSource: string | null;
  bulkTemperature_C: number | null;
  maxFlashTemperature_K: number | null;
  maxContactTemperature_C: number | null;
  maxContactTemperaturePosition_mm: number | null;
  scuffingTemperature_C: number | null;
  scuffingTemperatureAtLeast: boolean;
  scuffingSafety: number | null;
  integralTemperature_C: number | null;
  integralScuffingTemperature_C: number | null;
  integralSafety: number | null;
  requiredFzgStage: FzgStageNeeded | null;
  /** The stage the integral temperature method needs (SintS ≥ SintS,min). */
  requiredFzgStageIntegral: FzgStageNeeded | null;
  scuffingProbability: number | null;
  lambdaGFMin: number | null;
  micropittingAdvisory: string | null;
  /** Micropitting by ISO/TS 6336-22 (null without an oil). */
  micropitting: MicropittingResult | null;
  verdict: CaseVerdict | null;
  warnings: EngineWarning[];
}

export interface OilSummary {
  name: string;
  role: string;
  viscosityIndex: number;
  viscosityIndexSource: 'ASTM D2270' | 'data sheet';
  isoVG: number | null;
  lubricantFactorXL: number;
  chemistry: string;
  baseOil: string;
  fzgFailureStage: number | '>12';
  pressureViscositySource: string;
  warnings: EngineWarning[];
}

export interface OverallVerdict {
  oil: string;
  code: VerdictCode;
  oilFit: OilFit;
  /** The case with the least scuffing margin among those with the most severe verdict. */
  governingLoadCase: string;
  governingMethod: ScuffingMethod;
  /** The FZG stage the duty needs with this oil (most demanding case) against the oil's own. */
  neededFzgStage: FzgStageNeeded;
  oilFzgStage: number | '>12';
  chemistryNeed: ChemistryNeed;
  oilChemistry: string;
  /** The worst micropitting finding over the cases. */
  micropitting: MicropittingFinding;
  /** The micropitting failure stage the duty needs with this oil (most demanding case). */
  neededMicropittingStage: MicropittingStageNeeded | null;
  oilMicropittingStage: MicropittingStageNeeded | null;
  /** The worst figure over the cases against its limit. */
  checks: Array<LimitCheck & { loadCase: string }>;
  /** Time-share-weighted fraction of duty for which the oil meets the need. */
  dutyShareMet: number;
  /** Every shortfall over the load cases. */
  shortfalls: Shortfall[];
  summary: string;
}

export interface GradeFinderRow {
  isoVG: number;
  lambdaMin: number;
  /** The lubrication method can use this grade at the cases' speeds (app/review/gradeLimits.ts). */
  usable: boolean;
}

export interface GradeFinderResult {
  oil: string;
  recommendedVG: number | null;
  currentVG: number | null;
  table: GradeFinderRow[];
  note: string;
  /** The heaviest grade offered, and why heavier ones are left out. */
  usableMaxVG: number;
  leftOut: string;
}

export interface GearResult {
  workingPressureAngle_deg: number;
  transversePressureAngle_deg: number;
  baseHelixAngle_deg: number;
  transverseContactRatio: number;
  overlapRatio: number;
  totalContactRatio: number;
  centerDistance_mm: number;
  profileShift: { pinion: number; wheel: number };
  referenceDiameter_mm: { pinion: number; wheel: number };
  baseDiameter_mm: { pinion: number; wheel: number };
  tipDiameter_mm: { pinion: number; wheel: number };
  workingDiameter_mm: { pinion: number; wheel: number };
  gearRatio: number;
  lineOfAction_mm: number;
  points_mm: { A: number; B: number; C: number; D: number; E: number };
  checks: Array<{ code: string; severity: string; message: string }>;
}

/** What the duty needs, stated once, apart from what any oil offers. */
export interface DutyNeed {
  code: VerdictCode;
  chemistry: ChemistryNeed;
  /** Why that class, in words. */
  chemistryReason: string;
  /** The FZG A/8.3/90 stage by each method the policy uses (null where a method is not used). */
  fzgStageFlash: FzgStageNeeded | null;
  fzgStageIntegral: FzgStageNeeded | null;
  /** The lowest ISO VG that meets the λ target in every case (null: none up to VG 3200, or no oils). */
  isoVG: number | null;
  /** The FVA 54 micropitting failure stage for Sλ ≥ Sλ,min in every case (most demanding over the oils). */
  micropittingStage: MicropittingStageNeeded | null;
  governingLoadCase: string;
  governingMethod: ScuffingMethod;
  methods: ScuffingMethods;
  /** One sentence, in words. */
  statement: string;
}

export type ChangeFindingCode = 'supported' | 'supported-with-conditions' | 'not-supported';

export interface ChangeSide {
  scuffingSafety: number | null;
  integralSafety: number | null;
  lambdaMin: number | null;
  scuffingProbability: number | null;
  neededFzgStage: FzgStageNeeded | null;
  oilFzgStage: number | '>12';
  micropittingSafety: number | null;
  neededMicropittingStage: MicropittingStageNeeded | null;
  oilMicropittingStage: MicropittingStageNeeded | null;
  micropitting: MicropittingFinding | null;
  meets: boolean;
}

export interface ChangeFinding {
  /** Oil names. */
  from: string;
  to: string;
  finding: ChangeFindingCode;
  /** One sentence a manager can read. */
  statement: string;
  conditions: string[];
  byCase: Array<{ loadCase: string; before: ChangeSide; after: ChangeSide }>;
}

/** A caution, once, with the cases and oils it applies to. */
export interface CautionSummary {
  id: string;
  /** A short title, for the list of those that do not apply. */
  title: string;
  text: string;
  /** True when this review's inputs make it apply; standing cautions that do not apply are false. */
  applies: boolean;
  appliesTo: Array<{ loadCase: string; oil: string }>;
}

export type PlanetaryMesh = 'sun-planet' | 'planet-ring';

/** Speeds (rpm, signed: the input member's sense positive) and torques of one load case of a planetary stage. */
export interface PlanetaryCaseKinematics {
  loadCase: string;
  sunSpeed_rpm: number;
  planetSpeed_rpm: number;
  ringSpeed_rpm: number;
  carrierSpeed_rpm: number;
  /** Speeds in the carrier frame, n − nC: what each mesh runs at. */
  sunRelativeSpeed_rpm: number;
  planetRelativeSpeed_rpm: number;
  ringRelativeSpeed_rpm: number;
  sunTorque_Nm: number;
  /** Pinion torque of each mesh: sun T_sun Kγ/planets; planet on the ring T_sun Kγ zP/(zS planets). */
  meshTorque_Nm: Record<PlanetaryMesh, number>;
}

export interface PlanetaryResult {
  held: 'ring' | 'carrier' | 'sun';
  planets: number;
  meshLoadFactorKgamma: number;
  teeth: { sun: number; planet: number; ring: number };
  /** Speed of the driving member over the driven one. */
  ratio: number;
  driving: 'sun' | 'carrier';
  driven: 'carrier' | 'ring';
  centerDistance_mm: number;
  /** Gap between neighbouring planets' tip circles; null for one planet. */
  planetTipGap_mm: number | null;
  /** Multiple-mesh factor Xmp = (1 + n_p)/2 of each mesh's bulk temperature. */
  multipleMeshFactor: Record<PlanetaryMesh, number>;
  loadCases: PlanetaryCaseKinematics[];
  /** Per oil, the mesh whose verdict governs. */
  governingMesh: Array<{ oil: string; mesh: PlanetaryMesh }>;
  /** The mesh whose gear and cases stand at the top level of the results (the one that governs the first oil). */
  shownMesh: PlanetaryMesh;
  checks: Array<{ code: string; severity: string; message: string }>;
}

/** One mesh of a planetary stage, with the keys a gear pair's results have. */
export interface MeshResult {
  mesh: PlanetaryMesh;
  gear: GearResult;
  cases: CaseResult[];
  verdicts: OverallVerdict[];
  gradeFinder: GradeFinderResult[];
}

export interface Results {
  flankfilm: string;
  title: string;
  /** What the duty needs (null without oils). */
  need: DutyNeed | null;
  /** Change findings, one per proposed oil, when the review has an in-service oil. */
  changes: ChangeFinding[];
  /** Every caution once: those that apply first. */
  cautions: CautionSummary[];
  /** For a planetary stage: the governing mesh's (see `planetary.shownMesh`); every mesh is in `meshes`. */
  gear: GearResult;
  oils: OilSummary[];
  cases: CaseResult[];
  verdicts: OverallVerdict[];
  gradeFinder: GradeFinderResult[];
  /** Stated assumptions: factors taken as 1, formulas chosen, and so on. */
  assumptions: string[];
  /** A planetary stage only: the stage's kinematics and checks. */
  planetary?: PlanetaryResult;
  /** A planetary stage only: each mesh's results. */
  meshes?: MeshResult[];
}

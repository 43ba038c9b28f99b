import type { QuantityKind } from '../units/units';

/** What a result means and where it comes from: every result on screen carries this as its tooltip. */
export interface Definition {
  readonly symbol: string;
  readonly label: string;
  readonly kind: QuantityKind;
  readonly definition: string;
  readonly source: string;
}

const d = (symbol: string, label: string, kind: QuantityKind, definition: string, source: string): Definition => ({ symbol, label, kind, definition, source });

export const DEFINITIONS = {
  pitchLineVelocity: d('v', 'Pitch-line velocity', 'velocity', 'Circumferential speed on the working pitch circle dw1, v = π dw1 n1 / 60.', 'ISO 21771 (kinematics)'),
  nominalContactStress: d('σH', 'Nominal contact stress', 'stress', 'σH = ZH ZE Zε Zβ √(Ft (u+1)/(d1 b u)) · √(KA Kv KHβ KHα) at the pitch point.', 'ISO 6336-2'),
  maxHertzStress: d('σH,max', 'Max Hertz stress', 'stress', 'Largest Hertz line-contact pressure along the path, p = √(w E*/(π ρred,n)), with load sharing XΓ.', 'Hertz line contact; XΓ per ISO/TS 6336-20'),
  pitchHertzStress: d('pH,C', 'Hertz stress at C', 'stress', 'Hertz pressure at the pitch point with the whole load on one pair, as load-stage tables quote it.', 'Hertz line contact; ISO 14635-1 tables'),
  lambdaMin: d('λmin', 'Min specific film', 'none', 'Smallest λ = h_min / √(Rq1² + Rq2²) along the path, Rq ≈ 1.25 Ra.', 'Film formula of the policy (Dowson–Higginson or Pan–Hamrock); λ common practice'),
  regime: d('regime', 'Regime at λmin', 'none', 'boundary below the policy’s lower λ limit, full film (EHL) at or above its upper limit, mixed between.', 'Common practice (Tallian); limits from the policy'),
  frictionCoefficient: d('μm', 'Mean friction coefficient', 'none', 'Mean coefficient of friction in the mesh, estimated or from the policy.', 'ISO/TS 6336-20'),
  bulkTemperature: d('θM', 'Bulk temperature', 'temperature', 'θM = θoil + 0.47 XS Xmp θfl,max.', 'ISO/TS 6336-20'),
  maxFlashTemperature: d('θfl,max', 'Max flash temperature', 'temperatureDifference', 'Largest Blok flash temperature rise along the path, θfl = 0.80 μ w |√v1 − √v2| / (BM √bH).', 'Blok (1937); ISO/TS 6336-20'),
  maxContactTemperature: d('θB,max', 'Max contact temperature', 'temperature', 'θB = θM + θfl, its largest value along the path.', 'ISO/TS 6336-20'),
  scuffingTemperature: d('θS', 'Scuffing temperature', 'temperature', 'Contact temperature at which the oil scuffs, from its FZG A/8.3/90 failure stage: θS = 80 + (0.85 + 1.4 XW) XL S² °C.', 'ISO/TS 6336-20; FZG stage per ISO 14635-1'),
  scuffingSafety: d('SB', 'Scuffing safety (flash)', 'none', 'SB = (θS − θoil)/(θB,max − θoil); compared with SB,min of the policy.', 'ISO/TS 6336-20 (flash temperature method)'),
  integralTemperature: d('θint', 'Integral temperature', 'temperature', 'θint = θM + 1.5 θfla,int.', 'ISO/TS 6336-21'),
  integralSafety: d('SintS', 'Scuffing safety (integral)', 'none', 'SintS = θintS / θint; compared with SintS,min of the policy.', 'ISO/TS 6336-21 (integral temperature method)'),
  requiredFzgStage: d('FZG needed', 'FZG stage needed', 'none', 'Smallest FZG A/8.3/90 failure stage for which SB ≥ SB,min; “>12” is beyond the scale.', 'ISO 14635-1 stages; ISO/TS 6336-20'),
  requiredFzgStageIntegral: d('FZG needed, integral', 'FZG stage needed (integral)', 'none', 'Smallest FZG A/8.3/90 failure stage for which SintS ≥ SintS,min; “>12” is beyond the scale.', 'ISO 14635-1 stages; ISO/TS 6336-21'),
  scuffingProbability: d('P', 'Scuffing probability', 'none', 'P = Φ((θB,max − θS)/σ), σ = spread × θS from the policy.', 'AGMA 925 style'),
  lambdaGFMin: d('λGF,min', 'Min micropitting film', 'none', 'λGF = h / Ra,avg, its smallest value along the path.', 'ISO/TS 6336-22; film from ISO/TR 15144-1'),
  micropittingSafety: d('Sλ', 'Micropitting safety', 'none', 'Sλ = λGF,min / λGFP, λGF,min in the area at risk (A–B, D–E), λGFP = 1.4 WW λGFT from the oil’s micropitting failure stage on the C-GF test gear; compared with Sλ,min of the policy.', 'ISO/TS 6336-22; FVA 54 micropitting test'),
  micropittingFinding: d('micropitting', 'Micropitting finding', 'none', 'Meets when Sλ ≥ Sλ,min; short when a higher micropitting class is needed; unknown when the oil’s micropitting failure stage is not given. Not a reason for EP chemistry.', 'ISO/TS 6336-22; policy'),
  requiredMicropittingStage: d('stage needed', 'Micropitting stage needed', 'none', 'Smallest FVA 54 micropitting failure stage (5–10) for which Sλ ≥ Sλ,min; “above 10” is beyond the test’s scale.', 'ISO/TS 6336-22; FVA 54'),
  transverseContactRatio: d('εα', 'Transverse contact ratio', 'none', 'Length of the path of contact divided by the transverse base pitch.', 'ISO 21771'),
  overlapRatio: d('εβ', 'Overlap ratio', 'none', 'εβ = b sin β / (π mn).', 'ISO 21771'),
  totalContactRatio: d('εγ', 'Total contact ratio', 'none', 'εγ = εα + εβ.', 'ISO 21771'),
  centerDistance: d('a', 'Centre distance', 'length', 'Working centre distance, given or from the profile shifts.', 'ISO 21771'),
  lineOfAction: d('gα', 'Path of contact', 'length', 'Length of the path of contact from A to E.', 'ISO 21771'),
  workingPressureAngle: d('αwt', 'Working pressure angle', 'none', 'Transverse working pressure angle, degrees.', 'ISO 21771'),
  gearRatio: d('u', 'Gear ratio', 'none', 'u = z2 / z1.', 'ISO 21771'),
  stageRatio: d('i', 'Stage ratio', 'none', 'Speed of the driving member over the driven one: 1 + zR/zS with the ring held, −zR/zS with the carrier held, zR/(zS + zR) with the sun held.', 'Willis equation'),
  planetTipGap: d('gap', 'Gap between planet tips', 'length', '2 a sin(π/planets) − da,planet: the room between neighbouring planets.', 'Assembly geometry'),
  viscosityIndex: d('VI', 'Viscosity index', 'none', 'From kv40 and kv100 unless the data sheet gives it.', 'ASTM D2270'),
  isoVG: d('ISO VG', 'Viscosity grade', 'none', 'ISO viscosity grade whose ±10 % band holds kv40.', 'ISO 3448'),
  lubricantFactor: d('XL', 'Lubricant factor', 'none', 'Base-oil factor in the friction and scuffing temperature.', 'ISO/TS 6336-20'),
  viscosityAtTemperature: d('ν', 'Viscosity at oil temperature', 'kinematicViscosity', 'Kinematic viscosity at the load case’s oil temperature (Walther).', 'ASTM D341'),
  dutyShareMet: d('duty met', 'Share of duty met', 'none', 'Time-share-weighted fraction of the load cases for which the oil meets the need.', 'Flankfilm (policy)'),
} as const satisfies Record<string, Definition>;

export type DefinitionKey = keyof typeof DEFINITIONS;

/** The tooltip text of a result: definition, then source. */
export const tooltipOf = (def: Definition): string => `${def.label} (${def.symbol}): ${def.definition} Source: ${def.source}.`;

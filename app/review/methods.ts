/**
 * Methods and sources (the record's section and the app's Help): every formula the engine uses, with its
 * published source. `basis` says how firmly the value or form is held:
 *   'published'        — the form as the cited standard or paper gives it;
 *   'memory'           — recalled, consistent with our arithmetic, not read from the text: printed "[memory]";
 *   'common practice'  — a rule of thumb with no single source: printed "common practice".
 */
export type MethodBasis = 'published' | 'memory' | 'common practice';

export interface MethodEntry {
  readonly topic: string;
  readonly quantity: string;
  readonly formula: string;
  readonly source: string;
  readonly basis: MethodBasis;
}

export const METHODS: readonly MethodEntry[] = [
  // Geometry
  { topic: 'Geometry', quantity: 'Reference and base diameters', formula: 'd = z mn / cos β;  αt = atan(tan αn / cos β);  db = d cos αt', source: 'ISO 21771', basis: 'published' },
  { topic: 'Geometry', quantity: 'Working pressure angle and centre distance', formula: 'inv αwt = inv αt + 2 tan αn (x1 + x2)/(z1 + z2);  a = (d1 + d2)/2 · cos αt / cos αwt', source: 'ISO 21771', basis: 'published' },
  { topic: 'Geometry', quantity: 'Points A–E on the line of action (from T1)', formula: 'T1T2 = a sin αwt;  T1A = T1T2 − √(ra2² − rb2²);  T1E = √(ra1² − rb1²);  T1C = rb1 tan αwt;  T1B = T1E − pbt;  T1D = T1A + pbt', source: 'ISO 21771', basis: 'published' },
  { topic: 'Geometry', quantity: 'Contact ratios', formula: 'εα = (T1E − T1A)/pbt;  εβ = b sin β / (π mn)', source: 'ISO 21771', basis: 'published' },
  { topic: 'Geometry', quantity: 'Internal pair (pinion in a ring)', formula: 'ISO 21771 with signed ring data (σ = −1): a = (d2 − d1)/2 · cos αt / cos αwt;  inv αwt = inv αt + 2 tan αn (x1 + x2)/(z1 − z2);  da2 = d2 − 2 mn (1 + x2);  T1A = √(ra2² − rb2²) − T1T2 (T2 beyond T1);  ρ2 = s + T1T2;  σH0 with (u − 1)/u', source: 'ISO 21771; ISO 6336-2 (u < 0 for internal gears)', basis: 'memory' },
  { topic: 'Geometry', quantity: 'Internal pair: tooth-count difference', formula: 'z2 − z1 ≥ 10 for 20° full-depth teeth, else check tip interference', source: 'common practice', basis: 'common practice' },
  { topic: 'Planetary stage', quantity: 'Speeds (Willis equation)', formula: '(nS − nC)/(nR − nC) = −zR/zS;  (nP − nC)/(nS − nC) = −zS/zP; each mesh in the carrier frame', source: 'R. Willis, Principles of Mechanism (1841)', basis: 'memory' },
  { topic: 'Planetary stage', quantity: 'Torque per planet mesh', formula: 'T_sun Kγ / planets on the sun;  T_sun Kγ zP / (zS planets) on the planet into the ring', source: 'ISO 6336-1 (Kγ)', basis: 'memory' },
  { topic: 'Planetary stage', quantity: 'Assembly', formula: 'zR = zS + 2 zP without shifts, else equal centre distances;  (zS + zR)/planets whole;  2 a sin(π/planets) > da,planet', source: 'planetary gear geometry', basis: 'published' },
  { topic: 'Planetary stage', quantity: 'Multiple-mesh factor', formula: 'Xmp = (1 + np)/2: np = planets on the sun–planet mesh, 2 on the planet–ring mesh', source: 'ISO/TS 6336-20', basis: 'memory' },
  { topic: 'Geometry', quantity: 'Undercut limit', formula: 'x ≥ (14 − zn)/17 for αn = 20°', source: 'common practice', basis: 'common practice' },
  { topic: 'Geometry', quantity: 'Pointed tip', formula: 'normal tip thickness ≥ 0.2 mn', source: 'common practice (case-hardened gears)', basis: 'common practice' },
  // Kinematics
  { topic: 'Kinematics', quantity: 'Flank, sum and sliding velocities', formula: 'v1 = ω1 ρ1, v2 = ω2 ρ2;  vΣ = v1 + v2;  vg = |v1 − v2|;  slide-to-roll = 2(v1 − v2)/(v1 + v2)', source: 'ISO 21771 geometry; kinematics of involute gearing', basis: 'published' },
  // Load
  { topic: 'Load', quantity: 'Tooth forces', formula: 'T1 = P/ω1;  Ft = 2 T1/d1;  Fbt = Ft / cos αt', source: 'ISO 6336-1', basis: 'published' },
  { topic: 'Load', quantity: 'Load sharing XΓ along the path', formula: 'spur, unmodified: 1/3 → 2/3 from A to B, 1 from B to D, 2/3 → 1/3 from D to E; helical with εβ ≥ 1: 1/εα', source: 'ISO/TS 6336-20; DIN 3990-4', basis: 'memory' },
  // Stress
  { topic: 'Contact stress', quantity: 'Hertz line contact', formula: 'pH = √(w E* / (π ρred,n));  bH = √(4 w ρred,n / (π E*));  ρn = ρ / cos βb', source: 'H. Hertz (1882); ISO 6336-2', basis: 'published' },
  { topic: 'Contact stress', quantity: 'Reduced radius, external and internal', formula: 'external ρred = ρ1 ρ2/(ρ1 + ρ2);  internal (conformal) ρred = ρ1 ρ2/(ρ2 − ρ1)', source: 'K. L. Johnson, Contact Mechanics §4.2; ISO 6336-2', basis: 'published' },
  { topic: 'Contact stress', quantity: 'Nominal contact stress', formula: 'σH0 = ZH ZE Zε Zβ √(Ft (u ± 1)/(d1 b u)), + external, − internal;  σH = σH0 √(KA Kv KHβ KHα)', source: 'ISO 6336-2:2019 (and :2006): Zβ = 1/√cos β; the 1996 edition\'s √cos β gives a stress lower by cos β', basis: 'published' },
  { topic: 'Contact stress', quantity: 'Contact-ratio factor, helical forms', formula: 'Zε per ISO 6336-2 helical forms', source: 'ISO 6336-2', basis: 'memory' },
  // Oil
  { topic: 'Oil', quantity: 'Viscosity–temperature', formula: 'log log (ν + 0.7 + …) = A − B log T (T in K), anchored at KV40 and KV100', source: 'ASTM D341', basis: 'published' },
  { topic: 'Oil', quantity: 'Viscosity index', formula: 'VI = 100 (L − U)/(L − H); for VI > 100: N = (log H − log U)/log Y, VI = (10^N − 1)/0.00715 + 100', source: 'ASTM D2270', basis: 'published' },
  { topic: 'Oil', quantity: 'ISO viscosity grade', formula: 'VG band ±10 % of its mid-point at 40 °C', source: 'ISO 3448', basis: 'published' },
  { topic: 'Oil', quantity: 'Density at temperature', formula: 'ρ(θ) = ρ15 − 0.7 (θ − 15) kg/m³', source: 'ISO/TR 15144-1 form', basis: 'memory' },
  { topic: 'Oil', quantity: 'Pressure–viscosity coefficient', formula: 'α38 = k η38^n (per base oil);  α(θ) = α38 [1 + 516 (1/(θ + 273) − 1/311)]', source: 'ISO/TR 15144-1 form', basis: 'memory' },
  { topic: 'Oil', quantity: 'Pressure–viscosity, ester and traction fluids', formula: 'typical α38 values', source: 'Jones et al. (1975), NASA TN D-8024', basis: 'memory' },
  { topic: 'Oil', quantity: 'Lubricant factor XL', formula: 'mineral 1.0, PAO 0.8, PAG (insoluble) 0.7, PAG (soluble) 0.6, traction 1.5, phosphate ester 1.3', source: 'ISO/TS 6336-20', basis: 'memory' },
  // Film
  { topic: 'Film', quantity: 'Minimum film, line contact', formula: 'Hmin = 2.65 U^0.7 G^0.54 W^−0.13;  U = η0 ū/(E′R), G = α E′, W = w/(E′R)', source: 'Dowson & Higginson, Elasto-Hydrodynamic Lubrication (1966/1977)', basis: 'memory' },
  { topic: 'Film', quantity: 'Minimum and central film (alternative)', formula: 'Hmin = 1.714 W^−0.128 U^0.694 G^0.568;  Hc = 2.922 W^−0.166 U^0.692 G^0.470', source: 'Pan & Hamrock, ASME J. Tribology 111 (1989)', basis: 'memory' },
  { topic: 'Film', quantity: 'Inlet shear heating', formula: 'φT = 3.94/(3.94 + L^0.62);  L = β η0 ū²/kf', source: 'Murch & Wilson, ASME J. Lubr. Technol. 97 (1975)', basis: 'memory' },
  { topic: 'Film', quantity: 'Oil thermal conductivity', formula: 'kf ≈ 0.13 W/(m·K), mineral oil', source: 'common practice', basis: 'common practice' },
  { topic: 'Film', quantity: 'Local film for λGF', formula: 'hY = 1600 ρn,Y G^0.6 U^0.7 W^−0.13 SGF^0.22 (µm, ρ in mm)', source: 'ISO/TR 15144-1', basis: 'memory' },
  { topic: 'Film', quantity: 'Specific film thickness', formula: 'λ = hmin / √(Rq1² + Rq2²), Rq ≈ 1.25 Ra;  λGF = h / Ra,avg', source: 'Tallian film parameter (common practice); ISO/TS 6336-22 for λGF', basis: 'common practice' },
  { topic: 'Film', quantity: 'Lubrication regime', formula: 'λ < 1 boundary; 1 ≤ λ < 3 mixed; λ ≥ 3 full film (EHL) — limits set by the policy', source: 'common practice', basis: 'common practice' },
  { topic: 'Film', quantity: 'Anti-wear tribofilm thickness', formula: '≈ 50–150 nm', source: 'common practice', basis: 'common practice' },
  // Heat and scuffing
  { topic: 'Scuffing', quantity: 'Mean friction coefficient', formula: 'μm = 0.045 (wBt KBγ/(vΣC ρrelC))^0.2 ηoil^−0.05 XR XL;  XR = 2.2 (Ra/ρrelC)^0.25', source: 'ISO/TS 6336-20', basis: 'memory' },
  { topic: 'Scuffing', quantity: 'Flash temperature (Blok)', formula: 'θfl = 0.80 μ w |√v1 − √v2| / (BM √bH);  BM = √(k ρ c)', source: 'H. Blok (1937); AGMA 925 form', basis: 'memory' },
  { topic: 'Scuffing', quantity: 'Bulk and contact temperature', formula: 'θM = θoil + 0.47 XS Xmp θfl,max (XS 1.0 dip, 1.2 spray; Xmp = (1 + np)/2);  θB = θM + θfl', source: 'ISO/TS 6336-20', basis: 'memory' },
  { topic: 'Scuffing', quantity: 'Scuffing temperature from the FZG stage', formula: 'θS = 80 + (0.85 + 1.4 XW) XL S² °C', source: 'ISO/TS 6336-20; ISO 14635-1 (FZG A/8.3/90)', basis: 'memory' },
  { topic: 'Scuffing', quantity: 'Scuffing safety', formula: 'SB = (θS − θoil)/(θB,max − θoil);  default SB,min = 1.5', source: 'ISO/TS 6336-20 (the default minimum is [memory], weak)', basis: 'memory' },
  { topic: 'Scuffing', quantity: 'Integral temperature method', formula: 'θint = θM + C2 θfla,int, θM = θoil + C1 Xmp θfla,int (C1 = 0.7, C2 = 1.5);  θintS = θMT + XWrelT C2 θfla,int,T with θMT = 80 + 0.23 T1T XL and θfla,int,T = 0.2 T1T XL (T1T the failure-stage torque);  SintS = θintS/θint (°C);  default SintS,min = 1.8', source: 'ISO/TS 6336-21; reproduces its own FZG A/8.3/90 test within ±15 % over stages 5–12 (θint/θintS 1.04 at stage 5 to 0.89 at stage 12) with no calibration factor', basis: 'memory' },
  { topic: 'Scuffing', quantity: 'Flash temperature at E for the integral method', formula: 'θfla,E = θfl,Blok(E, whole load KBγ wBt), no scale factor;  θfla,int = θfla,E Xε', source: 'Blok, as the flash temperature method; on the FZG A gear at stage 12 and 90 °C θfla,int ≈ 106 K against the test\'s own 0.2 · 534.5 = 107 K; Xε per ISO/TS 6336-21', basis: 'memory' },
  { topic: 'Scuffing', quantity: 'Which method decides', formula: 'policy.scuffingMethods: flash, integral or both (default); with both the method that needs the higher FZG stage governs, and each reason names it', source: 'ISO/TS 6336-20 and -21', basis: 'published' },
  { topic: 'Film', quantity: 'Temperature the film is computed at', formula: 'oil properties at the bulk temperature θM (clamped to the oil model\'s range, with a warning)', source: 'as ISO/TR 15144-1 and AGMA 925 take the film at the flank temperature', basis: 'common practice' },
  { topic: 'Scuffing', quantity: 'Scuffing probability', formula: 'θS ~ Normal(θS, σ = spread · θS);  P = Φ((θB,max − θS)/σ); default spread 0.15', source: 'AGMA 925 form', basis: 'memory' },
  { topic: 'Oil classes', quantity: 'FZG floors of the oil classes', formula: 'EP gear oil (CLP) FZG A/8.3/90 ≥ 12; anti-wear hydraulic oil (HLP) ≥ 10; R&O and turbine oils usually 5–9', source: 'DIN 51517-3; DIN 51524-2; R&O range common practice', basis: 'published' },
  // Micropitting
  { topic: 'Micropitting', quantity: 'Least specific film in the area at risk', formula: 'λGF,Y = hY / Ra,avg along the path (hY the ISO/TR 15144-1 local film, SGF = 1);  λGF,min = its least value from A to B and from D to E (the whole path where εα ≤ 1)', source: 'ISO/TS 6336-22 (formerly ISO/TR 15144-1)', basis: 'memory' },
  { topic: 'Micropitting', quantity: 'Test gear and test', formula: 'C-GF gear: FZG type C geometry (z 16/24, mn 4.5 mm, a 91.5 mm, b 14 mm, x 0.1817/0.1715), Ra 0.5 µm, case-carburized; FVA 54 step test at 90 °C, 8.3 m/s (2170 rpm), dip; load stages 5–10 at the ISO 14635-1 torques (94.1 … 372.6 N·m)', source: 'FVA 54; ISO 14635-1; Höhn et al. (2008) Table 1 for the geometry', basis: 'memory' },
  { topic: 'Micropitting', quantity: 'Critical specific film of the test', formula: 'λGFT = λGF,min of the C-GF gear with the same oil at its failure stage, by the same chain (friction, Blok flash, θM, film at θM); an oil rated above 10 is taken at stage 10 (its Sλ a lower bound)', source: 'ISO/TS 6336-22', basis: 'memory' },
  { topic: 'Micropitting', quantity: 'Permissible specific film and safety', formula: 'λGFP = 1.4 · WW · λGFT;  Sλ = λGF,min / λGFP;  default Sλ,min = 1 (weak); the stage needed is the smallest stage 5…10 with Sλ ≥ Sλ,min', source: 'ISO/TS 6336-22 (the default minimum is [memory], weak)', basis: 'memory' },
  { topic: 'Micropitting', quantity: 'Material factor WW', formula: 'case-carburized steel 1.0; through-hardened 0.5, induction- or flame-hardened 0.65, gas-nitrided 1.5 (weak); the pair takes the larger', source: 'ISO/TS 6336-22 guide values', basis: 'memory' },
  { topic: 'Micropitting', quantity: 'Micropitting classes and EP chemistry', formula: 'GFT-low ≤ 7, GFT-medium 8–9, GFT-high ≥ 10 (read as 5, 8, 10); micropitting resistance is a property of the additive system, and some sulphur–phosphorus EP systems lower it: micropitting is no reason for EP', source: 'common practice', basis: 'common practice' },
  { topic: 'Verdict', quantity: 'Grade finder', formula: 'for each ISO VG: KV40 = grade mid-point, KV100 from the oil\'s VI (ASTM D2270 inverted); λmin over every load case at the hotter of its own temperature and the top of the policy range; the lowest grade with λmin ≥ λ target', source: 'ISO 3448; ASTM D2270; the film models above', basis: 'published' },
  { topic: 'Verdict', quantity: 'Operating map', formula: 'λmin, SB, SintS and the verdict over oil temperature × 10–150 % of the case torque, by the same models as the cases', source: 'the models above', basis: 'published' },
  { topic: 'Verdict', quantity: 'Governing case', formula: 'the most severe verdict word; among those, the least scuffing margin min(SB/SB,min, SintS/SintS,min) over the methods in use; then the larger time share', source: 'Flankfilm (a safety decision follows its weakest case)', basis: 'common practice' },
  { topic: 'Verdict', quantity: 'What the duty needs and each oil\'s finding', formula: 'need: chemistry class, FZG stage by each method, lowest ISO VG for the λ target, most demanding over the oils reviewed; each oil: meets the need, or short on chemistry, FZG stage or film (a grade matter)', source: 'the models above; gear-oil classes R&O (DIN 51517-2 CL) and EP (DIN 51517-3 CLP); anti-wear floor from the hydraulic-oil class DIN 51524-2 (HLP)', basis: 'published' },
  { topic: 'Verdict', quantity: 'Change finding', formula: 'in-service → proposed: not supported if the proposed oil is short on chemistry or FZG stage in a case that runs, or no oil gives the margin; supported with conditions if only its film stays below the λ target; else supported', source: 'Flankfilm', basis: 'common practice' },
  { topic: 'Verdict', quantity: 'EP escalation for shock duty', formula: 'KA at or above the policy limit (default 1.75) counts as shock duty', source: 'common practice', basis: 'common practice' },
];

/** The tag printed after a method's source. */
export function basisTag(b: MethodBasis): string {
  return b === 'memory' ? '[memory]' : b === 'common practice' ? 'common practice' : '';
}

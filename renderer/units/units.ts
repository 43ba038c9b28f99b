/**
 * Display units. The review file and the results are SI-style (mm, N·m, kW, °C, mm²/s, kg/m³,
 * MPa, m/s, µm); the US customary system is a view on them. Every factor is exact by definition:
 * 1 in = 25.4 mm and 1 lb = 0.453 592 37 kg (international yard and pound, 1959), standard
 * gravity gn = 9.806 65 m/s² (CGPM 1901), so 1 lbf = 4.448 221 615 260 5 N; 1 hp (mechanical)
 * = 550 ft·lbf/s (NIST SP 811, appendix B). cSt and mm²/s are the same unit.
 */
export type UnitSystem = 'si' | 'us';

/** Kinds of quantity a field or a result can hold. */
export type QuantityKind =
  | 'length' // mm | in
  | 'roughness' // µm | µin
  | 'film' // µm | µin
  | 'torque' // N·m | lbf·in
  | 'power' // kW | hp
  | 'temperature' // °C | °F
  | 'temperatureDifference' // K | °F (a rise, such as the flash temperature)
  | 'kinematicViscosity' // mm²/s | cSt
  | 'density' // kg/m³ | lb/ft³
  | 'stress' // MPa | ksi
  | 'velocity' // m/s | ft/s
  | 'none';

const INCH_MM = 25.4;
const POUND_KG = 0.45359237;
const GRAVITY = 9.80665;
const LBF_N = POUND_KG * GRAVITY; // 4.4482216152605 N
const FOOT_M = 0.3048;

/** Linear factors: SI value = US value × factor. Temperature has an offset and is handled apart. */
export const US_FACTOR: Readonly<Record<Exclude<QuantityKind, 'temperature' | 'none'>, number>> = {
  length: INCH_MM, // mm per in
  roughness: INCH_MM / 1000, // µm per µin
  film: INCH_MM / 1000, // µm per µin
  torque: LBF_N * (INCH_MM / 1000), // N·m per lbf·in
  power: (550 * FOOT_M * LBF_N) / 1000, // kW per hp (mechanical)
  temperatureDifference: 5 / 9, // K per °F difference
  kinematicViscosity: 1, // mm²/s per cSt
  density: POUND_KG / FOOT_M ** 3, // kg/m³ per lb/ft³
  stress: ((LBF_N / (INCH_MM / 1000) ** 2) * 1000) / 1e6, // MPa per ksi: 1000 lbf/in² = 6.894 757… MPa
  velocity: FOOT_M, // m/s per ft/s
};

const SI_LABEL: Readonly<Record<QuantityKind, string>> = {
  length: 'mm',
  roughness: 'µm',
  film: 'µm',
  torque: 'N·m',
  power: 'kW',
  temperature: '°C',
  temperatureDifference: 'K',
  kinematicViscosity: 'mm²/s',
  density: 'kg/m³',
  stress: 'MPa',
  velocity: 'm/s',
  none: '',
};

const US_LABEL: Readonly<Record<QuantityKind, string>> = {
  length: 'in',
  roughness: 'µin',
  film: 'µin',
  torque: 'lbf·in',
  power: 'hp',
  temperature: '°F',
  temperatureDifference: 'Δ°F',
  kinematicViscosity: 'cSt',
  density: 'lb/ft³',
  stress: 'ksi',
  velocity: 'ft/s',
  none: '',
};

/** The unit label of a kind in a system. */
export function unitLabel(kind: QuantityKind, system: UnitSystem): string {
  return system === 'si' ? SI_LABEL[kind] : US_LABEL[kind];
}

/** A file/result value (SI-style) as shown in `system`. */
export function toDisplay(kind: QuantityKind, value: number, system: UnitSystem): number {
  if (system === 'si' || kind === 'none') return value;
  if (kind === 'temperature') return (value * 9) / 5 + 32;
  return value / US_FACTOR[kind];
}

/** A value typed in `system` back to the file's unit. */
export function fromDisplay(kind: QuantityKind, value: number, system: UnitSystem): number {
  if (system === 'si' || kind === 'none') return value;
  if (kind === 'temperature') return ((value - 32) * 5) / 9;
  return value * US_FACTOR[kind];
}

/**
 * SI quantities as branded numbers. The engine works in SI only (m, N, Pa, s, K, kg);
 * conversion to mm, MPa, °C or µm happens at the edges (app/review, renderer, app/report).
 * A brand costs nothing at run time: it only stops a bare number, or a number in the
 * wrong unit, from reaching a function that expects another unit.
 */
declare const unit: unique symbol;
export type Quantity<U extends string> = number & { readonly [unit]: U };

export type Metres = Quantity<'m'>;
export type SquareMetres = Quantity<'m2'>;
export type Radians = Quantity<'rad'>;
export type RadiansPerSecond = Quantity<'rad/s'>;
export type MetresPerSecond = Quantity<'m/s'>;
export type Newtons = Quantity<'N'>;
export type NewtonMetres = Quantity<'N·m'>;
export type NewtonsPerMetre = Quantity<'N/m'>;
export type Watts = Quantity<'W'>;
export type Pascals = Quantity<'Pa'>;
export type PerPascal = Quantity<'1/Pa'>;
export type Kelvin = Quantity<'K'>;
/** A temperature difference (a flash temperature, a rise), not an absolute temperature. */
export type KelvinDifference = Quantity<'ΔK'>;
export type PerKelvin = Quantity<'1/K'>;
export type PascalSeconds = Quantity<'Pa·s'>;
export type SquareMetresPerSecond = Quantity<'m2/s'>;
export type KilogramsPerCubicMetre = Quantity<'kg/m3'>;
export type WattsPerMetreKelvin = Quantity<'W/(m·K)'>;
export type JoulesPerKilogramKelvin = Quantity<'J/(kg·K)'>;
/** Thermal contact coefficient √(k ρ c), in W·s^0.5/(m²·K). */
export type ThermalContactCoefficient = Quantity<'W·s^0.5/(m2·K)'>;

/** Brand a number that is already in the SI unit named by the type. */
export function si<Q extends Quantity<string>>(value: number): Q {
  return value as Q;
}

export const metres = (v: number): Metres => v as Metres;
export const radians = (v: number): Radians => v as Radians;
export const pascals = (v: number): Pascals => v as Pascals;
export const kelvin = (v: number): Kelvin => v as Kelvin;

export const ZERO_CELSIUS_K = 273.15;
export const degreesToRadians = (deg: number): Radians => ((deg * Math.PI) / 180) as Radians;
export const radiansToDegrees = (rad: Radians): number => (rad * 180) / Math.PI;
export const celsiusToKelvin = (c: number): Kelvin => (c + ZERO_CELSIUS_K) as Kelvin;
export const kelvinToCelsius = (k: Kelvin): number => k - ZERO_CELSIUS_K;
export const millimetres = (mm: number): Metres => (mm * 1e-3) as Metres;
export const toMillimetres = (m: Metres): number => m * 1e3;
export const toMicrometres = (m: Metres): number => m * 1e6;
export const micrometres = (um: number): Metres => (um * 1e-6) as Metres;
export const megapascals = (mpa: number): Pascals => (mpa * 1e6) as Pascals;
export const toMegapascals = (p: Pascals): number => p / 1e6;
export const gigapascals = (gpa: number): Pascals => (gpa * 1e9) as Pascals;
/** mm²/s (cSt) to m²/s. */
export const centistokes = (cst: number): SquareMetresPerSecond => (cst * 1e-6) as SquareMetresPerSecond;
export const toCentistokes = (v: SquareMetresPerSecond): number => v * 1e6;
export const toMillipascalSeconds = (eta: PascalSeconds): number => eta * 1e3;
export const perGigapascal = (x: number): PerPascal => (x * 1e-9) as PerPascal;
export const toPerGigapascal = (a: PerPascal): number => a * 1e9;
export const rpmToRadiansPerSecond = (rpm: number): RadiansPerSecond => ((2 * Math.PI * rpm) / 60) as RadiansPerSecond;

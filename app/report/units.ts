/**
 * Display units of the record and the CSV. The results carry mm, MPa, m/s, µm, °C, K (a
 * temperature rise), N·m, kW and mm²/s in their key names; this module turns them into the
 * review's unit system ('si' keeps them, 'us' converts) and formats them. A null or non-finite
 * number prints as "—", never "NaN".
 */
export type UnitSystem = 'si' | 'us';

export type Quantity =
  | 'length' // mm
  | 'roughness' // µm
  | 'film' // µm
  | 'stress' // MPa
  | 'modulus' // GPa
  | 'velocity' // m/s
  | 'temperature' // °C
  | 'temperatureRise' // K
  | 'torque' // N·m
  | 'power' // kW
  | 'speed' // rpm
  | 'kinematicViscosity' // mm²/s
  | 'dynamicViscosity' // mPa·s
  | 'density' // kg/m³
  | 'pressureViscosity' // 1/GPa
  | 'conductivity' // W/(m·K)
  | 'specificHeat' // J/(kg·K)
  | 'angle' // °
  | 'none';

interface UnitDef {
  readonly unit: string;
  /** From the results' unit to this one. */
  readonly convert: (x: number) => number;
}

const same = (unit: string): UnitDef => ({ unit, convert: (x) => x });
const scale = (unit: string, k: number): UnitDef => ({ unit, convert: (x) => x * k });

// Conversion factors are exact definitions (NIST SP 811, Appendix B) unless noted.
const SI: Readonly<Record<Quantity, UnitDef>> = {
  length: same('mm'),
  roughness: same('µm'),
  film: same('µm'),
  stress: same('MPa'),
  modulus: same('GPa'),
  velocity: same('m/s'),
  temperature: same('°C'),
  temperatureRise: same('K'),
  torque: same('N·m'),
  power: same('kW'),
  speed: same('rpm'),
  kinematicViscosity: same('mm²/s'),
  dynamicViscosity: same('mPa·s'),
  density: same('kg/m³'),
  pressureViscosity: same('1/GPa'),
  conductivity: same('W/(m·K)'),
  specificHeat: same('J/(kg·K)'),
  angle: same('°'),
  none: same(''),
};

const INCH_MM = 25.4;
const PSI_PA = 6894.757293168; // lbf/in² (NIST SP 811)
const LBF_FT_NM = 1.3558179483314; // lbf·ft (NIST SP 811)
const HP_KW = 0.745699871582; // mechanical horsepower, 550 ft·lbf/s (NIST SP 811)
const LB_FT3_KGM3 = 16.01846337; // lb/ft³ (NIST SP 811)

const US: Readonly<Record<Quantity, UnitDef>> = {
  length: scale('in', 1 / INCH_MM),
  roughness: scale('µin', 1000 / INCH_MM),
  film: scale('µin', 1000 / INCH_MM),
  stress: scale('ksi', 1e6 / PSI_PA / 1000),
  modulus: scale('Msi', 1e9 / PSI_PA / 1e6),
  velocity: scale('ft/min', 60 / 0.3048),
  temperature: { unit: '°F', convert: (c) => c * 1.8 + 32 },
  temperatureRise: scale('°F', 1.8),
  torque: scale('lbf·ft', 1 / LBF_FT_NM),
  power: scale('hp', 1 / HP_KW),
  speed: same('rpm'),
  kinematicViscosity: same('cSt'),
  dynamicViscosity: same('cP'),
  density: scale('lb/ft³', 1 / LB_FT3_KGM3),
  pressureViscosity: scale('1/ksi', (PSI_PA * 1000) / 1e9),
  conductivity: scale('BTU/(h·ft·°F)', 0.5778), // 1 BTU_IT/(h·ft·°F) = 1.730735 W/(m·K) (NIST SP 811), rounded
  specificHeat: scale('BTU/(lb·°F)', 1 / 4186.8), // 1 BTU_IT/(lb·°F) = 4186.8 J/(kg·K) (NIST SP 811)
  angle: same('°'),
  none: same(''),
};

export const DASH = '—';

export interface Units {
  readonly system: UnitSystem;
  unit(q: Quantity): string;
  value(x: number, q: Quantity): number;
  /** Number only, in display units, with `digits` significant figures (default 4); "—" for null. */
  num(x: number | null | undefined, q: Quantity, digits?: number): string;
  /** Number and unit, e.g. "1 234 MPa"; "—" for null. */
  fmt(x: number | null | undefined, q: Quantity, digits?: number): string;
}

export function unitsFor(system: UnitSystem): Units {
  const table = system === 'us' ? US : SI;
  return {
    system,
    unit: (q) => table[q].unit,
    value: (x, q) => table[q].convert(x),
    num: (x, q, digits = 4) => (x === null || x === undefined || !Number.isFinite(x) ? DASH : formatNumber(table[q].convert(x), digits)),
    fmt: (x, q, digits = 4) => {
      if (x === null || x === undefined || !Number.isFinite(x)) return DASH;
      const u = table[q].unit;
      const n = formatNumber(table[q].convert(x), digits);
      if (!u) return n;
      return u === '°' ? `${n}°` : `${n} ${u}`;
    },
  };
}

/**
 * A number with `digits` significant figures, no exponent for everyday magnitudes, a true minus
 * sign, and "—" for a non-finite value.
 */
export function formatNumber(x: number | null | undefined, digits = 4): string {
  if (x === null || x === undefined || !Number.isFinite(x)) return DASH;
  if (x === 0) return '0';
  const abs = Math.abs(x);
  let s: string;
  if (abs >= 1e-3 && abs < 1e7) {
    const decimals = Math.max(0, digits - 1 - Math.floor(Math.log10(abs)));
    s = x.toFixed(Math.min(decimals, 8));
    if (s.includes('.')) s = s.replace(/0+$/, '').replace(/\.$/, '');
  } else {
    const [m, e] = x.toExponential(digits - 1).split('e');
    s = `${(m ?? '').replace(/(\.\d*?)0+$/, '$1').replace(/\.$/, '')}×10${superscript(Number(e))}`;
  }
  if (s === '-0') s = '0';
  return s.replace('-', '−');
}

const SUPERSCRIPT: Readonly<Record<string, string>> = { '0': '⁰', '1': '¹', '2': '²', '3': '³', '4': '⁴', '5': '⁵', '6': '⁶', '7': '⁷', '8': '⁸', '9': '⁹', '-': '⁻' };
const superscript = (n: number): string => [...String(n)].map((c) => SUPERSCRIPT[c] ?? c).join('');

/** A fraction as a percentage, "—" for null. */
export function formatPercent(x: number | null | undefined, digits = 3): string {
  if (x === null || x === undefined || !Number.isFinite(x)) return DASH;
  return `${formatNumber(x * 100, digits)} %`;
}

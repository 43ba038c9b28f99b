/**
 * The labels, units and value words of the review's inputs, as the screen shows them. One table
 * for the panels (renderer/components/panels), the audit of changes (app/review/audit) and the
 * CLI's `diff`, so a change is named with the words of the field the reader edits.
 */
import { SCUFFING_METHODS } from '../engine/mesh/types';
import { MATERIAL_WORDS, ROLE_WORDS } from './vocabulary';
import { BASE_OILS, CHEMISTRIES } from '../engine/oil/types';
import { COMPONENTS, FILM_FORMULAS } from './schema';

/** Panels of the sheet that hold inputs (NAMES.md), plus the record's identity. */
export const INPUT_PANELS = ['Gear set', 'Duty', 'Oils', 'Policy', 'Record details'] as const;
export type InputPanel = (typeof INPUT_PANELS)[number];

/** Quantities whose unit follows the SI / US switch (the renderer's QuantityKind has them all). */
export type InputKind = 'length' | 'roughness' | 'torque' | 'power' | 'temperature' | 'kinematicViscosity' | 'density';

export interface InputLabel {
  readonly label: string;
  /** The label in US customary units, where it differs. */
  readonly usLabel?: string;
  /** A quantity that converts with the unit switch … */
  readonly kind?: InputKind;
  /** … or a fixed unit (rpm, °, GPa …). */
  readonly unit?: string;
  /** Words for the coded values of a choice. */
  readonly words?: Readonly<Record<string, string>>;
  /** What an optional field left empty means, where a value is computed instead (else "empty"). */
  readonly emptyWords?: string;
}

export { MATERIAL_WORDS };

export const COMPONENT_WORDS: Readonly<Record<(typeof COMPONENTS)[number], string>> = {
  'bronze-bushing': 'Bronze bushings',
  'brass-cage': 'Brass bearing cages',
  'yellow-metal': 'Other yellow metals',
  backstop: 'Backstop',
  clutch: 'Clutch',
  'food-contact': 'Incidental food contact',
  'paint-or-seal-sensitive': 'Sensitive paint or seals',
};

export const BASE_OIL_WORDS: Readonly<Record<(typeof BASE_OILS)[number], string>> = {
  mineral: 'Mineral',
  pao: 'PAO',
  'pag-insoluble': 'PAG, water-insoluble',
  'pag-soluble': 'PAG, water-soluble',
  ester: 'Ester',
  'phosphate-ester': 'Phosphate ester',
  traction: 'Traction fluid',
};

export const CHEMISTRY_WORDS: Readonly<Record<(typeof CHEMISTRIES)[number], string>> = {
  // The trade's classes: R&O gear oil DIN 51517-2 CL, EP gear oil DIN 51517-3 CLP; anti-wear oils are mostly the hydraulic class DIN 51524-2 HLP.
  'r-and-o': 'R&O, rust and oxidation (DIN 51517-2 CL)',
  'anti-wear': 'AW, anti-wear (as DIN 51524-2 HLP)',
  'extreme-pressure': 'EP, extreme pressure (DIN 51517-3 CLP)',
};

export const FILM_FORMULA_WORDS: Readonly<Record<(typeof FILM_FORMULAS)[number], string>> = {
  'dowson-higginson': 'Dowson–Higginson (line contact)',
  'pan-hamrock': 'Pan–Hamrock (1989)',
};

export const SCUFFING_METHOD_CHOICES: Readonly<Record<(typeof SCUFFING_METHODS)[number], string>> = {
  both: 'Both (flash and integral)',
  flash: 'Flash temperature (ISO/TS 6336-20)',
  integral: 'Integral temperature (ISO/TS 6336-21)',
};

export const LUBRICATION_WORDS: Readonly<Record<'dip' | 'spray', string>> = { dip: 'Dip (splash)', spray: 'Spray (injection)' };
export const OIL_ROLE_WORDS = ROLE_WORDS;
const UNIT_SYSTEM_WORDS = { si: 'SI', us: 'US customary' } as const;
const ON_OFF = { true: 'on', false: 'off' } as const;

const member = (n: 1 | 2 | 'S' | 'P' | 'R', internal = false): Readonly<Record<string, InputLabel>> => ({
  teeth: { label: `Teeth z${n}` },
  profileShift: { label: `Profile shift x${n}` },
  tipDiameter_mm: { label: internal ? 'Inner (tip) diameter da' : 'Tip diameter da', kind: 'length' },
  roughnessRa_um: { label: 'Flank roughness Ra', kind: 'roughness' },
  material: { label: 'Material', words: { ...MATERIAL_WORDS } },
  'material.youngsModulus_GPa': { label: 'Young’s modulus E', unit: 'GPa' },
  'material.poissonRatio': { label: 'Poisson’s ratio ν' },
  'material.thermalConductivity_WmK': { label: 'Thermal conductivity k', unit: 'W/(m·K)' },
  'material.density_kgm3': { label: 'Density ρ', kind: 'density' },
  'material.specificHeat_JkgK': { label: 'Specific heat c', unit: 'J/(kg·K)' },
  'material.structuralFactorXW': { label: 'Structural factor XW' },
  'material.micropittingFactorWW': { label: 'Micropitting material factor WW' },
});

const prefixed = (prefix: string, t: Readonly<Record<string, InputLabel>>) => Object.fromEntries(Object.entries(t).map(([k, v]) => [`${prefix}.${k}`, v]));

/**
 * Labels by pattern: the review path with list indexes written `[]`. Patterns under `gearPair.pinion`
 * and `gearPair.wheel` differ only in the member's index (z1, z2).
 */
export const INPUT_LABELS: Readonly<Record<string, InputLabel>> = {
  title: { label: 'Review title' },
  id: { label: 'Review id' },
  revision: { label: 'Revision' },
  date: { label: 'Date' },
  notes: { label: 'Notes' },
  displayUnits: { label: 'Display units', words: UNIT_SYSTEM_WORDS },
  'gearPair.normalModule_mm': { label: 'Normal module mn', kind: 'length' },
  'gearPair.normalPressureAngle_deg': { label: 'Pressure angle αn', unit: '°' },
  'gearPair.helixAngle_deg': { label: 'Helix angle β', unit: '°' },
  'gearPair.faceWidth_mm': { label: 'Face width b', kind: 'length' },
  'gearPair.centerDistance_mm': { label: 'Centre distance a', kind: 'length' },
  'gearPair.pinionMeshes': { label: 'Meshes of the pinion np' },
  ...prefixed('gearPair.pinion', member(1)),
  ...prefixed('gearPair.wheel', member(2)),
  'gearPair.dynamicFactorKv': { label: 'Dynamic factor Kv' },
  'gearPair.faceLoadFactorKHbeta': { label: 'Face load factor KHβ' },
  'gearPair.transverseLoadFactorKHalpha': { label: 'Transverse load factor KHα' },
  'gearPair.components': { label: 'Parts in the oil circuit', words: COMPONENT_WORDS },
  'gearPair.kind': { label: 'Kind of gear set', words: { external: 'External pair', internal: 'Internal pair (pinion in a ring)' } },
  'planetary.normalModule_mm': { label: 'Normal module mn', kind: 'length' },
  'planetary.normalPressureAngle_deg': { label: 'Pressure angle αn', unit: '°' },
  'planetary.helixAngle_deg': { label: 'Helix angle β', unit: '°' },
  'planetary.faceWidth_mm': { label: 'Face width b', kind: 'length' },
  'planetary.planets': { label: 'Planets' },
  'planetary.meshLoadFactorKgamma': { label: 'Mesh load factor Kγ' },
  'planetary.held': { label: 'Member held', words: { ring: 'Ring held', carrier: 'Carrier held', sun: 'Sun held' } },
  ...prefixed('planetary.sun', member('S')),
  ...prefixed('planetary.planet', member('P')),
  ...prefixed('planetary.ring', member('R', true)),
  'planetary.components': { label: 'Parts in the oil circuit', words: COMPONENT_WORDS },
  'planetary.dynamicFactorKv': { label: 'Dynamic factor Kv' },
  'planetary.faceLoadFactorKHbeta': { label: 'Face load factor KHβ' },
  'planetary.transverseLoadFactorKHalpha': { label: 'Transverse load factor KHα' },
  'loadCases[].name': { label: 'Name' },
  'loadCases[].pinionSpeed_rpm': { label: 'Pinion speed n1', unit: 'rpm' },
  'loadCases[].pinionTorque_Nm': { label: 'Pinion torque T1', kind: 'torque' },
  'loadCases[].power_kW': { label: 'Power P', kind: 'power' },
  'loadCases[].sunSpeed_rpm': { label: 'Sun speed', unit: 'rpm' },
  'loadCases[].carrierSpeed_rpm': { label: 'Carrier speed', unit: 'rpm' },
  'loadCases[].sunTorque_Nm': { label: 'Sun torque', kind: 'torque' },
  'loadCases[].applicationFactor': { label: 'Application factor KA' },
  'loadCases[].oilTemperature_C': { label: 'Oil temperature θoil', kind: 'temperature' },
  'loadCases[].lubrication': { label: 'Lubrication', words: LUBRICATION_WORDS },
  'loadCases[].timeShare': { label: 'Share of operating time' },
  'oils[].name': { label: 'Name' },
  'oils[].role': { label: 'Role', words: OIL_ROLE_WORDS },
  'oils[].kv40_mm2s': { label: 'Viscosity at 40 °C', usLabel: 'Viscosity at 40 °C (104 °F)', kind: 'kinematicViscosity' },
  'oils[].kv100_mm2s': { label: 'Viscosity at 100 °C', usLabel: 'Viscosity at 100 °C (212 °F)', kind: 'kinematicViscosity' },
  'oils[].viscosityIndex': { label: 'Viscosity index VI', emptyWords: 'computed by ASTM D2270' },
  'oils[].density15_kgm3': { label: 'Density at 15 °C', usLabel: 'Density at 15 °C (59 °F)', kind: 'density' },
  'oils[].baseOil': { label: 'Base oil', words: BASE_OIL_WORDS },
  'oils[].chemistry': { label: 'Additive chemistry', words: CHEMISTRY_WORDS },
  'oils[].fzgFailureStage': { label: 'FZG A/8.3/90 failure stage', words: { '>12': 'above 12' } },
  'oils[].micropittingFailureStage': { label: 'Micropitting failure stage (FVA 54, C-GF)', words: { '>10': 'above 10' } },
  'oils[].pressureViscosity_1perGPa': { label: 'Pressure–viscosity α', unit: '1/GPa' },
  'policy.lambdaTarget': { label: 'λ target' },
  'policy.scuffingSafetyMin': { label: 'SB,min (flash)' },
  'policy.integralSafetyMin': { label: 'SintS,min (integral)' },
  'policy.antiWearOilFzgStage': { label: 'FZG floor, AW oils' },
  'policy.epOilFzgStage': { label: 'FZG floor, EP oils' },
  'policy.temperatureRange_C[0]': { label: 'Temperature range, low', kind: 'temperature' },
  'policy.temperatureRange_C[1]': { label: 'Temperature range, high', kind: 'temperature' },
  'policy.shockApplicationFactor': { label: 'Shock duty from KA' },
  'policy.filmFormula': { label: 'Film formula', words: FILM_FORMULA_WORDS },
  'policy.boundaryBelowLambda': { label: 'Boundary below λ' },
  'policy.fullFilmFromLambda': { label: 'Full film from λ' },
  'policy.frictionCoefficient': { label: 'Friction coefficient μ' },
  'policy.scuffingTemperatureSpread': { label: 'Spread of θS (σ/θS)' },
  'policy.pathPoints': { label: 'Points along the path' },
  'policy.micropittingSafetyMin': { label: 'Sλ,min (micropitting)' },
  'policy.scuffingMethods': { label: 'Scuffing methods', words: SCUFFING_METHOD_CHOICES },
  'policy.thermalFilmCorrection': { label: 'Inlet shear heating correction (Murch–Wilson)', words: ON_OFF },
};

/** A review path as segments, e.g. ['loadCases', 1, 'oilTemperature_C']. */
export type InputPath = readonly (string | number)[];

/**
 * The table key of a path: list indexes of load cases and oils become `[]`; the two ends of the
 * temperature range keep theirs (each end has its own field).
 */
export function labelPattern(path: InputPath): string {
  let out = '';
  path.forEach((p, i) => {
    if (typeof p === 'number') out += i === 1 && (path[0] === 'loadCases' || path[0] === 'oils') ? '[]' : `[${p}]`;
    else out += out ? `.${p}` : p;
  });
  return out;
}

/** The label entry of a path, or undefined for a path the screen has no field for. */
export function inputLabelOf(path: InputPath): InputLabel | undefined {
  return INPUT_LABELS[labelPattern(path)];
}

/** The label of the field at `path` in a unit system ('si' unless given). */
export function fieldLabel(path: InputPath, system: 'si' | 'us' = 'si'): string {
  const l = inputLabelOf(path);
  if (!l) return labelPattern(path);
  return system === 'us' && l.usLabel ? l.usLabel : l.label;
}

/** The gear a field belongs to: 'Pinion' or 'Wheel' of a pair, 'Sun', 'Planet' or 'Ring' of a planetary stage; else null. */
export function memberOf(path: InputPath): GearMemberName | null {
  if (path[0] === 'gearPair' && (path[1] === 'pinion' || path[1] === 'wheel')) return path[1] === 'pinion' ? 'Pinion' : 'Wheel';
  if (path[0] === 'planetary' && (path[1] === 'sun' || path[1] === 'planet' || path[1] === 'ring')) return PLANETARY_MEMBERS[path[1]];
  return null;
}

export type GearMemberName = 'Pinion' | 'Wheel' | 'Sun' | 'Planet' | 'Ring';
const PLANETARY_MEMBERS = { sun: 'Sun', planet: 'Planet', ring: 'Ring' } as const;

/** The panel on which a path's field sits. */
export function panelOf(path: InputPath): InputPanel {
  switch (path[0]) {
    case 'title':
    case 'gearPair':
    case 'planetary':
      return 'Gear set';
    case 'loadCases':
      return 'Duty';
    case 'oils':
      return 'Oils';
    case 'policy':
      return 'Policy';
    default:
      return 'Record details';
  }
}

/** The file's (SI) unit of each switchable kind; the screen and the record convert from these. */
export const FILE_UNIT_OF_KIND: Readonly<Record<InputKind, string>> = {
  length: 'mm',
  roughness: 'µm',
  torque: 'N·m',
  power: 'kW',
  temperature: '°C',
  kinematicViscosity: 'mm²/s',
  density: 'kg/m³',
};

/** The unit of a field in the file's units ('' for a pure number or a choice). */
export function fileUnitOf(l: InputLabel | undefined): string {
  if (!l) return '';
  return l.unit ?? (l.kind ? FILE_UNIT_OF_KIND[l.kind] : '');
}

import { MATERIALS, type MaterialPreset } from '../../engine/materials';
import type { GearPair } from '../../review/schema';
import { formatNumber, type Units } from '../units';
import { MATERIAL_WORDS } from '../../review/vocabulary';

/** Helpers shared by the gear pair and the planetary stage inputs. */
export function shift(input: number | undefined, used: number): string {
  return `${input === undefined ? '(derived)' : formatNumber(input, 4)} → ${formatNumber(used, 4)}`;
}

export function tip(u: Units, input: number | undefined, used: number): string {
  return `${input === undefined ? '(derived)' : u.fmt(input, 'length', 5)} → ${u.fmt(used, 'length', 5)}`;
}

export function materialName(m: GearPair['pinion']['material']): string {
  return typeof m === 'string' ? MATERIAL_WORDS[m] : 'custom (see Materials)';
}

export function materialRow(u: Units, member: string, m: GearPair['pinion']['material']): string[] {
  if (typeof m === 'string') {
    const p = MATERIALS[m as MaterialPreset];
    return [
      `${member}: ${MATERIAL_WORDS[m]}`,
      u.fmt(p.youngsModulus / 1e9, 'modulus'),
      formatNumber(p.poissonRatio, 3),
      u.fmt(p.thermalConductivity, 'conductivity', 3),
      u.fmt(p.density, 'density'),
      u.fmt(p.specificHeat, 'specificHeat', 3),
      `${formatNumber(p.structuralFactorXW, 3)} / ${formatNumber(p.micropittingFactorWW ?? 1, 3)}`,
    ];
  }
  return [
    `${member}: custom`,
    u.fmt(m.youngsModulus_GPa, 'modulus'),
    formatNumber(m.poissonRatio, 3),
    u.fmt(m.thermalConductivity_WmK, 'conductivity', 3),
    u.fmt(m.density_kgm3, 'density'),
    u.fmt(m.specificHeat_JkgK, 'specificHeat', 3),
    `${formatNumber(m.structuralFactorXW, 3)} / ${formatNumber(m.micropittingFactorWW ?? 1, 3)}`,
  ];
}


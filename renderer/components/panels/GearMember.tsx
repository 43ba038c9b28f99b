import { MATERIAL_PRESETS } from '../../../app/engine/materials';
import { useSheet } from '../../state/context';
import { getIn } from '../../state/paths';
import { NumberField } from '../fields/NumberField';
import { SelectField } from '../fields/SelectField';

const MATERIAL_WORDS: Readonly<Record<(typeof MATERIAL_PRESETS)[number], string>> = {
  'steel-carburized': 'Steel, case carburized',
  'steel-through-hardened': 'Steel, through hardened',
  'steel-nitrided': 'Steel, nitrided',
};

/** Steel thermal data as a starting point for a custom material (materials.ts). */
const CUSTOM_START = { youngsModulus_GPa: 206, poissonRatio: 0.3, thermalConductivity_WmK: 50, density_kgm3: 7800, specificHeat_JkgK: 470, structuralFactorXW: 1 };

/** One gear of the pair: teeth, shift, tip, roughness, material. */
export function GearMember({ member, title }: { readonly member: 'pinion' | 'wheel'; readonly title: string }) {
  const { draft, dispatch } = useSheet();
  const p = ['gearPair', member] as const;
  const material = getIn(draft, [...p, 'material']);
  const custom = typeof material === 'object' && material !== null;
  return (
    <fieldset className="member">
      <legend>{title}</legend>
      <NumberField path={[...p, 'teeth']} label={`Teeth z${member === 'pinion' ? 1 : 2}`} />
      <NumberField path={[...p, 'profileShift']} label={`Profile shift x${member === 'pinion' ? 1 : 2}`} optional />
      <NumberField path={[...p, 'tipDiameter_mm']} label="Tip diameter da" kind="length" optional />
      <NumberField path={[...p, 'roughnessRa_um']} label="Flank roughness Ra" kind="roughness" />
      <SelectField
        path={[...p, 'material']}
        label="Material"
        value={custom ? 'custom' : (material as string)}
        options={[...MATERIAL_PRESETS.map((m) => [m, MATERIAL_WORDS[m]] as const), ['custom', 'Custom material'] as const]}
        onValue={(v) => dispatch({ type: 'set', path: [...p, 'material'], value: v === 'custom' ? CUSTOM_START : v })}
      />
      {custom ? (
        <div className="custom-material">
          <NumberField path={[...p, 'material', 'youngsModulus_GPa']} label="Young’s modulus E" unit="GPa" />
          <NumberField path={[...p, 'material', 'poissonRatio']} label="Poisson’s ratio ν" />
          <NumberField path={[...p, 'material', 'thermalConductivity_WmK']} label="Thermal conductivity k" unit="W/(m·K)" />
          <NumberField path={[...p, 'material', 'density_kgm3']} label="Density ρ" kind="density" />
          <NumberField path={[...p, 'material', 'specificHeat_JkgK']} label="Specific heat c" unit="J/(kg·K)" />
          <NumberField path={[...p, 'material', 'structuralFactorXW']} label="Structural factor XW" />
          <NumberField path={[...p, 'material', 'micropittingFactorWW']} label="Micropitting material factor WW" optional hint="Empty: 1, case-carburized steel; through-hardened 0.5, nitrided 1.5 (ISO/TS 6336-22, recalled)" />
        </div>
      ) : null}
    </fieldset>
  );
}

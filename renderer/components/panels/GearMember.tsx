import { MATERIAL_PRESETS } from '../../../app/engine/materials';
import { MATERIAL_WORDS } from '../../../app/review/inputLabels';
import { useSheet } from '../../state/context';
import { getIn } from '../../state/paths';
import { NumberField } from '../fields/NumberField';
import { inputProps } from '../fields/inputProps';
import { SelectField } from '../fields/SelectField';


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
      <NumberField path={[...p, 'teeth']} {...inputProps(`gearPair.${member}.teeth`)} />
      <NumberField path={[...p, 'profileShift']} {...inputProps(`gearPair.${member}.profileShift`)} optional />
      <NumberField path={[...p, 'tipDiameter_mm']} {...inputProps(`gearPair.${member}.tipDiameter_mm`)} optional />
      <NumberField path={[...p, 'roughnessRa_um']} {...inputProps(`gearPair.${member}.roughnessRa_um`)} />
      <SelectField
        path={[...p, 'material']}
        {...inputProps(`gearPair.${member}.material`)}
        value={custom ? 'custom' : (material as string)}
        options={[...MATERIAL_PRESETS.map((m) => [m, MATERIAL_WORDS[m]] as const), ['custom', 'Custom material'] as const]}
        onValue={(v) => dispatch({ type: 'set', path: [...p, 'material'], value: v === 'custom' ? CUSTOM_START : v })}
      />
      {custom ? (
        <div className="custom-material">
          <NumberField path={[...p, 'material', 'youngsModulus_GPa']} {...inputProps(`gearPair.${member}.material.youngsModulus_GPa`)} />
          <NumberField path={[...p, 'material', 'poissonRatio']} {...inputProps(`gearPair.${member}.material.poissonRatio`)} />
          <NumberField path={[...p, 'material', 'thermalConductivity_WmK']} {...inputProps(`gearPair.${member}.material.thermalConductivity_WmK`)} />
          <NumberField path={[...p, 'material', 'density_kgm3']} {...inputProps('gearPair.${member}.material.density_kgm3')} />
          <NumberField path={[...p, 'material', 'specificHeat_JkgK']} {...inputProps(`gearPair.${member}.material.specificHeat_JkgK`)} />
          <NumberField path={[...p, 'material', 'structuralFactorXW']} {...inputProps(`gearPair.${member}.material.structuralFactorXW`)} />
        </div>
      ) : null}
    </fieldset>
  );
}

import { MATERIAL_PRESETS } from '../../../app/engine/materials';
import { MATERIAL_WORDS } from '../../../app/review/inputLabels';
import { inputProps } from '../fields/inputProps';
import { useDraftValue, useSheet } from '../../state/context';
import { NumberField } from '../fields/NumberField';
import { SelectField } from '../fields/SelectField';


/** Steel thermal data as a starting point for a custom material (materials.ts). */
const CUSTOM_START = { youngsModulus_GPa: 206, poissonRatio: 0.3, thermalConductivity_WmK: 50, density_kgm3: 7800, specificHeat_JkgK: 470, structuralFactorXW: 1 };

type Member = 'pinion' | 'wheel' | 'sun' | 'planet' | 'ring';

interface Props {
  readonly member: Member;
  readonly title: string;
  /** Where the gear set lives: a pair or a planetary stage. */
  readonly root?: 'gearPair' | 'planetary';
  /** The gear has internal teeth (a ring): its tip diameter is its inner diameter. */
  readonly internal?: boolean;
}

/** One gear of the set: teeth, shift, tip, roughness, material. */
export function GearMember({ member, title, root = 'gearPair', internal = false }: Props) {
  const { dispatch } = useSheet();
  const p = [root, member] as const;
  const material = useDraftValue([...p, 'material']);
  const custom = typeof material === 'object' && material !== null;
  return (
    <fieldset className="member">
      <legend>{title}</legend>
      <NumberField path={[...p, 'teeth']} {...inputProps(`${root}.${member}.teeth`)} />
      <NumberField
        path={[...p, 'profileShift']}
        {...inputProps(`${root}.${member}.profileShift`)}
        optional
        hint={internal ? 'ISO 21771 sign: x > 0 thickens the teeth and moves them towards the axis; the inner diameter shrinks' : 'ISO 21771 sign: x > 0 thickens the teeth and moves them away from the axis'}
      />
      <NumberField path={[...p, 'tipDiameter_mm']} {...inputProps(`${root}.${member}.tipDiameter_mm`)} {...(internal ? { label: 'Inner (tip) diameter da' } : {})} optional />
      <NumberField path={[...p, 'roughnessRa_um']} {...inputProps(`${root}.${member}.roughnessRa_um`)} />
      <SelectField
        path={[...p, 'material']}
        {...inputProps(`${root}.${member}.material`)}
        value={custom ? 'custom' : (material as string)}
        options={[...MATERIAL_PRESETS.map((m) => [m, MATERIAL_WORDS[m]] as const), ['custom', 'Custom material'] as const]}
        onValue={(v) => dispatch({ type: 'set', path: [...p, 'material'], value: v === 'custom' ? CUSTOM_START : v })}
      />
      {custom ? (
        <div className="custom-material">
          <NumberField path={[...p, 'material', 'youngsModulus_GPa']} {...inputProps(`${root}.${member}.material.youngsModulus_GPa`)} />
          <NumberField path={[...p, 'material', 'poissonRatio']} {...inputProps(`${root}.${member}.material.poissonRatio`)} />
          <NumberField path={[...p, 'material', 'thermalConductivity_WmK']} {...inputProps(`${root}.${member}.material.thermalConductivity_WmK`)} />
          <NumberField path={[...p, 'material', 'density_kgm3']} {...inputProps(`${root}.${member}.material.density_kgm3`)} />
          <NumberField path={[...p, 'material', 'specificHeat_JkgK']} {...inputProps(`${root}.${member}.material.specificHeat_JkgK`)} />
          <NumberField path={[...p, 'material', 'structuralFactorXW']} {...inputProps(`${root}.${member}.material.structuralFactorXW`)} />
          <NumberField path={[...p, 'material', 'micropittingFactorWW']} {...inputProps(`${root}.${member}.material.micropittingFactorWW`)} optional hint="Empty: 1, case-carburized steel; through-hardened 0.5, nitrided 1.5 (ISO/TS 6336-22, recalled)" />
        </div>
      ) : null}
    </fieldset>
  );
}

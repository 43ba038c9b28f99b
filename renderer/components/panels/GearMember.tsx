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

type Member = 'pinion' | 'wheel' | 'sun' | 'planet' | 'ring';
const SUBSCRIPT: Readonly<Record<Member, string>> = { pinion: '1', wheel: '2', sun: 'S', planet: 'P', ring: 'R' };

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
  const { draft, dispatch } = useSheet();
  const p = [root, member] as const;
  const i = SUBSCRIPT[member];
  const material = getIn(draft, [...p, 'material']);
  const custom = typeof material === 'object' && material !== null;
  return (
    <fieldset className="member">
      <legend>{title}</legend>
      <NumberField path={[...p, 'teeth']} label={`Teeth z${i}`} />
      <NumberField
        path={[...p, 'profileShift']}
        label={`Profile shift x${i}`}
        optional
        hint={internal ? 'ISO 21771 sign: x > 0 thickens the teeth and moves them towards the axis; the inner diameter shrinks' : 'ISO 21771 sign: x > 0 thickens the teeth and moves them away from the axis'}
      />
      <NumberField path={[...p, 'tipDiameter_mm']} label={internal ? 'Inner (tip) diameter da' : 'Tip diameter da'} kind="length" optional />
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
        </div>
      ) : null}
    </fieldset>
  );
}

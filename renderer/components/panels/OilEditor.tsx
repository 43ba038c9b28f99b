import { BASE_OILS, CHEMISTRIES } from '../../../app/engine/oil/types';
import type { OilSummary } from '../../../app/review/results';
import { FZG_STAGES, type FzgStage } from '../../../app/review/schema';
import { useSheet } from '../../state/context';
import { getIn } from '../../state/paths';
import { NumberField } from '../fields/NumberField';
import { SelectField } from '../fields/SelectField';
import { TextField } from '../fields/TextField';
import { Quantity } from '../Quantity';
import { viscosityIndex } from '../../../app/engine/oil/viscosityIndex';
import { centistokes } from '../../../app/engine/units';

/** VI by ASTM D2270 from the draft's KV40 and KV100 as they stand now; null while either is missing or outside the standard. */
function d2270Of(kv40: unknown, kv100: unknown): number | null {
  if (typeof kv40 !== 'number' || typeof kv100 !== 'number' || kv100 >= kv40) return null;
  try {
    return viscosityIndex(centistokes(kv40), centistokes(kv100)).value;
  } catch {
    return null;
  }
}

const BASE_WORDS: Readonly<Record<(typeof BASE_OILS)[number], string>> = {
  mineral: 'Mineral',
  pao: 'PAO',
  'pag-insoluble': 'PAG, water-insoluble',
  'pag-soluble': 'PAG, water-soluble',
  ester: 'Ester',
  'phosphate-ester': 'Phosphate ester',
  traction: 'Traction fluid',
};
const CHEMISTRY_WORDS: Readonly<Record<(typeof CHEMISTRIES)[number], string>> = {
  // The trade's classes: R&O gear oil DIN 51517-2 CL, EP gear oil DIN 51517-3 CLP; anti-wear oils are mostly the hydraulic class DIN 51524-2 HLP.
  'r-and-o': 'R&O, rust and oxidation (DIN 51517-2 CL)',
  'anti-wear': 'AW, anti-wear (as DIN 51524-2 HLP)',
  'extreme-pressure': 'EP, extreme pressure (DIN 51517-3 CLP)',
};
const STAGES: readonly (readonly [FzgStage, string])[] = [...FZG_STAGES.map((s) => [s, String(s)] as const), ['>12', 'above 12'] as const];

/** One candidate oil. */
export function OilEditor({ index, summary }: { readonly index: number; readonly summary: OilSummary | null }) {
  const { draft, dispatch, units } = useSheet();
  const p = ['oils', index] as const;
  const name = getIn(draft, [...p, 'name']);
  const legend = typeof name === 'string' && name ? name : `Oil ${index + 1}`;
  const computedVi = d2270Of(getIn(draft, [...p, 'kv40_mm2s']), getIn(draft, [...p, 'kv100_mm2s']));
  const enteredVi = getIn(draft, [...p, 'viscosityIndex']);
  const viNote =
    typeof enteredVi === 'number'
      ? computedVi !== null && computedVi !== enteredVi
        ? `entered; ASTM D2270 gives ${computedVi} from KV40 and KV100`
        : 'entered'
      : computedVi !== null
        ? 'computed by ASTM D2270 from KV40 and KV100'
        : 'computed by ASTM D2270 once KV40 and KV100 are entered';
  return (
    <fieldset className="item" data-testid={`oil-${index}`}>
      <legend>{legend}</legend>
      <div className="grid-fields">
        <TextField path={[...p, 'name']} label="Name" wide />
        <SelectField
          path={[...p, 'role']}
          label="Role"
          options={[
            ['in-service', 'In service'],
            ['proposed', 'Proposed'],
            ['candidate', 'Candidate'],
          ]}
        />
        <NumberField path={[...p, 'kv40_mm2s']} label={units === 'us' ? 'Viscosity at 40 °C (104 °F)' : 'Viscosity at 40 °C'} kind="kinematicViscosity" />
        <NumberField path={[...p, 'kv100_mm2s']} label={units === 'us' ? 'Viscosity at 100 °C (212 °F)' : 'Viscosity at 100 °C'} kind="kinematicViscosity" />
        <NumberField
          path={[...p, 'viscosityIndex']}
          label="Viscosity index VI"
          optional
          derived
          value={computedVi ?? undefined}
          note={viNote}
          hint="Computed by ASTM D2270 from KV40 and KV100 unless you type one; a typed VI is kept, any other is recomputed when a viscosity changes"
        />
        <NumberField path={[...p, 'density15_kgm3']} label={units === 'us' ? 'Density at 15 °C (59 °F)' : 'Density at 15 °C'} kind="density" />
        <SelectField path={[...p, 'baseOil']} label="Base oil" options={BASE_OILS.map((b) => [b, BASE_WORDS[b]] as const)} />
        <SelectField path={[...p, 'chemistry']} label="Additive chemistry" options={CHEMISTRIES.map((c) => [c, CHEMISTRY_WORDS[c]] as const)} />
        <SelectField path={[...p, 'fzgFailureStage']} label="FZG A/8.3/90 failure stage" options={STAGES} />
        <NumberField path={[...p, 'pressureViscosity_1perGPa']} label="Pressure–viscosity α" unit="1/GPa" optional hint="Empty: estimated from the base oil" />
      </div>
      {summary ? (
        <p className="derived-line">
          <Quantity def="viscosityIndex" value={summary.viscosityIndex} units={units} sig={4} withSymbol /> ({summary.viscosityIndexSource}) ·{' '}
          <Quantity def="isoVG" value={summary.isoVG === null ? 'outside ISO 3448' : `VG ${summary.isoVG}`} units={units} withSymbol /> ·{' '}
          <Quantity def="lubricantFactor" value={summary.lubricantFactorXL} units={units} sig={3} withSymbol />
        </p>
      ) : null}
      <button type="button" className="link-button" onClick={() => dispatch({ type: 'removeItem', list: 'oils', index })}>
        Remove “{legend}”
      </button>
    </fieldset>
  );
}

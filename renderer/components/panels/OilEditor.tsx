import { memo } from 'react';
import { BASE_OILS, CHEMISTRIES } from '../../../app/engine/oil/types';
import type { OilSummary } from '../../../app/review/results';
import { FZG_STAGES, type FzgStage } from '../../../app/review/schema';
import { useDraftValue, useSheet } from '../../state/context';
import { NumberField } from '../fields/NumberField';
import { inputProps } from '../fields/inputProps';
import { BASE_OIL_WORDS, CHEMISTRY_WORDS, INPUT_LABELS, OIL_ROLE_WORDS } from '../../../app/review/inputLabels';
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

const STAGES: readonly (readonly [FzgStage, string])[] = [...FZG_STAGES.map((s) => [s, String(s)] as const), ['>12', INPUT_LABELS['oils[].fzgFailureStage']?.words?.['>12'] ?? '>12'] as const];
/** FVA 54 micropitting stages on the C-GF gear, and "not given" (the field left out). */
const MICROPITTING_STAGES: readonly (readonly [number | string, string])[] = [['', 'not given'], ...[5, 6, 7, 8, 9, 10].map((s) => [s, String(s)] as const), ['>10', 'above 10']];

/** One candidate oil. */
function OilEditorView({ index, summary }: { readonly index: number; readonly summary: OilSummary | null }) {
  const { dispatch, units } = useSheet();
  const p = ['oils', index] as const;
  const name = useDraftValue([...p, 'name']);
  const legend = typeof name === 'string' && name ? name : `Oil ${index + 1}`;
  const computedVi = d2270Of(useDraftValue([...p, 'kv40_mm2s']), useDraftValue([...p, 'kv100_mm2s']));
  const enteredVi = useDraftValue([...p, 'viscosityIndex']);
  const micropittingStage = useDraftValue([...p, 'micropittingFailureStage']) as number | string | undefined;
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
        <TextField path={[...p, 'name']} {...inputProps('oils[].name')} wide />
        <SelectField
          path={[...p, 'role']}
          {...inputProps('oils[].role')}
          options={[
            ['in-service', OIL_ROLE_WORDS['in-service']],
            ['proposed', OIL_ROLE_WORDS.proposed],
            ['candidate', OIL_ROLE_WORDS.candidate],
          ]}
        />
        <NumberField path={[...p, 'kv40_mm2s']} {...inputProps('oils[].kv40_mm2s', units)} />
        <NumberField path={[...p, 'kv100_mm2s']} {...inputProps('oils[].kv100_mm2s', units)} />
        <NumberField
          path={[...p, 'viscosityIndex']}
          {...inputProps('oils[].viscosityIndex')}
          optional
          derived
          value={computedVi ?? undefined}
          note={viNote}
          hint="Computed by ASTM D2270 from KV40 and KV100 unless you type one; a typed VI is kept, any other is recomputed when a viscosity changes"
        />
        <NumberField path={[...p, 'density15_kgm3']} {...inputProps('oils[].density15_kgm3', units)} />
        <SelectField path={[...p, 'baseOil']} {...inputProps('oils[].baseOil')} options={BASE_OILS.map((b) => [b, BASE_OIL_WORDS[b]] as const)} />
        <SelectField path={[...p, 'chemistry']} {...inputProps('oils[].chemistry')} options={CHEMISTRIES.map((c) => [c, CHEMISTRY_WORDS[c]] as const)} />
        <SelectField path={[...p, 'fzgFailureStage']} {...inputProps('oils[].fzgFailureStage')} options={STAGES} />
        <SelectField
          path={[...p, 'micropittingFailureStage']}
          {...inputProps('oils[].micropittingFailureStage')}
          hint="Data sheets' micropitting classes: low ≤ 7, medium 8–9, high ≥ 10 (common practice)"
          options={MICROPITTING_STAGES}
          value={micropittingStage ?? ''}
          onValue={(v) => dispatch({ type: 'set', path: [...p, 'micropittingFailureStage'], value: v === '' ? undefined : v })}
        />
        <NumberField path={[...p, 'pressureViscosity_1perGPa']} {...inputProps('oils[].pressureViscosity_1perGPa')} optional hint="Empty: estimated from the base oil" />
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

/** The figures shown from a summary: another results object with the same ones re-renders nothing. */
const sameSummary = (a: OilSummary | null, b: OilSummary | null) =>
  a === b || (a !== null && b !== null && a.viscosityIndex === b.viscosityIndex && a.viscosityIndexSource === b.viscosityIndexSource && a.isoVG === b.isoVG && a.lubricantFactorXL === b.lubricantFactorXL);

/** Re-renders with its name, viscosities and VI, the units, and when its oil's shown figures change; not on other edits or every new results object. */
export const OilEditor = memo(OilEditorView, (a, b) => a.index === b.index && sameSummary(a.summary, b.summary));

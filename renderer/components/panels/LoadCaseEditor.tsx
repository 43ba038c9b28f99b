import { memo } from 'react';
import { useDraftSelect, useDraftValue, useSheet } from '../../state/context';
import { draftPower, draftTorque } from '../../state/reviewState';
import { NumberField } from '../fields/NumberField';
import { inputProps } from '../fields/inputProps';
import { caseKeys } from '../../state/gearSet';
import { LUBRICATION_WORDS } from '../../../app/review/inputLabels';
import { SelectField } from '../fields/SelectField';
import { TextField } from '../fields/TextField';

/**
 * One load case. Torque and power are both shown; the one typed last is the one the file keeps
 * (the schema wants exactly one), the other follows from it.
 */
function LoadCaseEditorView({ index, canRemove, shareNote }: { readonly index: number; readonly canRemove: boolean; readonly shareNote?: string | undefined }) {
  const { dispatch } = useSheet();
  const p = ['loadCases', index] as const;
  const name = useDraftValue([...p, 'name']);
  const k = { speed: useDraftSelect((d) => caseKeys(d).speed), torque: useDraftSelect((d) => caseKeys(d).torque) };
  const givesTorque = useDraftValue([...p, k.torque]) !== undefined;
  const givesPower = useDraftValue([...p, 'power_kW']) !== undefined;
  const noLoad = !givesTorque && !givesPower;
  // Torque and power follow each other: numbers, so they re-render this case only when they move.
  const torque = useDraftSelect((d) => (d ? draftTorque(d, index) : undefined));
  const power = useDraftSelect((d) => (d ? draftPower(d, index) : undefined));
  const legend = typeof name === 'string' && name ? name : `Load case ${index + 1}`;
  return (
    <fieldset className="item" data-testid={`load-case-${index}`}>
      <legend>{legend}</legend>
      <div className="grid-fields">
        <TextField path={[...p, 'name']} {...inputProps('loadCases[].name')} wide />
        <NumberField path={[...p, k.speed]} {...inputProps(`loadCases[].${k.speed}`)} />
        <NumberField
          path={[...p, k.torque]}
          {...inputProps(`loadCases[].${k.torque}`)}
          note={noLoad ? 'enter the torque or the power' : givesTorque ? undefined : 'from the power'}
          value={torque}
          derived={!givesTorque}
          onValue={(value) => dispatch({ type: 'setDrive', index, given: 'torque', value })}
        />
        <NumberField
          path={[...p, 'power_kW']}
          {...inputProps('loadCases[].power_kW')}
          note={givesTorque ? 'from the torque' : undefined}
          value={power}
          derived={givesTorque}
          onValue={(value) => dispatch({ type: 'setDrive', index, given: 'power', value })}
        />
        <NumberField path={[...p, 'applicationFactor']} {...inputProps('loadCases[].applicationFactor')} />
        <NumberField path={[...p, 'oilTemperature_C']} {...inputProps('loadCases[].oilTemperature_C')} />
        <SelectField
          path={[...p, 'lubrication']}
          {...inputProps('loadCases[].lubrication')}
          options={[
            ['dip', LUBRICATION_WORDS.dip],
            ['spray', LUBRICATION_WORDS.spray],
          ]}
        />
        <NumberField path={[...p, 'timeShare']} {...inputProps('loadCases[].timeShare')} hint="Fraction of the time, 0 to 1" note={shareNote} />
      </div>
      {canRemove ? (
        <button type="button" className="link-button" onClick={() => dispatch({ type: 'removeItem', list: 'loadCases', index })}>
          Remove “{legend}”
        </button>
      ) : null}
    </fieldset>
  );
}

/** Re-renders with its own name, drive and keys (and its props), not on edits of other cases or when results arrive. */
export const LoadCaseEditor = memo(LoadCaseEditorView);

import { useSheet } from '../../state/context';
import { getIn } from '../../state/paths';
import { draftPower, draftTorque } from '../../state/reviewState';
import { NumberField } from '../fields/NumberField';
import { SelectField } from '../fields/SelectField';
import { TextField } from '../fields/TextField';

/**
 * One load case. Torque and power are both shown; the one typed last is the one the file keeps
 * (the schema wants exactly one), the other follows from it.
 */
export function LoadCaseEditor({ index, canRemove, shareNote }: { readonly index: number; readonly canRemove: boolean; readonly shareNote?: string | undefined }) {
  const { draft, dispatch } = useSheet();
  const p = ['loadCases', index] as const;
  const name = getIn(draft, [...p, 'name']);
  const givesTorque = getIn(draft, [...p, 'pinionTorque_Nm']) !== undefined;
  const noLoad = !givesTorque && getIn(draft, [...p, 'power_kW']) === undefined;
  const legend = typeof name === 'string' && name ? name : `Load case ${index + 1}`;
  return (
    <fieldset className="item" data-testid={`load-case-${index}`}>
      <legend>{legend}</legend>
      <div className="grid-fields">
        <TextField path={[...p, 'name']} label="Name" wide />
        <NumberField path={[...p, 'pinionSpeed_rpm']} label="Pinion speed n1" unit="rpm" />
        <NumberField
          path={[...p, 'pinionTorque_Nm']}
          label="Pinion torque T1"
          note={noLoad ? 'enter the torque or the power' : givesTorque ? undefined : 'from the power'}
          kind="torque"
          value={draftTorque(draft, index)}
          derived={!givesTorque}
          onValue={(value) => dispatch({ type: 'setDrive', index, given: 'torque', value })}
        />
        <NumberField
          path={[...p, 'power_kW']}
          label="Power P"
          note={givesTorque ? 'from the torque' : undefined}
          kind="power"
          value={draftPower(draft, index)}
          derived={givesTorque}
          onValue={(value) => dispatch({ type: 'setDrive', index, given: 'power', value })}
        />
        <NumberField path={[...p, 'applicationFactor']} label="Application factor KA" />
        <NumberField path={[...p, 'oilTemperature_C']} label="Oil temperature θoil" kind="temperature" />
        <SelectField
          path={[...p, 'lubrication']}
          label="Lubrication"
          options={[
            ['dip', 'Dip (splash)'],
            ['spray', 'Spray (injection)'],
          ]}
        />
        <NumberField path={[...p, 'timeShare']} label="Share of operating time" hint="Fraction of the time, 0 to 1" note={shareNote} />
      </div>
      {canRemove ? (
        <button type="button" className="link-button" onClick={() => dispatch({ type: 'removeItem', list: 'loadCases', index })}>
          Remove “{legend}”
        </button>
      ) : null}
    </fieldset>
  );
}

import type { GearResult } from '../../../app/review/results';
import { COMPONENTS } from '../../../app/review/schema';
import { COMPONENT_WORDS, fieldLabel } from '../../../app/review/inputLabels';
import { useSheet } from '../../state/context';
import { getIn } from '../../state/paths';
import { CheckField } from '../fields/CheckField';
import { NumberField } from '../fields/NumberField';
import { inputProps } from '../fields/inputProps';
import { TextField } from '../fields/TextField';
import { QuantityRow } from '../Quantity';
import { GearMember } from './GearMember';
import { Panel } from './Panel';

/** Geometry and materials of pinion and wheel, with the derived geometry beside them. */
export function GearPairPanel({ gear, stale }: { readonly gear: GearResult | null; readonly stale: boolean }) {
  const { draft, dispatch, units } = useSheet();
  const components = (getIn(draft, ['gearPair', 'components']) as string[] | undefined) ?? [];
  const gp = ['gearPair'] as const;
  return (
    <Panel id="gear-pair" title="Gear pair">
      <TextField path={['title']} {...inputProps('title')} wide />
      <div className="grid-fields">
        <NumberField path={[...gp, 'normalModule_mm']} {...inputProps('gearPair.normalModule_mm')} />
        <NumberField path={[...gp, 'normalPressureAngle_deg']} {...inputProps('gearPair.normalPressureAngle_deg')} />
        <NumberField path={[...gp, 'helixAngle_deg']} {...inputProps('gearPair.helixAngle_deg')} />
        <NumberField path={[...gp, 'faceWidth_mm']} {...inputProps('gearPair.faceWidth_mm')} />
        <NumberField path={[...gp, 'centerDistance_mm']} {...inputProps('gearPair.centerDistance_mm')} optional hint="Leave empty to take it from the profile shifts" />
        <NumberField path={[...gp, 'pinionMeshes']} {...inputProps('gearPair.pinionMeshes')} />
      </div>
      <div className="members">
        <GearMember member="pinion" title="Pinion" />
        <GearMember member="wheel" title="Wheel" />
      </div>
      <fieldset className="subgroup">
        <legend>ISO 6336-2 factors (inputs)</legend>
        <div className="grid-fields">
          <NumberField path={[...gp, 'dynamicFactorKv']} {...inputProps('gearPair.dynamicFactorKv')} />
          <NumberField path={[...gp, 'faceLoadFactorKHbeta']} {...inputProps('gearPair.faceLoadFactorKHbeta')} />
          <NumberField path={[...gp, 'transverseLoadFactorKHalpha']} {...inputProps('gearPair.transverseLoadFactorKHalpha')} />
        </div>
      </fieldset>
      <fieldset className="subgroup">
        <legend>{fieldLabel(['gearPair', 'components'])}</legend>
        <div className="checks">
          {COMPONENTS.map((c) => (
            <CheckField key={c} path={[...gp, 'components', c]} label={COMPONENT_WORDS[c]} checked={components.includes(c)} onChange={(on) => dispatch({ type: 'toggleComponent', component: c, on })} />
          ))}
        </div>
      </fieldset>
      {gear ? (
        <div className="derived" aria-label="Derived geometry">
          <h3>Derived geometry{stale ? <span className="note"> — of the last valid entry</span> : null}</h3>
          <dl className="qlist">
            <QuantityRow def="centerDistance" value={gear.centerDistance_mm} units={units} sig={5} />
            <QuantityRow def="gearRatio" value={gear.gearRatio} units={units} sig={4} />
            <QuantityRow def="workingPressureAngle" value={gear.workingPressureAngle_deg} units={units} sig={4} />
            <QuantityRow def="transverseContactRatio" value={gear.transverseContactRatio} units={units} sig={3} />
            <QuantityRow def="overlapRatio" value={gear.overlapRatio} units={units} sig={3} />
            <QuantityRow def="totalContactRatio" value={gear.totalContactRatio} units={units} sig={3} />
            <QuantityRow def="lineOfAction" value={gear.lineOfAction_mm} units={units} sig={4} />
          </dl>
          {gear.checks.length ? (
            <ul className="checks-list">
              {gear.checks.map((c) => (
                <li key={c.code} className={`note note--${c.severity}`}>
                  {c.message}
                </li>
              ))}
            </ul>
          ) : null}
        </div>
      ) : null}
    </Panel>
  );
}

import { memo } from 'react';
import { FILM_FORMULAS } from '../../../app/review/schema';
import { useDraftValue, useSheet } from '../../state/context';
import { CheckField } from '../fields/CheckField';
import { NumberField } from '../fields/NumberField';
import { inputProps } from '../fields/inputProps';
import { FILM_FORMULA_WORDS, SCUFFING_METHOD_CHOICES, fieldLabel } from '../../../app/review/inputLabels';
import { SCUFFING_METHODS } from '../../../app/engine/mesh/types';
import { SelectField } from '../fields/SelectField';
import { Panel } from './Panel';

const STAGES = Array.from({ length: 12 }, (_, i) => [i + 1, String(i + 1)] as const);

/** The review's thresholds and method choices. */
function PolicyPanelView() {
  const { dispatch } = useSheet();
  const p = ['policy'] as const;
  const thermal = useDraftValue([...p, 'thermalFilmCorrection']);
  return (
    <Panel id="policy" title="Policy">
      <div className="grid-fields">
        <NumberField path={[...p, 'lambdaTarget']} {...inputProps('policy.lambdaTarget')} />
        <NumberField path={[...p, 'scuffingSafetyMin']} {...inputProps('policy.scuffingSafetyMin')} />
        <NumberField path={[...p, 'integralSafetyMin']} {...inputProps('policy.integralSafetyMin')} />
        <SelectField path={[...p, 'scuffingMethods']} {...inputProps('policy.scuffingMethods')} hint="With both, the more demanding method governs" options={SCUFFING_METHODS.map((m) => [m, SCUFFING_METHOD_CHOICES[m]] as const)} />
        <SelectField path={[...p, 'antiWearOilFzgStage']} {...inputProps('policy.antiWearOilFzgStage')} hint="FZG A/8.3/90 failure stage assumed for anti-wear oils; the hydraulic-oil class DIN 51524-2 (HLP) asks for 10" options={STAGES} />
        <SelectField path={[...p, 'epOilFzgStage']} {...inputProps('policy.epOilFzgStage')} hint="FZG A/8.3/90 failure stage assumed for EP oils; the EP gear-oil class DIN 51517-3 (CLP) asks for 12" options={STAGES} />
        <NumberField path={[...p, 'temperatureRange_C', 0]} {...inputProps('policy.temperatureRange_C[0]')} />
        <NumberField path={[...p, 'temperatureRange_C', 1]} {...inputProps('policy.temperatureRange_C[1]')} />
        <NumberField path={[...p, 'shockApplicationFactor']} {...inputProps('policy.shockApplicationFactor')} />
        <NumberField path={[...p, 'micropittingSafetyMin']} {...inputProps('policy.micropittingSafetyMin')} hint="ISO/TS 6336-22; default 1 (recalled, weak)" />
      </div>
      <fieldset className="subgroup">
        <legend>Film and friction</legend>
        <div className="grid-fields">
          <SelectField path={[...p, 'filmFormula']} {...inputProps('policy.filmFormula')} options={FILM_FORMULAS.map((f) => [f, FILM_FORMULA_WORDS[f]] as const)} />
          <NumberField path={[...p, 'boundaryBelowLambda']} {...inputProps('policy.boundaryBelowLambda')} />
          <NumberField path={[...p, 'fullFilmFromLambda']} {...inputProps('policy.fullFilmFromLambda')} />
          <NumberField path={[...p, 'frictionCoefficient']} {...inputProps('policy.frictionCoefficient')} optional hint="Empty: the ISO/TS 6336-20 estimate" />
          <NumberField path={[...p, 'scuffingTemperatureSpread']} {...inputProps('policy.scuffingTemperatureSpread')} />
          <NumberField path={[...p, 'pathPoints']} {...inputProps('policy.pathPoints')} />
        </div>
        <CheckField path={[...p, 'thermalFilmCorrection']} label={fieldLabel([...p, 'thermalFilmCorrection'])} checked={thermal !== false} onChange={(on) => dispatch({ type: 'set', path: [...p, 'thermalFilmCorrection'], value: on })} />
      </fieldset>
    </Panel>
  );
}

/** Inputs only: re-renders with the units (the sheet's context) or its check box, not on other edits or when results arrive. */
export const PolicyPanel = memo(PolicyPanelView);

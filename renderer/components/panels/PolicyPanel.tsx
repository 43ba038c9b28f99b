import { FILM_FORMULAS } from '../../../app/review/schema';
import { useSheet } from '../../state/context';
import { getIn } from '../../state/paths';
import { CheckField } from '../fields/CheckField';
import { NumberField } from '../fields/NumberField';
import { SelectField } from '../fields/SelectField';
import { Panel } from './Panel';

const FORMULA_WORDS: Readonly<Record<(typeof FILM_FORMULAS)[number], string>> = {
  'dowson-higginson': 'Dowson–Higginson (line contact)',
  'pan-hamrock': 'Pan–Hamrock (1989)',
};
const METHOD_OPTIONS = [
  ['both', 'Both (flash and integral)'],
  ['flash', 'Flash temperature (ISO/TS 6336-20)'],
  ['integral', 'Integral temperature (ISO/TS 6336-21)'],
] as const;
const STAGES = Array.from({ length: 12 }, (_, i) => [i + 1, String(i + 1)] as const);

/** The review's thresholds and method choices. */
export function PolicyPanel() {
  const { draft, dispatch } = useSheet();
  const p = ['policy'] as const;
  const thermal = getIn(draft, [...p, 'thermalFilmCorrection']);
  return (
    <Panel id="policy" title="Policy">
      <div className="grid-fields">
        <NumberField path={[...p, 'lambdaTarget']} label="λ target" />
        <NumberField path={[...p, 'scuffingSafetyMin']} label="SB,min (flash)" />
        <NumberField path={[...p, 'integralSafetyMin']} label="SintS,min (integral)" />
        <SelectField path={[...p, 'scuffingMethods']} label="Scuffing methods" hint="With both, the more demanding method governs" options={METHOD_OPTIONS} />
        <SelectField path={[...p, 'antiWearOilFzgStage']} label="FZG floor, AW oils" hint="FZG A/8.3/90 failure stage assumed for anti-wear oils; the hydraulic-oil class DIN 51524-2 (HLP) asks for 10" options={STAGES} />
        <SelectField path={[...p, 'epOilFzgStage']} label="FZG floor, EP oils" hint="FZG A/8.3/90 failure stage assumed for EP oils; the EP gear-oil class DIN 51517-3 (CLP) asks for 12" options={STAGES} />
        <NumberField path={[...p, 'temperatureRange_C', 0]} label="Temperature range, low" kind="temperature" />
        <NumberField path={[...p, 'temperatureRange_C', 1]} label="Temperature range, high" kind="temperature" />
        <NumberField path={[...p, 'shockApplicationFactor']} label="Shock duty from KA" />
        <NumberField path={[...p, 'micropittingSafetyMin']} label="Sλ,min (micropitting)" hint="ISO/TS 6336-22; default 1 (recalled, weak)" />
      </div>
      <fieldset className="subgroup">
        <legend>Film and friction</legend>
        <div className="grid-fields">
          <SelectField path={[...p, 'filmFormula']} label="Film formula" options={FILM_FORMULAS.map((f) => [f, FORMULA_WORDS[f]] as const)} />
          <NumberField path={[...p, 'boundaryBelowLambda']} label="Boundary below λ" />
          <NumberField path={[...p, 'fullFilmFromLambda']} label="Full film from λ" />
          <NumberField path={[...p, 'frictionCoefficient']} label="Friction coefficient μ" optional hint="Empty: the ISO/TS 6336-20 estimate" />
          <NumberField path={[...p, 'scuffingTemperatureSpread']} label="Spread of θS (σ/θS)" />
          <NumberField path={[...p, 'pathPoints']} label="Points along the path" />
        </div>
        <CheckField path={[...p, 'thermalFilmCorrection']} label="Inlet shear heating correction (Murch–Wilson)" checked={thermal !== false} onChange={(on) => dispatch({ type: 'set', path: [...p, 'thermalFilmCorrection'], value: on })} />
      </fieldset>
    </Panel>
  );
}

import { memo } from 'react';
import type { Results } from '../../../app/review/results';
import { COMPONENTS } from '../../../app/review/schema';
import { COMPONENT_WORDS, fieldLabel } from '../../../app/review/inputLabels';
import { inputProps } from '../fields/inputProps';
import { useDraftSelect, useDraftValue, useSheet } from '../../state/context';
import { gearSetKind, gearSetRoot, type GearSetKind } from '../../state/gearSet';
import { CheckField } from '../fields/CheckField';
import { NumberField } from '../fields/NumberField';
import { SelectField } from '../fields/SelectField';
import { DerivedGeometry } from './DerivedGeometry';
import { GearMember } from './GearMember';
import { Panel } from './Panel';
import { PlanetaryDerived, PlanetaryFields } from './PlanetaryFields';

const KINDS: readonly (readonly [GearSetKind, string])[] = [
  ['external', 'External pair'],
  ['internal', 'Internal pair (pinion in a ring)'],
  ['planetary', 'Planetary stage (sun, planets, ring)'],
];

const MM_PER_INCH = 25.4;

/** The gear set, its kind chosen first: a pair (external or internal) or a planetary stage, with the derived geometry. */
export function GearPairPanel({ results, stale }: { readonly results: Results | null; readonly stale: boolean }) {
  const { units } = useSheet();
  const gear = results?.gear ?? null;
  return (
    <Panel id="gear-pair" title="Gear set">
      <GearSetFields />
      {results?.planetary ? <PlanetaryDerived results={results} stale={stale} /> : null}
      {gear && !results?.planetary ? <DerivedGeometry gear={gear} title="Derived geometry" stale={stale} units={units} /> : null}
    </Panel>
  );
}

/** The gear set's inputs: memoised, so new results re-render only the derived geometry below them, and an edit only the inputs it changes. */
const GearSetFields = memo(function GearSetFields() {
  const { dispatch } = useSheet();
  const kind = useDraftSelect(gearSetKind);
  const root = useDraftSelect(gearSetRoot);
  const components = (useDraftValue([root, 'components']) as string[] | undefined) ?? [];
  const gp = [root] as const;
  return (
    <>
      <SelectField path={['gearSet']} label="Kind of gear set" options={KINDS} value={kind} onValue={(k) => dispatch({ type: 'setGearSet', kind: k })} />
      {kind === 'planetary' ? <PlanetaryFields /> : <PairFields internal={kind === 'internal'} />}
      <fieldset className="subgroup">
        <legend>ISO 6336-2 factors (inputs)</legend>
        <div className="grid-fields">
          <NumberField path={[...gp, 'dynamicFactorKv']} {...inputProps(`${root}.dynamicFactorKv`)} />
          <NumberField path={[...gp, 'faceLoadFactorKHbeta']} {...inputProps(`${root}.faceLoadFactorKHbeta`)} />
          <NumberField path={[...gp, 'transverseLoadFactorKHalpha']} {...inputProps(`${root}.transverseLoadFactorKHalpha`)} />
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
    </>
  );
});

/** The inputs of a pair, external or internal (the wheel a ring). */
function PairFields({ internal }: { readonly internal: boolean }) {
  const { dispatch, units } = useSheet();
  const gp = ['gearPair'] as const;
  const module = useDraftValue([...gp, 'normalModule_mm']);
  return (
    <>
      <div className="grid-fields">
        <NumberField path={[...gp, 'normalModule_mm']} {...inputProps('gearPair.normalModule_mm')} />
        {units === 'us' ? (
          // US gear practice gives the normal diametral pitch Pnd = 25.4 / mn (mn in mm, Pnd in 1/in); either sets the module.
          <NumberField
            path={[...gp, 'normalDiametralPitch']}
            label="Normal diametral pitch Pnd"
            unit="1/in"
            derived
            value={typeof module === 'number' && module > 0 ? MM_PER_INCH / module : undefined}
            onValue={(v) => dispatch({ type: 'set', path: [...gp, 'normalModule_mm'], value: typeof v === 'number' && v > 0 ? MM_PER_INCH / v : v })}
            note="Pnd = 25.4 / mn"
          />
        ) : null}
        <NumberField path={[...gp, 'normalPressureAngle_deg']} {...inputProps('gearPair.normalPressureAngle_deg')} />
        <NumberField path={[...gp, 'helixAngle_deg']} {...inputProps('gearPair.helixAngle_deg')} />
        <NumberField path={[...gp, 'faceWidth_mm']} {...inputProps('gearPair.faceWidth_mm')} />
        <NumberField path={[...gp, 'centerDistance_mm']} {...inputProps('gearPair.centerDistance_mm')} optional hint="Leave empty to take it from the profile shifts" />
        <NumberField path={[...gp, 'pinionMeshes']} {...inputProps('gearPair.pinionMeshes')} />
      </div>
      <div className="members">
        <GearMember member="pinion" title="Pinion" />
        <GearMember member="wheel" title={internal ? 'Ring (internal teeth)' : 'Wheel'} internal={internal} />
      </div>
    </>
  );
}

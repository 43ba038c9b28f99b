import type { GearResult } from '../../../app/review/results';
import { COMPONENTS } from '../../../app/review/schema';
import { useSheet } from '../../state/context';
import { getIn } from '../../state/paths';
import { CheckField } from '../fields/CheckField';
import { NumberField } from '../fields/NumberField';
import { QuantityRow } from '../Quantity';
import { GearMember } from './GearMember';
import { Panel } from './Panel';

const COMPONENT_WORDS: Readonly<Record<(typeof COMPONENTS)[number], string>> = {
  'bronze-bushing': 'Bronze bushings',
  'brass-cage': 'Brass bearing cages',
  'yellow-metal': 'Other yellow metals',
  backstop: 'Backstop',
  clutch: 'Clutch',
  'food-contact': 'Incidental food contact',
  'paint-or-seal-sensitive': 'Sensitive paint or seals',
};

const MM_PER_INCH = 25.4;

/** Geometry and materials of pinion and wheel, with the derived geometry beside them. */
export function GearPairPanel({ gear, stale }: { readonly gear: GearResult | null; readonly stale: boolean }) {
  const { draft, dispatch, units } = useSheet();
  const components = (getIn(draft, ['gearPair', 'components']) as string[] | undefined) ?? [];
  const gp = ['gearPair'] as const;
  const module = getIn(draft, [...gp, 'normalModule_mm']);
  return (
    <Panel id="gear-pair" title="Gear pair">
      <div className="grid-fields">
        <NumberField path={[...gp, 'normalModule_mm']} label="Normal module mn" kind="length" />
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
        <NumberField path={[...gp, 'normalPressureAngle_deg']} label="Pressure angle αn" unit="°" />
        <NumberField path={[...gp, 'helixAngle_deg']} label="Helix angle β" unit="°" />
        <NumberField path={[...gp, 'faceWidth_mm']} label="Face width b" kind="length" />
        <NumberField path={[...gp, 'centerDistance_mm']} label="Centre distance a" kind="length" optional hint="Leave empty to take it from the profile shifts" />
        <NumberField path={[...gp, 'pinionMeshes']} label="Meshes of the pinion np" />
      </div>
      <div className="members">
        <GearMember member="pinion" title="Pinion" />
        <GearMember member="wheel" title="Wheel" />
      </div>
      <fieldset className="subgroup">
        <legend>ISO 6336-2 factors (inputs)</legend>
        <div className="grid-fields">
          <NumberField path={[...gp, 'dynamicFactorKv']} label="Dynamic factor Kv" />
          <NumberField path={[...gp, 'faceLoadFactorKHbeta']} label="Face load factor KHβ" />
          <NumberField path={[...gp, 'transverseLoadFactorKHalpha']} label="Transverse load factor KHα" />
        </div>
      </fieldset>
      <fieldset className="subgroup">
        <legend>Parts in the oil circuit</legend>
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

import type { Results } from '../../../app/review/results';
import { MESH_LOAD_FACTOR_HELP } from '../../../app/review/schema';
import { HELD_WORDS, MESH_WORDS } from '../../../app/review/vocabulary';
import { useSheet } from '../../state/context';
import { NumberField } from '../fields/NumberField';
import { SelectField } from '../fields/SelectField';
import { QuantityRow } from '../Quantity';
import { DerivedGeometry, DesignCheckNotes } from './DerivedGeometry';
import { GearMember } from './GearMember';

const HELD = ['ring', 'carrier', 'sun'] as const;
const HELD_HINTS: Readonly<Record<(typeof HELD)[number], string>> = { ring: 'the sun drives the carrier', carrier: 'the sun drives the ring', sun: 'the carrier drives the ring' };

/** The inputs of a planetary stage: geometry, planets, Kγ, the member held, sun, planet and ring. */
export function PlanetaryFields() {
  const { dispatch } = useSheet();
  const p = ['planetary'] as const;
  return (
    <>
      <div className="grid-fields">
        <NumberField path={[...p, 'normalModule_mm']} label="Normal module mn" kind="length" />
        <NumberField path={[...p, 'normalPressureAngle_deg']} label="Pressure angle αn" unit="°" />
        <NumberField path={[...p, 'helixAngle_deg']} label="Helix angle β" unit="°" />
        <NumberField path={[...p, 'faceWidth_mm']} label="Face width b" kind="length" />
        <NumberField path={[...p, 'planets']} label="Planets" />
        <NumberField path={[...p, 'meshLoadFactorKgamma']} label="Mesh load factor Kγ" hint={MESH_LOAD_FACTOR_HELP} />
        <SelectField
          path={[...p, 'held']}
          label="Member held"
          options={HELD.map((h) => [h, `${HELD_WORDS[h].replace(/^./, (c) => c.toUpperCase())}: ${HELD_HINTS[h]}`] as const)}
          onValue={(held) => dispatch({ type: 'setHeld', held })}
        />
      </div>
      <div className="members">
        <GearMember root="planetary" member="sun" title="Sun" />
        <GearMember root="planetary" member="planet" title="Planet" />
        <GearMember root="planetary" member="ring" title="Ring (internal teeth)" internal />
      </div>
    </>
  );
}

/** The stage's derived figures and each mesh's geometry. */
export function PlanetaryDerived({ results, stale }: { readonly results: Results; readonly stale: boolean }) {
  const { units } = useSheet();
  const st = results.planetary;
  if (!st) return null;
  return (
    <>
      <div className="derived" aria-label="Derived stage">
        <h3>Stage{stale ? <span className="note"> — of the last valid entry</span> : null}</h3>
        <dl className="qlist">
          <QuantityRow def="stageRatio" value={st.ratio} units={units} sig={5} />
          <QuantityRow def="centerDistance" value={st.centerDistance_mm} units={units} sig={5} />
          <QuantityRow def="planetTipGap" value={st.planetTipGap_mm} units={units} sig={4} />
        </dl>
        <p className="note">
          {st.driving === 'sun' ? 'Sun' : 'Carrier'} drives the {st.driven}; governing mesh: {st.governingMesh.map((g) => MESH_WORDS[g.mesh]).filter((m, i, a) => a.indexOf(m) === i).join(', ') || '— (no oil)'}.
        </p>
        <DesignCheckNotes checks={st.checks} />
      </div>
      {(results.meshes ?? []).map((m) => (
        <DerivedGeometry key={m.mesh} gear={m.gear} title={`${MESH_WORDS[m.mesh].replace(/^./, (c) => c.toUpperCase())} mesh`} stale={stale} units={units} />
      ))}
    </>
  );
}

import type { GearResult } from '../../../app/review/results';
import type { UnitSystem } from '../../units/units';
import { QuantityRow } from '../Quantity';

/** The derived geometry of one pair (or one mesh of a stage), with its design checks. */
export function DerivedGeometry({ gear, title, stale, units }: { readonly gear: GearResult; readonly title: string; readonly stale: boolean; readonly units: UnitSystem }) {
  return (
    <div className="derived" aria-label={title}>
      <h3>
        {title}
        {stale ? <span className="note"> — of the last valid entry</span> : null}
      </h3>
      <dl className="qlist">
        <QuantityRow def="centerDistance" value={gear.centerDistance_mm} units={units} sig={5} />
        <QuantityRow def="gearRatio" value={gear.gearRatio} units={units} sig={4} />
        <QuantityRow def="workingPressureAngle" value={gear.workingPressureAngle_deg} units={units} sig={4} />
        <QuantityRow def="transverseContactRatio" value={gear.transverseContactRatio} units={units} sig={3} />
        <QuantityRow def="overlapRatio" value={gear.overlapRatio} units={units} sig={3} />
        <QuantityRow def="totalContactRatio" value={gear.totalContactRatio} units={units} sig={3} />
        <QuantityRow def="lineOfAction" value={gear.lineOfAction_mm} units={units} sig={4} />
      </dl>
      <DesignCheckNotes checks={gear.checks} />
    </div>
  );
}

/** The design checks of a gear set (warnings and notes), each in its own words. */
export function DesignCheckNotes({ checks }: { readonly checks: ReadonlyArray<{ code: string; severity: string; message: string }> }) {
  if (!checks.length) return null;
  return (
    <ul className="checks-list">
      {checks.map((c) => (
        <li key={c.code} className={`note note--${c.severity}`}>
          {c.message}
        </li>
      ))}
    </ul>
  );
}

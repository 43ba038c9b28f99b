import type { UnitSystem } from '../units/units';

/** SI / US customary: a radio group, so arrow keys move between the two. */
export function UnitSwitch({ units, onChange }: { readonly units: UnitSystem; readonly onChange: (u: UnitSystem) => void }) {
  return (
    <fieldset className="unit-switch">
      <legend className="sr-only">Display units</legend>
      {(
        [
          ['si', 'SI'],
          ['us', 'US customary'],
        ] as const
      ).map(([u, word]) => (
        <label key={u} className={units === u ? 'is-on' : undefined}>
          <input type="radio" name="units" value={u} checked={units === u} onChange={() => onChange(u)} data-testid={`units-${u}`} />
          {word}
        </label>
      ))}
    </fieldset>
  );
}

import type { Results } from '../../../app/review/results';
import { GradeChart } from './GradeChart';

/** The viscosity grade that would reach the λ target, per oil: λmin against ISO VG as a curve, with the grades the lubrication method cannot use left out and why. */
export function GradeFinder({ results, target }: { readonly results: Results; readonly target: number }) {
  if (!results.gradeFinder.length) return null;
  return (
    <div className="grade-finder" data-testid="grade-finder">
      <h3>Grade finder</h3>
      {results.gradeFinder.map((g) => (
        <div key={g.oil} className="grade-finder__oil">
          <p>
            <strong>{g.oil}</strong>: now {g.currentVG === null ? 'outside the ISO 3448 grades' : `ISO VG ${g.currentVG}`}; lowest grade reaching the λ target:{' '}
            <strong data-testid="recommended-vg">{g.recommendedVG === null ? 'none in range' : `ISO VG ${g.recommendedVG}`}</strong>.
          </p>
          <p className="note">{g.note}</p>
          {g.table.length ? <GradeChart g={g} target={target} /> : null}
          {g.leftOut ? <p className="note" data-testid="grades-left-out">{g.leftOut}</p> : null}
        </div>
      ))}
    </div>
  );
}

import type { Results } from '../../../app/review/results';
import { formatResult } from '../../units/format';

/** The viscosity grade that would reach the λ target, per oil, with the λmin of each grade tried. */
export function GradeFinder({ results }: { readonly results: Results }) {
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
          {g.table.length ? (
            <table className="grade-table">
              <caption className="sr-only">λmin by ISO viscosity grade for {g.oil}</caption>
              <thead>
                <tr>
                  <th scope="row">ISO VG</th>
                  {g.table.map((r) => (
                    <th key={r.isoVG} scope="col" className={r.isoVG === g.recommendedVG ? 'is-picked' : undefined}>
                      {r.isoVG}
                    </th>
                  ))}
                </tr>
              </thead>
              <tbody>
                <tr>
                  <th scope="row" title="Smallest specific film thickness over the load cases with this grade (same base oil and VI)">λmin</th>
                  {g.table.map((r) => (
                    <td key={r.isoVG} className={r.isoVG === g.recommendedVG ? 'is-picked' : undefined} title={`λmin with ISO VG ${r.isoVG} (same base oil and VI), over the load cases. Source: film formula of the policy; grades per ISO 3448.`}>
                      {formatResult(r.lambdaMin, 2)}
                    </td>
                  ))}
                </tr>
              </tbody>
            </table>
          ) : null}
        </div>
      ))}
    </div>
  );
}

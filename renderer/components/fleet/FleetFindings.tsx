import type { FleetResult } from '../../../app/fleet/types';
import { shortfallList } from '../../../app/fleet/words';

/** The smallest oil set, the assignment, the gearboxes no candidate serves and the cautions. */
export function FleetFindings({ result }: { readonly result: FleetResult }) {
  const current = new Map(result.gearboxes.map((g) => [g.name, g.currentOil]));
  return (
    <div className="fleet-findings">
      <h3>Smallest oil set</h3>
      {result.cover.length ? (
        <>
          <p data-testid="fleet-cover-summary">
            {result.cover.length} oil{result.cover.length === 1 ? '' : 's'} ({result.coverCost.epOils} EP, {result.coverCost.grades} viscosity grade{result.coverCost.grades === 1 ? '' : 's'}) serve every gearbox that any candidate serves
            {result.coverExact ? ', proven smallest; ties go to fewer EP oils, then fewer grades.' : '; the search stopped at its budget, so the set is not proven smallest.'}
          </p>
          <ul>{result.cover.map((o) => <li key={o}>{o}</li>)}</ul>
        </>
      ) : (
        <p>No candidate meets the need of any gearbox.</p>
      )}
      {result.assignment.length ? (
        <>
          <h3>Assignment</h3>
          <ul data-testid="fleet-assignment">
            {result.assignment.map((a) => (
              <li key={a.gearbox}>
                {a.gearbox} → <strong>{a.oil}</strong>
                {a.keepsCurrent ? ' (keeps its current oil)' : current.get(a.gearbox) ? ` (now on ${current.get(a.gearbox)})` : ''}
              </li>
            ))}
          </ul>
        </>
      ) : null}
      {result.unserved.length ? (
        <>
          <h3>No candidate serves</h3>
          <ul data-testid="fleet-unserved">
            {result.unserved.map((u) => (
              <li key={u.gearbox}>
                {u.gearbox}: {u.closest ? `closest is ${u.closest}, short on ${shortfallList(u.shortfalls)}` : 'no candidate oils'}
              </li>
            ))}
          </ul>
        </>
      ) : null}
      {result.failed.length ? (
        <>
          <h3>Not included</h3>
          <ul data-testid="fleet-failed">
            {result.failed.map((f) => (
              <li key={f.source}>{f.message.includes('not a valid review') ? `${f.source}: not a valid review, left out (its problems are listed with the files above).` : f.message}</li>
            ))}
          </ul>
        </>
      ) : null}
      <h3>Cautions</h3>
      <ul className="cautions">
        {result.cautions
          .filter((c) => c.applies)
          .map((c) => (
            <li key={c.id}>
              {c.text}
              {c.gearboxes.length ? ` Applies to: ${c.gearboxes.join('; ')}.` : ''}
            </li>
          ))}
      </ul>
    </div>
  );
}

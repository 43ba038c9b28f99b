import type { FleetResult } from '../../../app/fleet/types';
import { cellWords, shortfallList } from '../../../app/fleet/words';

/** Gearboxes (rows) × candidate oils (columns): a mark and words per cell; the chosen set starred. */
export function FitTable({ result }: { readonly result: FleetResult }) {
  const cell = new Map(result.fit.map((c) => [`${c.gearbox}\u0000${c.oil}`, c]));
  return (
    <div className="table-scroll" tabIndex={0} role="region" aria-label="Fit table: gearboxes by candidate oils">
      <table className="sbs fleet-fit" data-testid="fleet-fit">
        <caption className="sr-only">Fit table: whether each candidate oil meets each gearbox's need, and what it falls short on</caption>
        <thead>
          <tr>
            <th scope="col">Gearbox</th>
            {result.oils.map((o) => {
              const inSet = result.cover.includes(o.name);
              return (
                <th key={o.name} scope="col" className={inSet ? 'fleet-fit__chosen' : undefined} data-testid={inSet ? 'fleet-chosen-oil' : undefined}>
                  {o.name}
                  {inSet ? <span className="fleet-fit__star"> ★ in the set</span> : null}
                </th>
              );
            })}
          </tr>
        </thead>
        <tbody>
          {result.gearboxes.map((g) => (
            <tr key={g.name}>
              <th scope="row">{g.name}</th>
              {result.oils.map((o) => {
                const c = cell.get(`${g.name}\u0000${o.name}`);
                if (!c) return <td key={o.name}>—</td>;
                return (
                  <td key={o.name} className={c.meets ? 'fleet-cell--meets' : 'fleet-cell--short'} title={c.summary} data-testid="fleet-cell" data-meets={c.meets}>
                    <span aria-hidden="true" className="fleet-mark">{c.meets ? '✓' : '✗'}</span> {c.meets ? cellWords(true, []) : `short on ${shortfallList(c.shortfalls, true)}`}
                  </td>
                );
              })}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

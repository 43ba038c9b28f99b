/**
 * The fit table as CSV: one row per gearbox, one column per candidate oil, each cell "meets" or
 * "short: …" in words, then the oil assigned; a last row marks the oils of the smallest set.
 * RFC 4180 quoting, CRLF line ends and a UTF-8 byte-order mark, as the review's CSV. A cell that a
 * spreadsheet would read as a formula (it begins with = + - @, a tab or a carriage return: names
 * come from files) is prefixed with an apostrophe. Pure.
 */
import type { FleetResult } from './types';
import { shortfallList } from './words';

/** Keep a spreadsheet from evaluating a cell (CSV formula injection). */
export function neutralise(s: string): string {
  return /^[=+\-@\t\r]/.test(s) ? `'${s}` : s;
}

function quote(s: string): string {
  const n = neutralise(s);
  return /[",\r\n]/.test(n) ? `"${n.replace(/"/g, '""')}"` : n;
}

export function fleetToCsv(r: FleetResult): string {
  const cell = new Map(r.fit.map((c) => [`${c.gearbox}\u0000${c.oil}`, c]));
  const assigned = new Map(r.assignment.map((a) => [a.gearbox, a.oil]));
  const lines: string[][] = [['gearbox', 'oil in service', ...r.oils.map((o) => o.name), 'assigned oil']];
  for (const g of r.gearboxes) {
    const row = [g.name, g.currentOil ?? ''];
    for (const o of r.oils) {
      const c = cell.get(`${g.name}\u0000${o.name}`);
      row.push(!c ? '' : c.meets ? 'meets' : `short: ${shortfallList(c.shortfalls, true)}`);
    }
    row.push(assigned.get(g.name) ?? 'none serves it');
    lines.push(row);
  }
  lines.push(['smallest oil set', '', ...r.oils.map((o) => (r.cover.includes(o.name) ? 'in the set' : '')), '']);
  return `\uFEFF${lines.map((l) => l.map(quote).join(',')).join('\r\n')}\r\n`;
}

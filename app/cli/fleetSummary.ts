import type { FleetResult } from '../fleet/types';
import { cellWords, shortfallList } from '../fleet/words';

/** The human-readable summary of `flankfilm fleet`: words, no codes. */
export function fleetSummaryText(r: FleetResult): string {
  const lines = [`Flankfilm ${r.flankfilm} — fleet of ${r.gearboxes.length} gearbox${r.gearboxes.length === 1 ? '' : 'es'} against ${r.oils.length} candidate oil${r.oils.length === 1 ? '' : 's'}`, ''];
  const cell = new Map(r.fit.map((c) => [`${c.gearbox}\u0000${c.oil}`, c]));
  lines.push('Fit table (each oil run under the gearbox\'s own policy):');
  for (const g of r.gearboxes) {
    lines.push(`  ${g.name}${g.currentOil ? ` (current oil: ${g.currentOil})` : ''}`);
    for (const o of r.oils) {
      const c = cell.get(`${g.name}\u0000${o.name}`);
      if (c) lines.push(`    ${c.meets ? '✓' : '✗'} ${o.name}: ${cellWords(c.meets, c.shortfalls)}${c.governingCase ? ` (governing case: ${c.governingCase})` : ''}`);
    }
  }
  lines.push('');
  if (r.cover.length) {
    lines.push(`Smallest oil set${r.coverExact ? '' : ' (search stopped at its budget: not proven smallest)'}: ${r.cover.length} oil${r.cover.length === 1 ? '' : 's'}, ${r.coverCost.epOils} EP, ${r.coverCost.grades} viscosity grade${r.coverCost.grades === 1 ? '' : 's'}`);
    for (const o of r.cover) lines.push(`  • ${o}`);
  } else lines.push('Smallest oil set: none (no candidate serves any gearbox).');
  if (r.assignment.length) {
    lines.push('', 'Assignment:');
    for (const a of r.assignment) lines.push(`  ${a.gearbox} → ${a.oil}${a.keepsCurrent ? ' (keeps its current oil)' : ''}`);
  }
  if (r.unserved.length) {
    lines.push('', 'No candidate serves:');
    for (const u of r.unserved) lines.push(`  ${u.gearbox}: ${u.closest ? `closest is ${u.closest}, short on ${shortfallList(u.shortfalls)}` : 'no candidate oils'}`);
  }
  if (r.failed.length) {
    lines.push('', 'Not included (could not be read or computed):');
    for (const f of r.failed) lines.push(`  ${f.message.split('\n').join('\n    ')}`);
  }
  lines.push('', 'Cautions:');
  for (const c of r.cautions.filter((x) => x.applies)) lines.push(`  • ${c.text}${c.gearboxes.length ? ` Applies to: ${c.gearboxes.join('; ')}.` : ''}`);
  lines.push('');
  return lines.join('\n');
}

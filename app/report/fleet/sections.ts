/** The sections of the fleet record: the fit table, the set, the assignment, the unserved, the cautions. */
import type { FleetResult } from '../../fleet/types';
import { cellWords, shortfallList } from '../../fleet/words';
import { BASE_OIL_WORDS, CHEMISTRY_WORDS, stageWords } from '../../engine/verdict/words';
import type { Cell, Layout } from '../layout';
import { GREY, OKABE_ITO } from '../words';

/** Columns of oils per slice of the fit table, so a cell keeps room for its words. */
const OILS_PER_TABLE = 6;

const oilKey = (i: number): string => `O${i + 1}`;
/** A source as the record shows it: the file name, never the folder it came from. */
const basename = (s: string): string => s.split(/[\\/]/).pop() ?? s;

export function drawOilKey(L: Layout, r: FleetResult): void {
  L.heading('Candidate oils', 1);
  L.table(
    [
      { header: 'Key', width: 0.06 },
      { header: 'Oil', width: 0.36 },
      { header: 'Chemistry', width: 0.17 },
      { header: 'Base oil', width: 0.14 },
      { header: 'ISO VG', width: 0.07, align: 'right' },
      { header: 'FZG stage', width: 0.11, align: 'right' },
      { header: 'In the set', width: 0.09, align: 'center' },
    ],
    r.oils.map((o, i) => [oilKey(i), o.name, CHEMISTRY_WORDS[o.chemistry], BASE_OIL_WORDS[o.baseOil], o.isoVG === null ? '—' : String(o.isoVG), stageWords(o.fzgFailureStage), r.cover.includes(o.name) ? { text: '✓ yes', bold: true } : '']),
    { fontSize: 7.5, zebra: true },
  );
}

export function drawFitTable(L: Layout, r: FleetResult): void {
  L.heading('Fit table: gearbox × candidate oil', 1);
  L.para('Each cell is the review of that gearbox run with that oil alone, under the gearbox’s own policy: ✓ where the oil meets the need in every load case (chemistry, FZG stage by the policy’s methods, λ target), ✗ with what it falls short on otherwise. The marks carry the meaning; the colour only repeats it.', { size: 8.5 });
  const cell = new Map(r.fit.map((c) => [`${c.gearbox}\u0000${c.oil}`, c]));
  for (let start = 0; start < r.oils.length; start += OILS_PER_TABLE) {
    const slice = r.oils.slice(start, start + OILS_PER_TABLE);
    const rows: Cell[][] = r.gearboxes.map((g) => [
      g.name,
      ...slice.map((o): Cell => {
        const c = cell.get(`${g.name}\u0000${o.name}`);
        if (!c) return '—';
        return c.meets ? { text: '✓ meets', color: OKABE_ITO.bluishGreen, bold: true } : { text: `✗ ${shortfallList(c.shortfalls, true)}`, color: OKABE_ITO.vermillion };
      }),
    ]);
    L.table(
      [{ header: 'Gearbox', width: 0.34 }, ...slice.map((o, i) => ({ header: `${oilKey(start + i)}${r.cover.includes(o.name) ? ' ★' : ''}`, width: 0.66 / OILS_PER_TABLE, align: 'center' as const }))],
      rows,
      { fontSize: 7, zebra: true },
    );
  }
  L.para('★ marks an oil of the smallest set. Keys O1, O2 … are listed under Candidate oils.', { size: 7.5, color: GREY });
}

export function drawChosenSet(L: Layout, r: FleetResult): void {
  L.heading('The smallest oil set', 1);
  if (r.cover.length === 0) {
    L.para('No candidate meets the need of any gearbox: there is no set to choose.', { size: 9 });
    return;
  }
  L.para(
    `${r.cover.length} oil${r.cover.length === 1 ? '' : 's'} (${r.coverCost.epOils} EP, ${r.coverCost.grades} viscosity grade${r.coverCost.grades === 1 ? '' : 's'}) serve every gearbox that any candidate serves. ${r.coverExact ? 'The set is proven smallest by an exact search; ties are broken by fewer EP oils, then fewer viscosity grades.' : 'The search stopped at its budget: this set serves every such gearbox but is not proven smallest.'}`,
    { size: 9 },
  );
  const count = (o: string) => r.assignment.filter((a) => a.oil === o).length;
  L.table(
    [
      { header: 'Oil', width: 0.55 },
      { header: 'Chemistry', width: 0.25 },
      { header: 'Gearboxes assigned', width: 0.2, align: 'right' },
    ],
    r.cover.map((name) => {
      const o = r.oils.find((x) => x.name === name);
      return [name, o ? CHEMISTRY_WORDS[o.chemistry] : '—', String(count(name))];
    }),
    { fontSize: 8, zebra: true },
  );
}

export function drawAssignment(L: Layout, r: FleetResult): void {
  L.heading('Assignment', 2);
  L.para('Each gearbox keeps its current oil where that oil is in the set and meets its need; otherwise it takes an oil of the same chemistry and base oil, then one that is not EP, then the first listed.', { size: 8.5 });
  const current = new Map(r.gearboxes.map((g) => [g.name, g.currentOil]));
  L.table(
    [
      { header: 'Gearbox', width: 0.36 },
      { header: 'Oil assigned', width: 0.32 },
      { header: 'Oil in service', width: 0.32 },
    ],
    r.assignment.map((a) => [a.gearbox, a.keepsCurrent ? `${a.oil} (kept)` : a.oil, current.get(a.gearbox) ?? 'not stated']),
    { fontSize: 7.5, zebra: true },
  );
}

export function drawUnserved(L: Layout, r: FleetResult): void {
  L.heading('Gearboxes no candidate serves', 2);
  if (r.unserved.length === 0) L.para('None: every gearbox has an oil in the set.', { size: 9 });
  else {
    L.table(
      [
        { header: 'Gearbox', width: 0.32 },
        { header: 'Closest candidate', width: 0.32 },
        { header: 'Short on', width: 0.36 },
      ],
      r.unserved.map((u) => [u.gearbox, u.closest ?? '—', u.closest ? cellWords(false, u.shortfalls).replace(/^short on /, '') : '—']),
      { fontSize: 7.5, zebra: true },
    );
    L.para('Each needs its own answer: a higher grade or a cooler sump for film, an oil of a higher FZG stage, or, beyond oil chemistry, a change of design or duty. Review it on its own.', { size: 8.5 });
  }
  if (r.failed.length) {
    L.heading('Reviews not included', 2);
    for (const f of r.failed) L.bullet(`${basename(f.source)}: could not be read or computed, so it is left out of the consolidation.`, { size: 8 });
  }
}

export function drawFleetCautions(L: Layout, r: FleetResult): void {
  L.heading('Cautions', 1);
  for (const c of r.cautions.filter((x) => x.applies)) L.bullet(`${c.text}${c.gearboxes.length ? ` Applies to: ${c.gearboxes.join('; ')}.` : ''}`, { size: 8.5 });
  const standing = r.cautions.filter((x) => !x.applies);
  if (standing.length) {
    L.heading('Also consider', 3);
    for (const c of standing) L.bullet(c.text, { size: 8, color: GREY });
  }
}

/**
 * Lubricant consolidation across a plant: every gearbox (one review each) against every candidate
 * oil, the fit table, the smallest oil set that serves every gearbox any candidate serves, the
 * assignment, and the gearboxes no candidate serves. Pure: the caller reads the files.
 */
import { ENGINE_VERSION } from '../engine/version';
import { oilModelsOf } from '../review/oils';
import type { Oil, Review } from '../review/schema';
import { assignOils } from './assign';
import { fleetCautions } from './cautions';
import { smallestCover, type CoverCandidate } from './cover';
import { closestCell, fitRow } from './fit';
import type { FitCell, FleetFailure, FleetGearbox, FleetOil, FleetResult, FleetUnserved } from './types';
import { cellWords } from './words';

export interface FleetGearboxInput {
  /** Where the review came from (a path in the CLI, a file name on screen). */
  readonly source: string;
  readonly review: Review;
}

export interface FleetInput {
  readonly gearboxes: readonly FleetGearboxInput[];
  readonly oils: readonly Oil[];
  /** Reviews that could not be read; carried into the result so they are not lost. */
  readonly failed?: readonly FleetFailure[];
  /** Called after each gearbox's row: cells done, cells in all. */
  readonly onProgress?: (done: number, total: number) => void;
  readonly nodeBudget?: number;
}

/** Two data sheets are the same oil when every value but the name and role agrees. */
function sameDataSheet(a: Oil, b: Oil): boolean {
  const { name: _an, role: _ar, ...ra } = a;
  const { name: _bn, role: _br, ...rb } = b;
  const keys = new Set([...Object.keys(ra), ...Object.keys(rb)]);
  return [...keys].every((k) => (ra as Record<string, unknown>)[k] === (rb as Record<string, unknown>)[k]);
}

/** Unique gearbox names: the title; on a clash the id, then a number. */
function uniqueNames(reviews: readonly Review[]): string[] {
  const count = new Map<string, number>();
  for (const r of reviews) count.set(r.title, (count.get(r.title) ?? 0) + 1);
  const used = new Set<string>();
  return reviews.map((r) => {
    let name = (count.get(r.title) ?? 0) > 1 && r.id ? `${r.title} (${r.id})` : r.title;
    for (let n = 2; used.has(name); n++) name = `${r.title} (${n})`;
    used.add(name);
    return name;
  });
}

export function fleetOilsOf(oils: readonly Oil[]): FleetOil[] {
  return oilModelsOf(oils).map((m, i) => {
    const o = oils[i] as Oil;
    return { name: o.name, chemistry: o.chemistry, baseOil: o.baseOil, isoVG: m.model.isoVG, fzgFailureStage: o.fzgFailureStage, ep: o.chemistry === 'extreme-pressure' };
  });
}

export function runFleet(input: FleetInput): FleetResult {
  const oils = fleetOilsOf(input.oils); // throws EngineInputError naming oils[i].field for an oil the engine cannot use
  const names = uniqueNames(input.gearboxes.map((g) => g.review));
  const failed: FleetFailure[] = [...(input.failed ?? [])];
  const gearboxes: FleetGearbox[] = [];
  const fit: FitCell[] = [];
  const reviewOf = new Map<string, Review>();
  const total = input.gearboxes.length * input.oils.length;
  let done = 0;
  input.gearboxes.forEach((g, gi) => {
    const name = names[gi] as string;
    const row = fitRow(name, g.review, input.oils);
    done += row.length;
    input.onProgress?.(done, total);
    if (row.length > 0 && row.every((c) => c.shortfalls.includes('not-computed'))) {
      failed.push({ source: g.source, message: `"${g.review.title}" could not be computed: ${(row[0] as FitCell).summary.replace(/^Not computed: /, '')}` });
      return;
    }
    const current = g.review.oils.find((o) => o.role === 'in-service') ?? null;
    const match = current ? (input.oils.find((o) => o.name === current.name) ?? input.oils.find((o) => sameDataSheet(o, current)) ?? null) : null;
    gearboxes.push({ name, title: g.review.title, id: g.review.id ?? null, source: g.source, currentOil: current?.name ?? null, currentCandidate: match?.name ?? null, components: [...(g.review.gearPair ?? g.review.planetary)?.components ?? []] });
    reviewOf.set(name, g.review);
    fit.push(...row);
  });

  const meets = new Set(fit.filter((c) => c.meets).map((c) => `${c.gearbox}\u0000${c.oil}`));
  const candidates: CoverCandidate[] = oils.map((o) => ({
    covers: gearboxes.flatMap((g, gi) => (meets.has(`${g.name}\u0000${o.name}`) ? [gi] : [])),
    ep: o.ep,
    grade: o.isoVG !== null ? `VG ${o.isoVG}` : `kv40 ${input.oils.find((x) => x.name === o.name)?.kv40_mm2s}`,
  }));
  const cover = smallestCover(gearboxes.length, candidates, input.nodeBudget !== undefined ? { nodeBudget: input.nodeBudget } : {});
  const coverNames = cover.chosen.map((i) => (oils[i] as FleetOil).name);

  const oilByName = new Map(oils.map((o) => [o.name, o]));
  const currentOf = (g: FleetGearbox): FleetOil | null => {
    if (g.currentCandidate) return oilByName.get(g.currentCandidate) ?? null;
    const cur = reviewOf.get(g.name)?.oils.find((o) => o.role === 'in-service');
    return cur ? { name: cur.name, chemistry: cur.chemistry, baseOil: cur.baseOil, isoVG: null, fzgFailureStage: cur.fzgFailureStage, ep: cur.chemistry === 'extreme-pressure' } : null;
  };
  const assignment = assignOils(gearboxes, oils, fit, coverNames, currentOf);
  const unserved: FleetUnserved[] = cover.uncoverable.map((gi) => {
    const g = gearboxes[gi] as FleetGearbox;
    const c = closestCell(fit.filter((x) => x.gearbox === g.name));
    return {
      gearbox: g.name,
      closest: c?.oil ?? null,
      shortfalls: c?.shortfalls ?? [],
      summary: c ? `No candidate meets the need; the closest, ${c.oil}, is ${cellWords(false, c.shortfalls)} (governing case: ${c.governingCase ?? '—'}).` : 'No candidate oils were given.',
    };
  });
  return {
    flankfilm: ENGINE_VERSION,
    gearboxes,
    oils,
    fit,
    cover: coverNames,
    coverExact: cover.exact,
    coverCost: { oils: cover.cost.size, epOils: cover.cost.ep, grades: cover.cost.grades },
    assignment,
    unserved,
    failed,
    cautions: fleetCautions(gearboxes, oils, assignment, currentOf),
  };
}

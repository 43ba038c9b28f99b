/**
 * The reviews the benchmark times: the recompute workload, the fleet, the planetary demo and
 * the largest reviews the schema accepts. All built from the shipped (invented) demo reviews.
 */
import { readFileSync, readdirSync } from 'node:fs';
import { parseReviewValue } from '../../app/review/parse';
import { MAX_REVIEW_POINTS, type Oil, type Review } from '../../app/review/schema';

export const PAIR_DEMO = 'assets/demo/harrow-creek-crusher-hs-pair.flankfilm.json';
export const PLANETARY_DEMO = 'assets/demo/harrow-creek-ball-mill-planetary.flankfilm.json';

type Raw = { title: string; policy: Record<string, unknown>; oils: Array<Record<string, unknown>>; loadCases: Array<Record<string, unknown>> };

export function rawDemo(file: string = PAIR_DEMO): Raw {
  return JSON.parse(readFileSync(file, 'utf8')) as Raw;
}

export function parsed(raw: unknown): Review {
  const p = parseReviewValue(raw);
  if (!p.ok) throw new Error(`bench workload rejected: ${JSON.stringify(p.issues).slice(0, 400)}`);
  return p.review;
}

/** A third oil for the workload: the proposed oil one grade up. */
const VG460: Record<string, unknown> = { name: 'ISO VG 460 EP mineral', role: 'candidate', kv40_mm2s: 460, kv100_mm2s: 30.6, density15_kgm3: 900, baseOil: 'mineral', chemistry: 'extreme-pressure', fzgFailureStage: '>12' };

/** The workload: the pair demo's 3 load cases × 3 oils × `points` points, every derived result. */
export function recomputeWorkload(points: number): Review {
  return recomputeEdits(points, 1)[0] as Review;
}

/**
 * The workload as a user edits it: `count` versions whose first load case's duty steps up by 1 %
 * each (what typing a new torque does), so a timed recompute never repeats the one before it.
 * With `oilEdit`, the in-service oil's KV40 steps as well, so nothing kept per oil model applies
 * (the cold figure).
 */
export function recomputeEdits(points: number, count: number, oilEdit = false): Review[] {
  return Array.from({ length: count }, (_, k) => {
    const raw = rawDemo();
    raw.policy.pathPoints = points;
    raw.oils.push({ ...VG460 });
    scaleDuty(raw.loadCases[0] as Record<string, unknown>, 1 + 0.01 * k);
    if (oilEdit) (raw.oils[0] as Record<string, unknown>).kv40_mm2s = 220 * (1 + 0.001 * k) + 1e-6 * Math.random();
    return parsed(raw);
  });
}

/** The planetary demo (its two meshes) at `points` points. */
export function planetaryWorkload(points: number): Review {
  const raw = rawDemo(PLANETARY_DEMO);
  raw.policy.pathPoints = points;
  return parsed(raw);
}

/** Scale a load case's duty by k, whichever of power or torque it gives. */
function scaleDuty(lc: Record<string, unknown>, k: number): void {
  for (const key of ['power_kW', 'pinionTorque_Nm', 'sunTorque_Nm']) if (typeof lc[key] === 'number') lc[key] = (lc[key] as number) * k;
}

/**
 * The fleet: 50 gearboxes (the shipped reviews, each at load levels from 0.5 of its duty up in
 * steps of 0.1) against 20 candidate oils (the shipped candidates and more grades of them).
 */
export function fleetWorkload(): { gearboxes: Array<{ source: string; review: Review }>; oils: Oil[] } {
  const files = ['assets/demo', 'assets/demo/fleet'].flatMap((d) =>
    readdirSync(d)
      .filter((f) => f.endsWith('.flankfilm.json'))
      .sort()
      .map((f) => `${d}/${f}`),
  );
  const gearboxes: Array<{ source: string; review: Review }> = [];
  for (let i = 0; gearboxes.length < 50; i++) {
    const file = files[i % files.length] as string;
    const k = 0.5 + 0.1 * Math.floor(i / files.length);
    const raw = rawDemo(file);
    raw.title = `${raw.title} at ${k.toFixed(1)} × duty`;
    for (const lc of raw.loadCases) scaleDuty(lc, k);
    gearboxes.push({ source: file, review: parsed(raw) });
  }
  const base = (JSON.parse(readFileSync('assets/demo/fleet/harrow-creek-candidates.flankfilm-oils.json', 'utf8')) as { oils: Oil[] }).oils;
  const oils: Oil[] = base.map((o) => ({ ...o, role: 'candidate' }));
  for (const [vg, kv100] of [[150, 14.7], [1000, 50]] as const)
    for (const chemistry of ['r-and-o', 'anti-wear', 'extreme-pressure'] as const)
      for (const baseOil of ['mineral', 'pao'] as const)
        oils.push({ name: `VG ${vg} ${chemistry} ${baseOil} (bench)`, role: 'candidate', kv40_mm2s: vg, kv100_mm2s: baseOil === 'pao' ? kv100 * 1.3 : kv100, density15_kgm3: 880, baseOil, chemistry, fzgFailureStage: chemistry === 'extreme-pressure' ? '>12' : chemistry === 'anti-wear' ? 10 : 7 } as Oil);
  return { gearboxes, oils: oils.slice(0, 20) };
}

const GRADES: ReadonlyArray<readonly [number, number]> = [[68, 8.7], [100, 11.1], [150, 14.7], [220, 19], [320, 24.1], [460, 30.6], [680, 38.5], [1000, 50], [1500, 65], [2200, 85]];

function tenOils(raw: Raw): Array<Record<string, unknown>> {
  const template = raw.oils[raw.oils.length - 1] as Record<string, unknown>;
  return GRADES.map(([vg, kv100], i) => {
    const { viscosityIndex: _vi, ...rest } = template;
    return { ...rest, name: `ISO VG ${vg} (bench ${i + 1})`, role: i === 0 ? 'in-service' : 'candidate', kv40_mm2s: vg, kv100_mm2s: kv100 };
  });
}

function cases(raw: Raw, count: number): Array<Record<string, unknown>> {
  return Array.from({ length: count }, (_, i) => {
    const lc = { ...(raw.loadCases[i % raw.loadCases.length] as Record<string, unknown>) };
    lc.name = `case ${i + 1}`;
    scaleDuty(lc, 0.6 + (0.8 * i) / Math.max(1, count - 1));
    return lc;
  });
}

/**
 * The largest reviews the schema accepts (load cases × oils × points × meshes ≤ MAX_REVIEW_POINTS),
 * in the three shapes that stress different parts: the most analyses, the longest path, and a
 * planetary stage. Raw JSON, as `review --json` reads it from a file.
 */
export function largestReviews(): Record<string, Raw> {
  const manyCases = rawDemo();
  manyCases.loadCases = cases(manyCases, 20);
  manyCases.oils = tenOils(manyCases);
  manyCases.policy.pathPoints = Math.floor(MAX_REVIEW_POINTS / (20 * 10));
  const longPath = rawDemo();
  longPath.policy.pathPoints = 5001;
  longPath.loadCases = cases(longPath, Math.floor(MAX_REVIEW_POINTS / 5001));
  longPath.oils = longPath.oils.slice(0, 1);
  const planetary = rawDemo(PLANETARY_DEMO);
  planetary.loadCases = cases(planetary, 10);
  planetary.oils = tenOils(planetary);
  planetary.policy.pathPoints = Math.floor(MAX_REVIEW_POINTS / (10 * 10 * 2));
  for (const r of [manyCases, longPath, planetary]) parsed(r); // each is accepted
  return { '20 cases × 10 oils': manyCases, 'longest path (5001 points)': longPath, 'planetary, 10 cases × 10 oils': planetary };
}

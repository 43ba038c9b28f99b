/**
 * `npm run bench`: the performance figures of issue 7, printed as a table and written to
 * bench-results.json (git-ignored). Not part of `npm test`: timings on a shared 2-core machine are
 * not a pass/fail gate. Browser figures (latency_p95_ms, first_paint_ms) come from
 * tests/e2e/bench.ts when the built renderer exists.
 */
import { readFileSync, writeFileSync, existsSync } from 'node:fs';
import { parseReviewValue } from '../app/review/parse';
import { run } from '../app/review/run';
import { operatingMaps } from '../app/review/operatingMaps';
import type { Review } from '../app/review/schema';
import { FINDER_PATH_POINTS } from '../app/review/gradeFinder';
import { ehlPointSetup } from '../app/review/ehlPoint';
import { lineContactEhl } from '../app/engine/ehl/lineContactEhl';
import { readdirSync } from 'node:fs';
import { runFleet } from '../app/fleet/fleet';
import { smallestCover, type CoverCandidate } from '../app/fleet/cover';
import type { Oil } from '../app/review/schema';

const DEMO = 'assets/demo/harrow-creek-crusher-hs-pair.flankfilm.json';

type RawReview = { policy: Record<string, unknown>; oils: Array<Record<string, unknown>>; loadCases: unknown[] };

function review(mutate: (r: RawReview) => void): Review {
  const raw = JSON.parse(readFileSync(DEMO, 'utf8'));
  mutate(raw);
  const p = parseReviewValue(raw);
  if (!p.ok) throw new Error(JSON.stringify(p.issues));
  return p.review;
}

/** The issue's workload: 3 load cases × 3 oils × `points` points, with every derived result. */
function workload(points: number): Review {
  return review((r) => {
    r.policy.pathPoints = points;
    r.oils.push({ ...(r.oils[1] as Record<string, unknown>), name: 'ISO VG 460 EP mineral', role: 'candidate', kv40_mm2s: 460, kv100_mm2s: 30.6, viscosityIndex: undefined });
  });
}

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)] as number;
}

function time(fn: () => void, runs: number, warmup = 100): number[] {
  for (let i = 0; i < warmup; i++) fn();
  const t: number[] = [];
  for (let i = 0; i < runs; i++) {
    const s = performance.now();
    fn();
    t.push(performance.now() - s);
  }
  return t;
}

/**
 * Transcendental operations the recompute needs. A case point: mechanics 2 √, Blok 3 √, film 3 ln +
 * 4 exp (h_min, h_c, h_Y, φT). A grade-finder point: 2 exp (film and φT; its logarithms are shared).
 */
const OPS = { casePoint: { sqrt: 5, log: 3, exp: 4 }, finderPoint: { sqrt: 0, log: 0, exp: 2 } };

function opCount(r: Review): { sqrt: number; log: number; exp: number } {
  const res = run(r);
  const main = res.cases.reduce((s, c) => s + c.path.length, 0);
  const tables = new Set(res.gradeFinder.map((g) => JSON.stringify(g.table)));
  const finder = [...tables].reduce((s, t) => s + (JSON.parse(t) as unknown[]).length, 0) * r.loadCases.length * Math.min(FINDER_PATH_POINTS, r.policy.pathPoints);
  const n = (k: 'sqrt' | 'log' | 'exp') => main * OPS.casePoint[k] + finder * OPS.finderPoint[k];
  return { sqrt: n('sqrt'), log: n('log'), exp: n('exp') };
}

/** A bare loop doing the same count of transcendental operations, on varying arguments. */
function floorLoop(ops: { sqrt: number; log: number; exp: number }): number {
  let acc = 0;
  for (let i = 0; i < ops.sqrt; i++) acc += Math.sqrt(1.0001 + i * 1e-7);
  for (let i = 0; i < ops.log; i++) acc += Math.log(1.0001 + i * 1e-7);
  for (let i = 0; i < ops.exp; i++) acc += Math.exp(-1.0001 - i * 1e-9);
  return acc;
}

/**
 * The issue's fleet: 50 gearboxes (the demo reviews, each at ten load levels from 0.5 to 1.4 of its
 * duty) against 20 candidate oils (the demo candidates and twelve more grades of them).
 */
function fleetWorkload(): { gearboxes: Array<{ source: string; review: Review }>; oils: Oil[] } {
  const files = ['assets/demo', 'assets/demo/fleet'].flatMap((d) => readdirSync(d).filter((f) => f.endsWith('.flankfilm.json')).map((f) => `${d}/${f}`));
  const gearboxes: Array<{ source: string; review: Review }> = [];
  for (let i = 0; gearboxes.length < 50; i++) {
    const file = files[i % files.length] as string;
    const k = 0.5 + 0.1 * Math.floor(i / files.length);
    const raw = JSON.parse(readFileSync(file, 'utf8'));
    raw.title = `${raw.title} at ${k.toFixed(1)} × duty`;
    for (const lc of raw.loadCases) {
      if (lc.power_kW) lc.power_kW *= k;
      else lc.pinionTorque_Nm *= k;
    }
    const p = parseReviewValue(raw);
    if (!p.ok) throw new Error(JSON.stringify(p.issues));
    gearboxes.push({ source: file, review: p.review });
  }
  const base = JSON.parse(readFileSync('assets/demo/fleet/harrow-creek-candidates.flankfilm-oils.json', 'utf8')).oils as Oil[];
  const oils: Oil[] = base.map((o) => ({ ...o, role: 'candidate' }));
  const grades: Array<[number, number]> = [[150, 14.7], [1000, 50]];
  for (const [vg, kv100] of grades) for (const chem of ['r-and-o', 'anti-wear', 'extreme-pressure'] as const) for (const baseOil of ['mineral', 'pao'] as const) {
    oils.push({ name: `VG ${vg} ${chem} ${baseOil} (bench)`, role: 'candidate', kv40_mm2s: vg, kv100_mm2s: baseOil === 'pao' ? kv100 * 1.3 : kv100, density15_kgm3: 880, baseOil, chemistry: chem, fzgFailureStage: chem === 'extreme-pressure' ? '>12' : chem === 'anti-wear' ? 10 : 7 });
  }
  return { gearboxes, oils: oils.slice(0, 20) };
}

/** The worst time of the exact cover over seeded random instances of 30 candidates (densities 5–40 %). */
function coverWorstMs(): number {
  let worst = 0;
  for (const dens of [0.05, 0.1, 0.25, 0.4]) for (const n of [30, 60, 200]) for (let seed = 1; seed <= 3; seed++) {
    let s = seed * 7919;
    const rnd = () => ((s = (1664525 * s + 1013904223) >>> 0) / 2 ** 32);
    const cands: CoverCandidate[] = [...Array(30).keys()].map(() => ({ covers: [...Array(n).keys()].filter(() => rnd() < dens), ep: rnd() < 0.4, grade: `VG ${[150, 220, 320, 460][Math.floor(rnd() * 4)]}` }));
    const t = performance.now();
    smallestCover(n, cands);
    worst = Math.max(worst, performance.now() - t);
  }
  return worst;
}

async function main() {
  const r400 = workload(400);
  const recompute = time(() => run(r400), 60);
  const ops = opCount(r400);
  let sink = 0;
  const floor = time(() => (sink += floorLoop(ops)), 60);
  const scaling: Record<string, number> = {};
  for (const n of [100, 200, 400, 800]) {
    const r = workload(n);
    scaling[String(n)] = median(time(() => run(r), 30, 10));
  }
  const mapReview = review((r) => (r.policy.pathPoints = 200));
  const mapTimes = time(() => operatingMaps({ ...mapReview, loadCases: mapReview.loadCases.slice(0, 1) }), 5, 1);
  let pdf_ms: number | null = null;
  try {
    const { renderRecord } = await import('../app/report/record');
    const demo = review(() => undefined);
    const res = run(demo);
    const t = [];
    for (let i = 0; i < 6; i++) {
      // What `review --pdf` does after run(): the operating maps, then the record.
      const s = performance.now();
      await renderRecord(demo, res, { maps: operatingMaps(demo) ?? [] });
      t.push(performance.now() - s);
    }
    pdf_ms = median(t.slice(1));
  } catch (e) {
    console.error(`pdf_ms: record not measured (${(e as Error).message})`);
  }
  // The numerical film at the demo's least-λ point of each load case, default nodes, one solve each.
  const demoReview = review(() => undefined);
  const ehlTimes: number[] = [];
  let ehlIterations = 0;
  let ehlConverged = true;
  for (const lc of demoReview.loadCases) {
    const setup = ehlPointSetup(demoReview, { caseName: lc.name, at: 'lambda-min' });
    lineContactEhl(setup.input); // warm-up
    for (let i = 0; i < 3; i++) {
      const s = performance.now();
      const r = lineContactEhl(setup.input);
      ehlTimes.push(performance.now() - s);
      ehlIterations = Math.max(ehlIterations, r.iterations);
      ehlConverged &&= r.converged;
    }
  }
  const fleet = fleetWorkload();
  const fleetTimes = time(() => runFleet(fleet), 3, 1);
  const cover_ms = coverWorstMs();
  const browser = existsSync('test-output/bench-browser.json') ? JSON.parse(readFileSync('test-output/bench-browser.json', 'utf8')) : {};
  const out = {
    recompute_ms_median: median(recompute),
    floor_ratio: median(recompute) / median(floor),
    floor_ms_median: median(floor),
    transcendental_ops_per_recompute: ops,
    map_ms: median(mapTimes),
    fleet_ms: median(fleetTimes),
    fleet_cells: fleet.gearboxes.length * fleet.oils.length,
    cover30_worst_ms: cover_ms,
    pdf_ms,
    ehl_ms: median(ehlTimes),
    ehl_ms_max: Math.max(...ehlTimes),
    ehl_iterations_max: ehlIterations,
    ehl_converged: ehlConverged,
    latency_p95_ms: browser.latency_p95_ms ?? null,
    first_paint_ms: browser.first_paint_ms ?? null,
    scaling,
    machine: { node: process.version, cpus: (await import('node:os')).cpus().length },
  };
  writeFileSync('bench-results.json', `${JSON.stringify(out, null, 2)}\n`);
  const targets: Record<string, number> = { recompute_ms_median: 2, floor_ratio: 3, map_ms: 300, pdf_ms: 1000, ehl_ms: 300, ehl_ms_max: 300, fleet_ms: 5000, cover30_worst_ms: 1000, latency_p95_ms: 50, first_paint_ms: 800 };
  console.log('key                   value      target');
  for (const [k, target] of Object.entries(targets)) {
    const v = (out as Record<string, unknown>)[k] as number | null;
    console.log(`${k.padEnd(21)} ${v === null ? '—'.padStart(9) : v.toFixed(2).padStart(9)}  ≤ ${target}${v !== null && v > target ? '  MISSED' : ''}`);
  }
  console.log(`scaling (ms at 100/200/400/800 points): ${Object.values(scaling).map((x) => x.toFixed(2)).join(' / ')}`);
  if (sink === 42) console.log('');
}

void main();

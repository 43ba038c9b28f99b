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
  const browser = existsSync('test-output/bench-browser.json') ? JSON.parse(readFileSync('test-output/bench-browser.json', 'utf8')) : {};
  const out = {
    recompute_ms_median: median(recompute),
    floor_ratio: median(recompute) / median(floor),
    floor_ms_median: median(floor),
    transcendental_ops_per_recompute: ops,
    map_ms: median(mapTimes),
    pdf_ms,
    latency_p95_ms: browser.latency_p95_ms ?? null,
    first_paint_ms: browser.first_paint_ms ?? null,
    scaling,
    machine: { node: process.version, cpus: (await import('node:os')).cpus().length },
  };
  writeFileSync('bench-results.json', `${JSON.stringify(out, null, 2)}\n`);
  const targets: Record<string, number> = { recompute_ms_median: 2, floor_ratio: 3, map_ms: 300, pdf_ms: 1000, latency_p95_ms: 50, first_paint_ms: 800 };
  console.log('key                   value      target');
  for (const [k, target] of Object.entries(targets)) {
    const v = (out as Record<string, unknown>)[k] as number | null;
    console.log(`${k.padEnd(21)} ${v === null ? '—'.padStart(9) : v.toFixed(2).padStart(9)}  ≤ ${target}${v !== null && v > target ? '  MISSED' : ''}`);
  }
  console.log(`scaling (ms at 100/200/400/800 points): ${Object.values(scaling).map((x) => x.toFixed(2)).join(' / ')}`);
  if (sink === 42) console.log('');
}

void main();

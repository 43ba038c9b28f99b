/**
 * `npm run bench`: every performance figure of the project in one command. It times the engine in
 * this process, the largest accepted reviews each in a fresh process, and the renderer in Chromium
 * (tests/e2e/bench.ts, after building the renderer); writes bench-results.json (git-ignored) with
 * the machine and the date; prints each figure against its target; and regenerates the README's
 * performance table (scripts/bench/readme.ts). Not part of `npm test`: timings on a shared 2-core
 * machine are no pass/fail gate. `--no-browser` skips Chromium; `--no-readme` leaves README.md.
 */
import { spawnSync } from 'node:child_process';
import { cpus, loadavg, tmpdir, totalmem } from 'node:os';
import { existsSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { run } from '../app/review/run';
import { operatingMaps } from '../app/review/operatingMaps';
import { ehlPointSetup } from '../app/review/ehlPoint';
import { lineContactEhl } from '../app/engine/ehl/lineContactEhl';
import { runFleet } from '../app/fleet/fleet';
import { smallestCover, type CoverCandidate } from '../app/fleet/cover';
import { floorLoop, opCount, type OpArguments } from './bench/floor';
import { fleetWorkload, largestReviews, parsed, planetaryWorkload, rawDemo, recomputeEdits, recomputeWorkload } from './bench/workloads';
import type { Review } from '../app/review/schema';
import { consoleTable, type BenchResults } from './bench/targets';
import { RecordWorkerClient } from '../main/services/recordWorkerClient';

const args = new Set(process.argv.slice(2));

function median(xs: readonly number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  const m = Math.floor(s.length / 2);
  return s.length % 2 ? (s[m] as number) : ((s[m - 1] as number) + (s[m] as number)) / 2;
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

/** Two workloads timed turn about (a then b, `runs` times each, after a warm-up of both). */
function interleaved(a: () => void, b: () => void, runs: number, warmup = 100): [number[], number[]] {
  for (let i = 0; i < warmup; i++) {
    a();
    b();
  }
  const ta: number[] = [];
  const tb: number[] = [];
  for (let i = 0; i < runs; i++) {
    let s = performance.now();
    a();
    ta.push(performance.now() - s);
    s = performance.now();
    b();
    tb.push(performance.now() - s);
  }
  return [ta, tb];
}

/** The worst time of the exact cover over seeded random instances of 30 candidates (densities 5–40 %). */
function coverWorstMs(): number {
  let worst = 0;
  for (const dens of [0.05, 0.1, 0.25, 0.4])
    for (const n of [30, 60, 200])
      for (let seed = 1; seed <= 3; seed++) {
        let s = seed * 7919;
        const rnd = () => (s = (1664525 * s + 1013904223) >>> 0) / 2 ** 32;
        const cands: CoverCandidate[] = [...Array(30).keys()].map(() => ({ covers: [...Array(n).keys()].filter(() => rnd() < dens), ep: rnd() < 0.4, grade: `VG ${[150, 220, 320, 460][Math.floor(rnd() * 4)]}` }));
        const t = performance.now();
        smallestCover(n, cands);
        worst = Math.max(worst, performance.now() - t);
      }
  return worst;
}

/** The transcendental operations of one recompute and their arguments, recorded in a child process (scripts/bench/floor.ts). */
function recordedOps(): OpArguments {
  const child = spawnSync(process.execPath, ['--import', 'tsx', 'scripts/bench/opCountChild.ts'], { encoding: 'utf8', maxBuffer: 1 << 26 });
  if (child.status !== 0) throw new Error(`recording the recompute's operations failed: ${child.stderr.slice(-800)}`);
  const parsed = JSON.parse(child.stdout) as Record<string, number[]>;
  return Object.fromEntries(Object.entries(parsed).map(([k, a]) => [k, Float64Array.from(a)]));
}

function engineFigures(): Record<string, unknown> {
  // Each timed recompute follows an edit of the torque (the next of 16 versions), as in the app; the
  // cold figure edits an oil's KV40 as well, so nothing kept per oil model helps.
  const cycle = (reviews: readonly Review[]) => {
    let k = 0;
    return () => run(reviews[k++ % reviews.length] as Review);
  };
  // The recompute and its floor are timed turn about, so both see the same load on a shared machine.
  const ops = recordedOps();
  let sink = 0;
  // A fresh process takes some 200 recomputes to settle (JIT tiers, the young generation growing:
  // medians of 2.0, 1.0, then 0.7–0.8 ms per hundred here), so 500 turns warm up before 300 are timed.
  const [recompute, floor] = interleaved(cycle(recomputeEdits(400, 16)), () => (sink += floorLoop(ops)), 300, 500);
  const cold = time(cycle(recomputeEdits(400, 400, true)), 150, 50);
  const scaling: Record<string, number> = {};
  for (const n of [100, 200, 400, 800]) scaling[String(n)] = median(time(cycle(recomputeEdits(n, 16)), 60, 20));
  const planetary = planetaryWorkload(400);
  const planetaryTimes = time(() => run(planetary), 60, 20);
  const mapReview = recomputeWorkload(200);
  const oneCase = { ...mapReview, oils: mapReview.oils.slice(0, 2), loadCases: mapReview.loadCases.slice(0, 1) };
  const mapTimes = time(() => operatingMaps(oneCase), 7, 2);
  // The numerical film at the demo's least-λ point of each load case, default nodes.
  const demo = parsed(rawDemo());
  const ehlTimes: number[] = [];
  let ehlIterations = 0;
  let ehlConverged = true;
  for (const lc of demo.loadCases) {
    const setup = ehlPointSetup(demo, { caseName: lc.name, at: 'lambda-min' });
    lineContactEhl(setup.input);
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
  return {
    recompute_ms_median: median(recompute),
    recompute_ms_p95: [...recompute].sort((a, b) => a - b)[Math.ceil(0.95 * recompute.length) - 1],
    recompute_cold_ms_median: median(cold),
    floor_ms_median: median(floor),
    floor_ratio: median(recompute) / median(floor),
    transcendental_ops_per_recompute: opCount(ops),
    scaling,
    scaling_800_over_400: (scaling['800'] as number) / (scaling['400'] as number),
    planetary_recompute_ms: median(planetaryTimes),
    map_ms: median(mapTimes),
    ehl_ms: median(ehlTimes),
    ehl_ms_max: Math.max(...ehlTimes),
    ehl_iterations_max: ehlIterations,
    ehl_converged: ehlConverged,
    fleet_ms: median(fleetTimes),
    fleet_cells: fleet.gearboxes.length * fleet.oils.length,
    cover30_worst_ms: coverWorstMs(),
    floor_sink: sink === 42 ? 42 : undefined,
  };
}

async function recordFigures(): Promise<Record<string, unknown>> {
  const { renderRecord } = await import('../app/report/record');
  const demo = parsed(rawDemo());
  const t: number[] = [];
  let bytes = 0;
  for (let i = 0; i < 6; i++) {
    // What `review --pdf` does after reading the file: run(), the operating maps, then the record.
    const s = performance.now();
    const pdf = await renderRecord(demo, run(demo), { maps: operatingMaps(demo) ?? [] });
    t.push(performance.now() - s);
    bytes = pdf.length;
  }
  // The first record in a fresh process, three times (what one export from the app costs).
  const first: number[] = [];
  for (let i = 0; i < 3; i++) {
    const child = spawnSync(process.execPath, ['--import', 'tsx', 'scripts/bench/firstRecordChild.ts'], { encoding: 'utf8' });
    if (child.status !== 0) throw new Error(`the first-record child failed: ${child.stderr.slice(-800)}`);
    first.push((JSON.parse(child.stdout) as { ms: number }).ms);
  }
  // The first export from the app: a standing record worker (as main starts it), warmed up, then the demo.
  const exportFirst: number[] = [];
  for (let i = 0; i < 3; i++) {
    const client = new RecordWorkerClient({ file: './tests/harness/recordWorker.cjs' }, 'assets/fonts');
    await client.warm();
    const s = performance.now();
    await client.render({ review: demo, paper: 'a4', fontsDir: 'assets/fonts' });
    exportFirst.push(performance.now() - s);
    client.stop();
  }
  return { pdf_ms: median(t.slice(1)), pdf_first_ms: median(first), pdf_export_first_ms: median(exportFirst), pdf_kb: bytes / 1024 };
}

/** Each largest shape through `review --json` in its own process; the worst time and memory. */
function largestReviewFigures(): Record<string, unknown> {
  const dir = mkdtempSync(join(tmpdir(), 'flankfilm-bench-'));
  const shapes: Record<string, unknown> = {};
  try {
    for (const [name, raw] of Object.entries(largestReviews())) {
      const file = join(dir, 'review.flankfilm.json');
      writeFileSync(file, JSON.stringify(raw));
      const child = spawnSync(process.execPath, ['--import', 'tsx', 'scripts/bench/largestReviewChild.ts', file], { encoding: 'utf8', maxBuffer: 1 << 26 });
      const last = child.stderr.trim().split('\n').at(-1) ?? '';
      let m: { code: number; ms: number; rss_mb: number; json_mb: number };
      try {
        m = JSON.parse(last);
      } catch {
        throw new Error(`largest review "${name}": ${child.stderr.slice(-800)}`);
      }
      if (m.code !== 0) throw new Error(`largest review "${name}" exited ${m.code}: ${child.stderr.slice(-800)}`);
      shapes[name] = m;
    }
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
  const all = Object.values(shapes) as Array<{ ms: number; rss_mb: number }>;
  return { largest_review_ms: Math.max(...all.map((s) => s.ms)), largest_review_rss_mb: Math.max(...all.map((s) => s.rss_mb)), largest_review_shapes: shapes };
}

/** The renderer in Chromium: build it, then tests/e2e/bench.ts (it writes test-output/bench-browser.json). */
function browserFigures(): Record<string, unknown> {
  const out = 'test-output/bench-browser.json';
  rmSync(out, { force: true });
  const npx = process.platform === 'win32' ? 'npx.cmd' : 'npx';
  const build = spawnSync(npx, ['vite', 'build', '--config', 'renderer/vite.config.ts', '--logLevel', 'error'], { stdio: 'inherit' });
  if (build.status !== 0) return { browser_error: 'the renderer did not build' };
  const bench = spawnSync(npx, ['tsx', 'tests/e2e/bench.ts'], { stdio: ['ignore', 'ignore', 'inherit'] });
  if (bench.status !== 0 || !existsSync(out)) return { browser_error: 'the browser bench failed (is Chromium installed?)' };
  return JSON.parse(readFileSync(out, 'utf8')) as Record<string, unknown>;
}

async function main(): Promise<void> {
  const cpu = cpus();
  const results: BenchResults = {
    date: new Date().toISOString(),
    machine: { node: process.version, platform: `${process.platform} ${process.arch}`, cpus: cpu.length, cpuModel: cpu[0]?.model.trim() ?? null, memory_gb: Math.round(totalmem() / 2 ** 30), loadAverage: loadavg() },
  };
  const step = (name: string) => process.stderr.write(`bench: ${name}…\n`);
  step('engine');
  Object.assign(results, engineFigures());
  step('record');
  Object.assign(results, await recordFigures());
  step('largest reviews');
  Object.assign(results, largestReviewFigures());
  if (!args.has('--no-browser')) {
    step('browser');
    Object.assign(results, browserFigures());
  }
  (results.machine as Record<string, unknown>).loadAverageAtEnd = loadavg();
  writeFileSync('bench-results.json', `${JSON.stringify(results, null, 2)}\n`);
  console.log(consoleTable(results));
  console.log(`scaling (ms at 100 / 200 / 400 / 800 points): ${Object.values(results.scaling as Record<string, number>).map((x) => x.toFixed(2)).join(' / ')}`);
  console.log('wrote bench-results.json');
  if (!args.has('--no-readme')) {
    const { updateReadme } = await import('./bench/readme');
    updateReadme();
  }
}

void main().catch((e: unknown) => {
  console.error(`bench: ${(e as Error).message}`);
  process.exitCode = 1;
});

/**
 * Browser figures for scripts/bench.ts, through the harness in Debian Chromium (not part of npm
 * test). Run `npm run build:renderer`, then `npx tsx tests/e2e/bench.ts`. Writes
 * test-output/bench-browser.json:
 *   first_paint_ms   median over 5 fresh page loads of the renderer's first-contentful-paint
 *                    (the demo opens on that load; demo_ready_ms says when its verdict is on screen)
 *   latency_p95_ms   p95 over 40 edits of the torque field, from the renderer's performance mark
 *                    'edit' (the input handler) to 'chart-updated' (the Mesh charts drew the new data)
 */
import { mkdirSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { startHarness } from '../harness/server';
import { field, launch, waitForResults, WAIT } from './support';

const LOADS = 5;
const WARM_UP = 5;
const EDITS = 40;
const TORQUE = 'loadCases[0].pinionTorque_Nm';

const median = (xs: readonly number[]) => {
  const s = [...xs].sort((a, b) => a - b);
  const m = Math.floor(s.length / 2);
  return s.length % 2 ? (s[m] as number) : ((s[m - 1] as number) + (s[m] as number)) / 2;
};
/** Nearest-rank percentile. */
const percentile = (xs: readonly number[], p: number) => [...xs].sort((a, b) => a - b)[Math.max(0, Math.ceil((p / 100) * xs.length) - 1)] as number;
const round = (x: number) => Math.round(x * 100) / 100;

async function main(): Promise<void> {
  // Another build to compare (a path as the first argument); dist/renderer by default.
  const harness = await startHarness(process.argv[2] ? { staticDir: process.argv[2] } : {});
  const browser = await launch();
  try {
    const paints: number[] = [];
    const ready: number[] = [];
    for (let i = 0; i < LOADS; i++) {
      const context = await browser.newContext({ viewport: { width: 1440, height: 1000 } });
      const page = await context.newPage();
      page.setDefaultTimeout(WAIT);
      // When the demo's first verdict badge appears (observed by the bench, not the renderer).
      await page.addInitScript(() => {
        new MutationObserver((_, obs) => {
          if (document.querySelector('[data-panel=verdict] .vbadge')) {
            (window as unknown as { demoReady?: number }).demoReady = performance.now();
            obs.disconnect();
          }
        }).observe(document, { subtree: true, childList: true });
      });
      await page.goto(harness.url);
      await waitForResults(page);
      const t = await page.evaluate(() => ({
        fcp: performance.getEntriesByName('first-contentful-paint')[0]?.startTime ?? null,
        ready: (window as unknown as { demoReady?: number }).demoReady ?? null,
      }));
      if (t.fcp === null) throw new Error('no first-contentful-paint entry');
      paints.push(t.fcp);
      if (t.ready !== null) ready.push(t.ready);
      await context.close();
    }

    const context = await browser.newContext({ viewport: { width: 1440, height: 1000 } });
    const page = await context.newPage();
    page.setDefaultTimeout(WAIT);
    await page.goto(harness.url);
    await waitForResults(page);
    const input = field(page, TORQUE);
    const t0 = Number(await input.inputValue());
    const latencies: number[] = [];
    for (let i = 0; i < WARM_UP + EDITS; i++) {
      const before = await page.evaluate(() => performance.getEntriesByName('chart-updated').length);
      // One input event per edit (fill), each a new torque so the charts change.
      await input.fill((t0 * (1 + 0.01 * ((i % 20) + 1))).toFixed(2));
      await page.waitForFunction((n) => performance.getEntriesByName('chart-updated').length > n, before, { timeout: WAIT, polling: 'raf' });
      const ms = await page.evaluate(() => {
        const edit = performance.getEntriesByName('edit').at(-1);
        const drawn = performance.getEntriesByName('chart-updated').at(-1);
        if (!edit || !drawn || drawn.startTime < edit.startTime) return null;
        return performance.measure('edit-to-chart', { start: edit.startTime, end: drawn.startTime }).duration;
      });
      if (ms === null) throw new Error(`edit ${i}: no chart update after the edit`);
      if (i >= WARM_UP) latencies.push(ms);
      await page.waitForTimeout(60);
    }
    await context.close();

    const out = {
      latency_p95_ms: round(percentile(latencies, 95)),
      first_paint_ms: round(median(paints)),
      latency_median_ms: round(median(latencies)),
      latency_max_ms: round(Math.max(...latencies)),
      edits: latencies.length,
      first_paint_runs_ms: paints.map(round),
      demo_ready_ms: ready.length ? round(median(ready)) : null,
    };
    mkdirSync('test-output', { recursive: true });
    writeFileSync(join('test-output', 'bench-browser.json'), `${JSON.stringify(out, null, 2)}\n`);
    console.log(JSON.stringify(out, null, 2));
  } finally {
    await browser.close();
    await harness.close();
  }
}

void main().catch((e: unknown) => {
  console.error(e);
  process.exitCode = 1;
});

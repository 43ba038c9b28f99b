/**
 * Where an edit's time goes, in Debian Chromium (a developer's tool, not part of npm test).
 * Build an unminified renderer, then run the profile:
 *   npx vite build --config renderer/vite.config.ts --minify false --outDir ../dist/renderer-profile
 *   npx tsx tests/e2e/profile.ts [dist/renderer-profile]
 * For 40 edits of the torque field (as tests/e2e/bench.ts makes them) it prints
 *   - the latency split by marks the page places around the recompute worker (set here, by
 *     wrapping Worker, so the app carries no profiling code): edit → request posted → answer
 *     received → answer deserialised → 'chart-updated', and the worker's own run() time;
 *   - the main thread's CPU time per edit (V8 sampling profiler), by original source file through
 *     the bundle's source map, and inclusive in a few functions of interest.
 */
import { readFileSync, readdirSync } from 'node:fs';
import { SourceMap } from 'node:module';
import { join } from 'node:path';
import { startHarness } from '../harness/server';
import { field, launch, waitForResults, WAIT } from './support';

const WARM_UP = 5;
const EDITS = 40;
const TORQUE = 'loadCases[0].pinionTorque_Nm';
/** Functions whose inclusive time is worth knowing (names as the unminified bundle keeps them). */
const INCLUSIVE = ['parseReviewValue', 'docReducer', 'meshCharts', 'updateInPlace', 'configOf', 'summarise', 'performWorkOnRoot', 'commitRoot', 'flushLayoutEffects', 'commitLayoutEffects', 'stringify', 'pathBuffers', 'update', 'draw', 'render', '_updateScales', '_updateLayout', 'buildOrUpdateElements', '_updateDatasets', 'updateHoverStyle', 'reset', 'resolveDataElementOptions', 'buildTicks', 'fit', '_computeLabelItems', 'generateTickLabels', 'calculateLabelRotation', 'beforeUpdate', 'updateConfig', 'createResolver', '_resolveWithContext'];

/** Marks around the recompute worker: a wrapped Worker whose listener runs before the client's onmessage. */
const WRAP_WORKER = `
  const Original = window.Worker;
  window.runMillis = [];
  window.Worker = class extends Original {
    constructor(url, options) {
      super(url, options);
      if (!options || options.name !== 'flankfilm-recompute') return;
      this.addEventListener('message', (e) => {
        performance.mark('answer-received');
        const data = e.data;
        performance.mark('answer-deserialised');
        if (typeof data.millis === 'number') window.runMillis.push(data.millis);
      });
    }
    postMessage(message, transfer) {
      performance.mark('request-posted');
      super.postMessage(message, transfer);
    }
  };
`;
/** Spins 20 ms in a function the profile names; returns when it started (performance.now()). */
const SPIN = `(() => {
  const flankfilmCalibrationSpin = () => { const t = performance.now(); while (performance.now() - t < 20) { /* spin */ } return t; };
  return flankfilmCalibrationSpin();
})()`;
const READ_MARKS = `(() => {
  const last = (name) => { const e = performance.getEntriesByName(name); return e.length ? e[e.length - 1].startTime : NaN; };
  return { edit: last('edit'), posted: last('request-posted'), received: last('answer-received'), deserialised: last('answer-deserialised'), drawn: last('chart-updated'), millis: window.runMillis.length ? window.runMillis[window.runMillis.length - 1] : NaN };
})()`;

interface CallFrame { functionName: string; url: string; lineNumber: number; columnNumber: number }
interface ProfileNode { id: number; callFrame: CallFrame; parent?: number; children?: number[] }
interface Profile { nodes: ProfileNode[]; samples: number[]; timeDeltas: number[] }

const median = (xs: readonly number[]) => {
  const s = [...xs].sort((a, b) => a - b);
  return s.length ? (s[Math.floor(s.length / 2)] as number) : NaN;
};
const r1 = (x: number) => Math.round(x * 10) / 10;

/** Short name of an original source: the package for node_modules, else the repo path. */
function shortSource(src: string): string {
  const nm = src.lastIndexOf('node_modules/');
  if (nm >= 0) {
    const rest = src.slice(nm + 'node_modules/'.length).split('/');
    return `npm:${rest[0]?.startsWith('@') ? `${rest[0]}/${rest[1]}` : rest[0]}`;
  }
  return src.replace(/^(\.\.\/)+/, '');
}

async function main(): Promise<void> {
  const staticDir = process.argv[2] ?? 'dist/renderer-profile';
  const harness = await startHarness({ staticDir });
  const browser = await launch();
  const assets = join(staticDir, 'assets');
  const maps = new Map<string, SourceMap>();
  for (const f of readdirSync(assets)) if (f.endsWith('.js.map')) maps.set(f.slice(0, -4), new SourceMap(JSON.parse(readFileSync(join(assets, f), 'utf8')) as never));
  try {
    const context = await browser.newContext({ viewport: { width: 1440, height: 1000 } });
    const page = await context.newPage();
    page.setDefaultTimeout(WAIT);
    // As text, not a function: tsx would wrap named functions in a helper the page does not have.
    await page.addInitScript(WRAP_WORKER);
    await page.goto(harness.url);
    await waitForResults(page);
    const cdp = await context.newCDPSession(page);
    const input = field(page, TORQUE);
    const t0 = Number(await input.inputValue());
    let spinAt = NaN;
    const windows: { start: number; end: number }[] = [];
    const splits: Record<string, number[]> = { 'edit→posted': [], 'posted→received': [], 'received→deserialised': [], 'deserialised→chart-updated': [], 'edit→chart-updated': [], 'worker run()': [] };
    for (let i = 0; i < WARM_UP + EDITS; i++) {
      if (i === WARM_UP) {
        await cdp.send('Profiler.enable');
        await cdp.send('Profiler.setSamplingInterval', { interval: 100 });
        await cdp.send('Profiler.start');
        // A spin the profile will show, at a known performance.now(): it puts the samples on the page's clock.
        spinAt = (await page.evaluate(SPIN)) as number;
      }
      const before = await page.evaluate(() => performance.getEntriesByName('chart-updated').length);
      await input.fill((t0 * (1 + 0.01 * ((i % 20) + 1))).toFixed(2));
      await page.waitForFunction((n) => performance.getEntriesByName('chart-updated').length > n, before, { timeout: WAIT, polling: 'raf' });
      const t = (await page.evaluate(READ_MARKS)) as Record<'edit' | 'posted' | 'received' | 'deserialised' | 'drawn' | 'millis', number>;
      if (i >= WARM_UP) {
        windows.push({ start: t.edit, end: t.drawn });
        splits['edit→posted']?.push(t.posted - t.edit);
        splits['posted→received']?.push(t.received - t.posted);
        splits['received→deserialised']?.push(t.deserialised - t.received);
        splits['deserialised→chart-updated']?.push(t.drawn - t.deserialised);
        splits['edit→chart-updated']?.push(t.drawn - t.edit);
        splits['worker run()']?.push(t.millis);
      }
      await page.waitForTimeout(60);
    }
    const { profile } = (await cdp.send('Profiler.stop')) as unknown as { profile: Profile };
    await context.close();

    console.log(`latency split over ${EDITS} edits, median (ms):`);
    for (const [k, v] of Object.entries(splits)) console.log(`  ${k.padEnd(28)} ${r1(median(v))}   (max ${r1(Math.max(...v))})`);

    // CPU samples: self time by original source, inclusive time in the functions of interest.
    const byId = new Map(profile.nodes.map((n) => [n.id, n]));
    for (const n of profile.nodes) for (const c of n.children ?? []) {
      const child = byId.get(c);
      if (child) child.parent = n.id;
    }
    const sourceOf = (f: CallFrame): string => {
      if (!f.url) return f.functionName || '(native)';
      const file = f.url.split('/').pop()?.split('?')[0] ?? '';
      const map = maps.get(file);
      if (!map) return file || f.url;
      const entry = map.findEntry(f.lineNumber, f.columnNumber) as { originalSource?: string };
      return entry.originalSource ? shortSource(entry.originalSource) : file;
    };
    // Sample times on the page's clock: the first sample in the spin is its start.
    const times: number[] = [];
    let clock = 0;
    profile.timeDeltas.forEach((d) => times.push((clock += d / 1000)));
    const inSpin = (id: number) => {
      for (let n = byId.get(id); n; n = n.parent === undefined ? undefined : byId.get(n.parent)) if (n.callFrame.functionName === 'flankfilmCalibrationSpin') return true;
      return false;
    };
    const firstSpin = profile.samples.findIndex(inSpin);
    const offset = firstSpin >= 0 ? spinAt - (times[firstSpin] as number) : NaN;
    const inWindow = new Map<string, number>();
    let windowTotal = 0;
    profile.samples.forEach((id, k) => {
      const at = (times[k] as number) + offset;
      if (!windows.some((w) => at >= w.start && at < w.end)) return;
      const dt = (profile.timeDeltas[k + 1] ?? 0) / 1000;
      const node = byId.get(id);
      if (!node) return;
      windowTotal += dt;
      // Attribute to the nearest frame of a known kind on the stack: our code, a library, or the VM's own.
      let what = node.callFrame.functionName === '(idle)' ? '(idle: waiting, e.g. for the worker)' : sourceOf(node.callFrame);
      let ours: string | null = null;
      for (let n: ProfileNode | undefined = node; n; n = n.parent === undefined ? undefined : byId.get(n.parent)) {
        const name = n.callFrame.functionName;
        if (ours === null && sourceOf(n.callFrame).startsWith('renderer/')) ours = `${name || '(anonymous)'} ${sourceOf(n.callFrame)}`;
        if (name === 'performWorkOnRoot' && ours !== null && !what.startsWith('chart') && !what.startsWith('parse')) { what = `React, in ${ours}`; break; }
        if (name === 'updateInPlace' || name === 'Chart') { what = 'chart.js update/set-up (updateInPlace)'; break; }
        if (name === 'parseReviewValue') { what = 'parse (zod)'; break; }
        if (name === 'meshCharts' || name === 'summarise') { what = 'chart series (meshCharts, summarise)'; break; }
        if (name === 'commitRoot' && !what.startsWith('React, in')) what = 'React commit (DOM changes, effects; less the above)';
        if (name === 'performWorkOnRoot') {
          if (!what.startsWith('React commit')) what = 'React render phase (reconcile; less the above)';
          break;
        }
      }
      inWindow.set(what, (inWindow.get(what) ?? 0) + dt);
    });
    const self = new Map<string, number>();
    const selfFn = new Map<string, number>();
    const inclusive = new Map<string, number>();
    const ours = new Map<string, number>();
    let busy = 0;
    profile.samples.forEach((id, k) => {
      const dt = (profile.timeDeltas[k + 1] ?? 0) / 1000;
      const node = byId.get(id);
      if (!node || node.callFrame.functionName === '(idle)') return;
      busy += dt;
      const src = sourceOf(node.callFrame);
      self.set(src, (self.get(src) ?? 0) + dt);
      const fn = `${node.callFrame.functionName || '(anonymous)'} ${src}`;
      selfFn.set(fn, (selfFn.get(fn) ?? 0) + dt);
      const seen = new Set<string>();
      const seenOurs = new Set<string>();
      for (let n: ProfileNode | undefined = node; n; n = n.parent === undefined ? undefined : byId.get(n.parent)) {
        const name = n.callFrame.functionName;
        const from = sourceOf(n.callFrame);
        if ((from.startsWith('renderer/') || (process.env.PROFILE_CHARTJS && from === 'npm:chart.js')) && name && !seenOurs.has(`${name} ${from}`)) {
          seenOurs.add(`${name} ${from}`);
          ours.set(`${name} ${from}`, (ours.get(`${name} ${from}`) ?? 0) + dt);
        }
        if (INCLUSIVE.includes(name) && !seen.has(name)) {
          seen.add(name);
          inclusive.set(name, (inclusive.get(name) ?? 0) + dt);
        }
      }
    });
    console.log(`inside the edit→chart-updated windows, per edit (ms; ${r1(windowTotal / EDITS)} sampled in all):`);
    for (const [k, v] of [...inWindow.entries()].sort((a, b) => b[1] - a[1]).slice(0, 24)) console.log(`  ${r1(v / EDITS).toString().padStart(6)}  ${k}`);
    console.log(`main thread busy per edit: ${r1(busy / EDITS)} ms (all work while profiling, the bench's own polling included)`);
    console.log('self time per edit by source (ms):');
    for (const [k, v] of [...self.entries()].sort((a, b) => b[1] - a[1]).slice(0, 25)) console.log(`  ${r1(v / EDITS).toString().padStart(6)}  ${k}`);
    console.log('self time per edit by function (ms):');
    for (const [k, v] of [...selfFn.entries()].sort((a, b) => b[1] - a[1]).slice(0, 30)) console.log(`  ${r1(v / EDITS).toString().padStart(6)}  ${k}`);
    console.log('inclusive time per edit (ms):');
    for (const [k, v] of [...inclusive.entries()].sort((a, b) => b[1] - a[1])) console.log(`  ${r1(v / EDITS).toString().padStart(6)}  ${k}`);
    console.log('inclusive time per edit in the renderer\'s own functions (components, hooks; ms):');
    for (const [k, v] of [...ours.entries()].sort((a, b) => b[1] - a[1]).slice(0, 30)) console.log(`  ${r1(v / EDITS).toString().padStart(6)}  ${k}`);
  } finally {
    await browser.close();
    await harness.close();
  }
}

void main().catch((e: unknown) => {
  console.error(e);
  process.exitCode = 1;
});

import { describe, expect, it } from 'vitest';
import type { Locator, Page } from 'playwright-core';
import { DEMO_REVIEWS } from '../../app/review/demo';
import { operatingMaps, type OperatingMapResult } from '../../app/review/operatingMaps';
import { parseReviewValue } from '../../app/review/parse';
import type { Review } from '../../app/review/schema';
import { VERDICT_WORDS } from '../../app/review/vocabulary';
import { MARGIN } from '../../renderer/components/map/drawHeatMap';
import { formatResult } from '../../renderer/units/format';
import { field, openApp, sessionForFile, shootPanel, typeInto, waitForNewResults, edition, WAIT } from './support';

const s = sessionForFile();

const parsed = parseReviewValue(DEMO_REVIEWS['harrow-creek-crusher-hs-pair.flankfilm.json']);
if (!parsed.ok) throw new Error('the demo must parse');
const demo: Review = parsed.review;
const nodeMaps = operatingMaps(demo);
if (!nodeMaps) throw new Error('the sweep was not cancelled');
const OILS = demo.oils.length;
// In the demo both oils' overall verdicts are governed by the hard-rock peak (results.verdicts), case 2 of 3.
const GOVERNING = demo.loadCases.findIndex((c) => c.name === 'Hard-rock peak');
const mapsOf = (all: readonly OperatingMapResult[], li: number) => all.slice(li * OILS, (li + 1) * OILS);

const status = (page: Page) => page.locator('[data-testid=map-status]');
const phase = (page: Page) => status(page).getAttribute('data-phase');

interface Summary {
  rows: number;
  cols: number;
  counts: Record<string, number>;
  cells: { r: number; c: number; lambdaMin: number; scuffingSafety: number | null; integralSafety: number | null; verdict: string }[];
}
/** Chromium's V8 and Node's may differ in the last bits of exp/log/pow: equal to 1e-12 relative. */
const expectClose = (got: number | null | undefined, want: number | null | undefined, what: string) => {
  if (got === null || want === null || got === undefined || want === undefined) return expect(got, what).toBe(want);
  expect(Math.abs(got - want), `${what}: ${got} against ${want}`).toBeLessThanOrEqual(1e-12 * Math.max(1, Math.abs(want)));
};
const summaryOf = async (map: Locator): Promise<Summary> => JSON.parse((await map.getAttribute('data-summary')) ?? '{}') as Summary;

function countsOf(m: OperatingMapResult): Record<string, number> {
  const out: Record<string, number> = { 'aw-suffices': 0, 'ep-warranted': 0, 'beyond-oil': 0 };
  for (const row of m.verdict) for (const v of row) out[v] = (out[v] ?? 0) + 1;
  return out;
}

/** The read-out of the cell under the cursor, as numbers from its data-value attributes. */
async function readout(page: Page) {
  const box = page.locator('[data-testid=map-readout]');
  const num = async (scope: Locator, name: string) => {
    const v = await scope.locator(`[data-name=${name}]`).getAttribute('data-value');
    return v === 'unbounded' ? null : Number(v);
  };
  const oils = [];
  for (const li of await box.locator('li').all()) {
    oils.push({ lambdaMin: await num(li, 'lambdaMin'), scuffingSafety: await num(li, 'scuffingSafety'), integralSafety: await num(li, 'integralSafety'), verdict: await li.locator('[data-name=verdict]').textContent() });
  }
  return { r: Number(await box.getAttribute('data-row')), c: Number(await box.getAttribute('data-col')), temperature: await num(box, 'temperature'), load: await num(box, 'load'), text: await box.innerText(), oils };
}

/** The read-out equals the Node sweep at (r, c) for every oil of the case. */
async function expectCell(page: Page, maps: readonly OperatingMapResult[], r: number, c: number): Promise<void> {
  await expect.poll(async () => [Number(await page.locator('[data-testid=map-readout]').getAttribute('data-row')), Number(await page.locator('[data-testid=map-readout]').getAttribute('data-col'))], { timeout: WAIT }).toEqual([r, c]);
  const got = await readout(page);
  expect(got.temperature).toBe(maps[0]?.temperatures_C[r]);
  expect(got.load).toBe(maps[0]?.loadPercent[c]);
  expect(got.oils).toHaveLength(maps.length);
  maps.forEach((m, i) => {
    const o = got.oils[i];
    expectClose(o?.lambdaMin, m.lambdaMin[r]?.[c], `λmin at ${r},${c}`);
    expectClose(o?.scuffingSafety, m.scuffingSafety[r]?.[c], `SB at ${r},${c}`);
    expectClose(o?.integralSafety, m.integralSafety[r]?.[c], `SintS at ${r},${c}`);
    expect(o?.verdict).toBe(VERDICT_WORDS[m.verdict[r]?.[c] ?? 'beyond-oil']);
  });
}

async function computeMap(page: Page): Promise<void> {
  await page.locator('[data-panel=map]').scrollIntoViewIfNeeded();
  await page.locator('[data-testid=map-compute]').click();
  await expect.poll(() => phase(page), { timeout: WAIT }).toBe('done');
}

describe('the Map panel: oil temperature × load', () => {
  it('computes on demand in a worker: one 60 × 60 heat map per oil for the governing case, as operatingMaps() in Node', async () => {
    const { page } = s;
    expect(await phase(page)).toBe('idle');
    await expect(page.locator('.heatmap').count()).resolves.toBe(0); // nothing is swept until asked for
    await computeMap(page);
    await expect(page.locator('[data-testid=map-progress-text]').count()).resolves.toBe(0);
    expect(Number(await status(page).getAttribute('data-done'))).toBe(demo.loadCases.length * OILS);
    await expect(page.locator('[data-testid=map-case]').inputValue()).resolves.toBe(String(GOVERNING));

    const maps = page.locator('.heatmap');
    await expect(maps.count()).resolves.toBe(OILS);
    const expected = mapsOf(nodeMaps, GOVERNING);
    for (let i = 0; i < OILS; i++) {
      const m = maps.nth(i);
      const node = expected[i] as OperatingMapResult;
      expect(await m.getAttribute('data-map')).toBe(node.oil);
      expect([Number(await m.getAttribute('data-rows')), Number(await m.getAttribute('data-cols'))]).toEqual([60, 60]); // operatingMaps default grid
      const sum = await summaryOf(m);
      expect(sum.counts).toEqual(countsOf(node));
      for (const cell of sum.cells) {
        expectClose(cell.lambdaMin, node.lambdaMin[cell.r]?.[cell.c], `λmin at ${cell.r},${cell.c}`);
        expectClose(cell.scuffingSafety, node.scuffingSafety[cell.r]?.[cell.c], `SB at ${cell.r},${cell.c}`);
        expectClose(cell.integralSafety, node.integralSafety[cell.r]?.[cell.c], `SintS at ${cell.r},${cell.c}`);
        expect(cell.verdict).toBe(node.verdict[cell.r]?.[cell.c]);
      }
    }
    // In service, SB falls below SB,min inside the map: its SB line is drawn; every map has a λ-target line.
    const lines = JSON.parse((await maps.nth(0).getAttribute('data-contours')) ?? '{}') as { sb: number; lambda: number };
    expect(lines.sb).toBeGreaterThan(0);
    expect(lines.lambda).toBeGreaterThan(0);
    // The legend pairs each verdict colour with its word and shape.
    for (const word of Object.values(VERDICT_WORDS)) await expect(page.locator('.map-legend').textContent()).resolves.toContain(word);
    await expect(page.locator('.map-legend .vicon').count()).resolves.toBe(3);
    await expect(page.locator('[data-testid=map-findings]').textContent()).resolves.toMatch(/SB ≥ 1\.5/);
    expect(s.pageErrors).toEqual([]);
  });

  it('hovering a cell and the arrow keys read out its values, the same as the Node sweep', async () => {
    const { page } = s;
    const maps = mapsOf(nodeMaps, GOVERNING);
    const canvas = page.locator('.heatmap canvas').first();
    await canvas.scrollIntoViewIfNeeded();
    const box = await canvas.boundingBox();
    const w = Number(await canvas.getAttribute('data-width'));
    const h = Number(await canvas.getAttribute('data-height'));
    expect(box && w > 0 && h > 0).toBeTruthy();
    const at = (r: number, c: number) => ({
      x: (box?.x ?? 0) + MARGIN.left + ((c + 0.5) * (w - MARGIN.left - MARGIN.right)) / 60,
      y: (box?.y ?? 0) + MARGIN.top + (h - MARGIN.top - MARGIN.bottom) * (1 - (r + 0.5) / 60),
    });
    const p = at(30, 45);
    await page.mouse.move(p.x, p.y);
    await expectCell(page, maps, 30, 45);
    await expect(page.locator('[data-testid=map-readout]').innerText()).resolves.toMatch(/°C and [\d.]+ % load/);

    // Keyboard: focus the map, then move the cursor cell by cell, five with Shift, to the first column with Home.
    await page.locator('.heatmap__plot').first().focus();
    for (let i = 0; i < 3; i++) await page.keyboard.press('ArrowUp');
    await page.keyboard.press('ArrowRight');
    await expectCell(page, maps, 33, 46);
    await page.keyboard.press('Shift+ArrowLeft');
    await page.keyboard.press('ArrowDown');
    await expectCell(page, maps, 32, 41);
    await page.keyboard.press('Home');
    await expectCell(page, maps, 32, 0);
    for (let i = 0; i < 70; i++) await page.keyboard.press('Shift+ArrowUp'); // held at the edge
    await expectCell(page, maps, 59, 0);
    await page.keyboard.press('End');
    await expectCell(page, maps, 59, 59);
    await page.mouse.move(at(29, 43).x, at(29, 43).y);
    await expectCell(page, maps, 29, 43);
    await shootPanel(page, 'map');

    // US customary: the same cell reads in °F (°F = 1.8 °C + 32, NIST SP 811 B.9).
    await page.locator('[data-testid=units-us]').check();
    await expect.poll(() => page.locator('[data-testid=map-readout]').innerText(), { timeout: WAIT }).toContain('°F');
    const tF = (maps[0]?.temperatures_C[29] ?? 0) * 1.8 + 32;
    await expect(page.locator('[data-testid=map-readout] [data-name=temperature]').innerText()).resolves.toBe(`${formatResult(tF, 3)} °F`);
    await page.locator('[data-testid=units-si]').check();
    await expect.poll(() => page.locator('[data-testid=map-readout]').innerText(), { timeout: WAIT }).toContain('°C');
  });

  it('once computed, it follows the review: an edit re-sweeps (debounced) and matches Node for the edited review', async () => {
    const { page } = s;
    const path = `loadCases[${GOVERNING}].pinionTorque_Nm`;
    await expect(page.locator('[data-testid=units-si]').isChecked()).resolves.toBe(true); // the torque is typed in N·m
    const t0 = Number(await field(page, path).inputValue());
    const t1 = Number((1.15 * t0).toFixed(1));
    const e0 = await edition(page);
    await typeInto(field(page, path), String(t1));
    const e1 = await waitForNewResults(page, e0);
    await expect.poll(async () => Number(await page.locator('.map').getAttribute('data-edition')), { timeout: WAIT }).toBe(e1);
    await expect.poll(() => phase(page), { timeout: WAIT }).toBe('done');
    // The file now gives this case's torque, not its power (reviewState: the one typed last is given).
    const edited: Review = { ...demo, loadCases: demo.loadCases.map((c, i) => (i === GOVERNING ? { ...c, power_kW: undefined, pinionTorque_Nm: t1 } : c)) };
    const after = operatingMaps(edited, { loads: 60, temperatures: 60 });
    const expected = mapsOf(after ?? [], GOVERNING);
    for (let i = 0; i < OILS; i++) {
      const sum = await summaryOf(page.locator('.heatmap').nth(i));
      expect(sum.counts).toEqual(countsOf(expected[i] as OperatingMapResult));
      expect(sum.counts).not.toEqual(countsOf(mapsOf(nodeMaps, GOVERNING)[i] as OperatingMapResult)); // 15 % more torque moves the verdict boundary
    }
  });

  it('Cancel stops the sweep: the progress stops, "cancelled" shows, and later edits do not restart it', async () => {
    const { page } = s;
    const sweptEdition = await page.locator('.map').getAttribute('data-edition');
    // Click Compute, then Cancel before any task runs: React commits a click in a microtask, and
    // no worker message (a task) can be handled in between, so the sweep cannot finish first.
    const seen = await page.evaluate(async () => {
      const compute = document.querySelector<HTMLButtonElement>('[data-testid=map-compute]');
      const cancel = document.querySelector<HTMLButtonElement>('[data-testid=map-cancel]');
      if (!compute || !cancel) return null;
      compute.click();
      for (let i = 0; i < 100 && cancel.disabled; i++) await Promise.resolve();
      const running = document.querySelector('[data-testid=map-status]')?.getAttribute('data-phase');
      const cancelEnabled = !cancel.disabled;
      cancel.click();
      return { running, cancelEnabled };
    });
    expect(seen).toEqual({ running: 'running', cancelEnabled: true });
    await expect.poll(() => phase(page), { timeout: WAIT }).toBe('cancelled');
    const progress = page.locator('[data-testid=map-progress]');
    const stopped = await progress.getAttribute('value');
    await expect(page.locator('[data-testid=map-progress-text]').textContent()).resolves.toMatch(/^Cancelled: \d of 6 maps$/);
    await page.waitForTimeout(2000); // the sweep takes about 0.3 s: a worker still running would have finished by now
    expect(await phase(page)).toBe('cancelled');
    expect(await progress.getAttribute('value')).toBe(stopped);
    expect(await page.locator('.map').getAttribute('data-edition')).toBe(sweptEdition); // the last complete map stays
    await expect(page.locator('[data-testid=map-cancel]').isDisabled()).resolves.toBe(true);

    // Cancelled means no more sweeps until asked: an edit (past the debounce) leaves the map alone.
    const e0 = await edition(page);
    await typeInto(field(page, 'loadCases[0].oilTemperature_C'), '61');
    await waitForNewResults(page, e0);
    await page.waitForTimeout(1500);
    expect(await phase(page)).toBe('cancelled');
    await expect(status(page).textContent()).resolves.toContain('earlier edit');
    await shootPanel(page, 'map', 'map-cancelled');
    expect(s.pageErrors).toEqual([]);
  });

  it('dark theme: the map follows the OS colour scheme', async () => {
    const dark = await openApp(s.browser, { colorScheme: 'dark' });
    try {
      await computeMap(dark.page);
      await dark.page.locator('.heatmap__plot').nth(1).focus();
      await dark.page.keyboard.press('ArrowUp');
      await expect.poll(() => dark.page.locator('[data-testid=map-readout]').getAttribute('data-row'), { timeout: WAIT }).not.toBeNull();
      const bg = await dark.page.evaluate(() => {
        const c = document.querySelector<HTMLCanvasElement>('.heatmap canvas');
        const px = c?.getContext('2d')?.getImageData(2, 2, 1, 1).data;
        return px ? [...px.slice(0, 3)] : null;
      });
      expect(Math.max(...(bg ?? [255]))).toBeLessThan(60); // the canvas is painted with the dark sheet colour
      await shootPanel(dark.page, 'map', 'dark-map');
      expect(dark.pageErrors).toEqual([]);
    } finally {
      await dark.close();
    }
  });
});

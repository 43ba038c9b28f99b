import { describe, expect, it } from 'vitest';
import { chartSummary, sessionForFile, shootPanel } from './support';

const s = sessionForFile();

describe('Mesh charts that read at a glance', () => {
  it('one stacked strip sharing the A–E axis: every plot the same width at the same place, its figures beside it', async () => {
    const { page } = s;
    const boxes = await page.locator('[data-panel=mesh] .mesh-chart__plot').evaluateAll((els) => els.map((e) => e.getBoundingClientRect()).map((r) => ({ left: Math.round(r.left), width: Math.round(r.width), top: Math.round(r.top) })));
    expect(boxes).toHaveLength(6);
    for (const b of boxes) {
      expect(b.left).toBe(boxes[0]!.left);
      expect(b.width).toBe(boxes[0]!.width);
    }
    for (let i = 1; i < boxes.length; i++) expect(boxes[i]!.top).toBeGreaterThan(boxes[i - 1]!.top);
    // The y axes have one width, so the A–E markers line up down the strip: the Hertz tooltip's
    // position at the plot's middle is the same on every chart.
    const mid = async (id: string) => {
      const canvas = page.locator(`[data-chart=${id}] canvas`);
      await canvas.scrollIntoViewIfNeeded();
      const box = (await canvas.boundingBox())!;
      await page.mouse.move(box.x + box.width * 0.5, box.y + box.height * 0.6);
      await expect.poll(() => canvas.getAttribute('data-tooltip')).toMatch(/Position/);
      return (await canvas.getAttribute('data-tooltip'))!.match(/Position \(mm\): ([\d.]+)/)![1];
    };
    expect(await mid('flash')).toBe(await mid('hertz'));
    await expect(page.locator('[data-testid=figures-temperature]').textContent()).resolves.toMatch(/θB,max.*°C/);
    await shootPanel(page, 'mesh', 'mesh-strip');
  });

  it('in service and proposed on the same charts: θB against θS on one axis, θfl apart, λ with its regimes, hmin apart', async () => {
    const { page } = s;
    const temp = (await chartSummary(page, 'temperature')).map((x) => x.label);
    // The EP oil is above FZG stage 12: its θS is no limit, so it is not drawn, and its figure says so.
    expect(temp).toEqual(['θB ISO VG 220 R&O mineral', 'θS ISO VG 220 R&O mineral', 'θB ISO VG 320 EP mineral']);
    await expect(page.locator('[data-testid=figures-temperature]').textContent()).resolves.toContain('above stage 12: not limiting');
    expect((await chartSummary(page, 'flash')).map((x) => x.label)).toEqual(['θfl ISO VG 220 R&O mineral', 'θfl ISO VG 320 EP mineral']);
    expect((await chartSummary(page, 'film')).map((x) => x.label)).toEqual(['λ ISO VG 220 R&O mineral', 'λ ISO VG 320 EP mineral']);
    expect((await chartSummary(page, 'hmin')).length).toBe(2);
    // the heavier grade gives the thicker film at the same case
    const [l220, l320] = await chartSummary(page, 'film');
    expect(l320!.min!).toBeGreaterThan(l220!.min!);
    expect(s.pageErrors).toEqual([]);
  });
});

describe('grade finder', () => {
  it('draws λmin against ISO VG with the target line, and says which grades the lubrication method leaves out and why', async () => {
    const { page } = s;
    const charts = page.locator('[data-testid=grade-chart]');
    await expect(charts.count()).resolves.toBeGreaterThan(0);
    const usable = (await charts.first().getAttribute('data-usable'))!.split(',').map(Number);
    // The crusher demo runs dip lubricated at 7.36 m/s pitch-line velocity: VG 680 at most (common practice, app/review/gradeLimits.ts).
    expect(Math.max(...usable)).toBe(680);
    await expect(page.locator('[data-testid=grades-left-out]').first().textContent()).resolves.toMatch(/above ISO VG 680 are left out: dip lubrication .* churn/);
    await expect(charts.first().locator('canvas').getAttribute('aria-label')).resolves.toMatch(/target 1/);
    await shootPanel(page, 'side-by-side', 'grade-finder');
  });
});

import { describe, expect, it } from 'vitest';
import { chartSummary, edition, field, resultValue, shootPanel, typeInto, waitForNewResults, sessionForFile, WAIT } from './support';

const TORQUE = 'loadCases[0].pinionTorque_Nm';
const PANELS = ['gear-pair', 'duty', 'oils', 'policy', 'verdict', 'side-by-side', 'mesh', 'map', 'sign-off'];

const s = sessionForFile();

describe('open the demo, change the torque', () => {
  it('opens the invented demo with every panel and a screenshot of each', async () => {
    const { page } = s;
    await expect.poll(() => page.locator('.topbar__title').textContent()).toContain('Harrow Creek');
    for (const id of PANELS) {
      await expect(page.locator(`[data-panel="${id}"]`).count()).resolves.toBe(1);
      await shootPanel(page, id, id === 'map' ? 'map-idle' : id); // map.png, with the maps drawn, is map.test.ts's
    }
    // Four charts along the path, A to E marked.
    await expect(page.locator('[data-chart]').count()).resolves.toBe(6);
    // The demo has two oils and three load cases: six case verdicts, each with a verdict word.
    await expect(page.locator('[data-testid=case-verdict] .vbadge').count()).resolves.toBe(6);
    // The caution to defer to the maker, codes and a licensed engineer is on screen.
    await expect(page.locator('[data-caution=defer]').first().isVisible()).resolves.toBe(true);
  });

  it('doubling T1 raises σH,max by √2 in the figures and the chart, and the verdict follows', async () => {
    const { page } = s;
    const hertz = page.locator('[data-testid=mesh-max-hertz]');
    const before = await resultValue(hertz);
    const chartBefore = (await chartSummary(page, 'hertz'))[0];
    const velocityBefore = await chartSummary(page, 'velocity');
    const sbBefore = await resultValue(page.locator('[data-testid=sbs-sb]').first());
    const reasonsBefore = await page.locator('[data-testid=case-verdict]').first().locator('.reasons').textContent();
    expect(chartBefore?.max ?? 0).toBeCloseTo(before, 6); // the chart plots the same path as the figure

    const t0 = Number(await field(page, TORQUE).inputValue());
    expect(t0).toBeGreaterThan(0);
    const e0 = await edition(page);
    await typeInto(field(page, TORQUE), (2 * t0).toFixed(3));
    await waitForNewResults(page, e0);
    await expect.poll(() => resultValue(hertz), { timeout: WAIT }).not.toBe(before);

    const after = await resultValue(hertz);
    // Hertz line contact: p = √(w E*/(π ρ)), so p ∝ √T1 at the same sharing (METHODS.md §4; Johnson, Contact Mechanics §4.2 [memory]).
    expect(after / before).toBeCloseTo(Math.SQRT2, 2);
    const chartAfter = (await chartSummary(page, 'hertz'))[0];
    expect(chartAfter?.max ?? 0).toBeCloseTo(after, 6);
    expect(chartAfter?.n).toBe(chartBefore?.n);
    // Speed is unchanged, so the kinematics are too.
    expect(await chartSummary(page, 'velocity')).toEqual(velocityBefore);
    // A heavier load gives a hotter contact: the flash safety falls.
    expect(await resultValue(page.locator('[data-testid=sbs-sb]').first())).toBeLessThan(sbBefore);
    const reasonsAfter = await page.locator('[data-testid=case-verdict]').first().locator('.reasons').textContent();
    expect(reasonsAfter).not.toBe(reasonsBefore);
    // The file keeps torque now, not power: the power field follows from it.
    await expect(page.locator('#f-loadCases-0--power_kW-note').textContent()).resolves.toBe('from the torque');
    expect(s.pageErrors).toEqual([]);
  });

  it('hovering a chart shows the values in a tooltip', async () => {
    const { page } = s;
    const canvas = page.locator('[data-chart=hertz] canvas');
    await canvas.scrollIntoViewIfNeeded();
    const box = await canvas.boundingBox();
    expect(box).not.toBeNull();
    await page.mouse.move((box?.x ?? 0) + (box?.width ?? 0) / 2, (box?.y ?? 0) + (box?.height ?? 0) / 2);
    await expect.poll(() => canvas.getAttribute('data-tooltip'), { timeout: WAIT }).toMatch(/Position \(mm\): [\d.]+ \| σH: \d/);
    const value = Number((await canvas.getAttribute('data-tooltip'))?.match(/σH: ([\d.]+)/)?.[1]);
    const [hertz] = await chartSummary(page, 'hertz');
    expect(value).toBeGreaterThanOrEqual((hertz?.min ?? 0) * 0.999);
    expect(value).toBeLessThanOrEqual((hertz?.max ?? 0) * 1.001);
  });
});

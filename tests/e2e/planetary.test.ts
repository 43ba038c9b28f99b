import { describe, expect, it } from 'vitest';
import { edition, shootPanel, waitForNewResults, sessionForFile, WAIT } from './support';

const s = sessionForFile();

describe('gear set: a planetary stage on screen', () => {
  it('choosing "planetary stage" first turns the pair into a stage with sun, planet and ring, and both meshes appear', async () => {
    const { page } = s;
    await expect.poll(() => page.locator('.topbar__title').textContent()).toContain('Harrow Creek');
    const e0 = await edition(page);
    await page.locator('[data-path="gearSet"]').selectOption({ label: 'Planetary stage (sun, planets, ring)' });
    await waitForNewResults(page, e0);
    for (const p of ['planetary.sun.teeth', 'planetary.planet.teeth', 'planetary.ring.teeth', 'planetary.planets', 'loadCases[0].sunSpeed_rpm']) {
      await expect(page.locator(`[data-path="${p}"]`).count()).resolves.toBe(1);
    }
    // The mesh selector offers both meshes; the side-by-side table has a mesh column.
    const meshSelect = page.locator('[data-testid=mesh-mesh]');
    await expect.poll(() => meshSelect.locator('option').allTextContents(), { timeout: WAIT }).toEqual(['sun–planet', 'planet–ring']);
    await expect(page.locator('[data-panel="side-by-side"] th', { hasText: 'Mesh' }).count()).resolves.toBe(1);
    const hertz = page.locator('[data-testid=mesh-max-hertz]');
    const sun = await hertz.textContent();
    await meshSelect.selectOption('planet-ring');
    await expect.poll(() => hertz.textContent()).not.toBe(sun);
    await shootPanel(page, 'gear-pair', 'gear-set-planetary');
    await shootPanel(page, 'mesh', 'mesh-planet-ring');
    expect(s.pageErrors).toEqual([]);
  });
});

import { describe, expect, it } from 'vitest';
import { edition, field, resultValue, sessionForFile, shootPanel, waitForNewResults, WAIT } from './support';

const s = sessionForFile();

describe('micropitting on screen (ISO/TS 6336-22)', () => {
  it('the demo oils give no micropitting stage: the Mesh panel and the side-by-side table say the finding is unknown', async () => {
    const { page } = s;
    await expect.poll(() => page.locator('[data-testid=mesh-micropitting-finding] .qty__val').textContent(), { timeout: WAIT }).toMatch(/unknown: micropitting stage not given/);
    await expect(page.locator('[data-testid=sbs-micropitting-finding]').count()).resolves.toBe(6);
    await expect(page.locator('[data-testid=sbs-micropitting-stage] .qty__val').first().textContent()).resolves.toMatch(/^(\d+|above 10)$/);
  });

  it('giving the proposed oil a micropitting failure stage gives Sλ with pass or fail in words', async () => {
    const { page } = s;
    const e0 = await edition(page);
    await field(page, 'oils[1].micropittingFailureStage').selectOption({ label: '9' });
    await waitForNewResults(page, e0);
    const proposed = page.locator('[data-testid=sbs-micropitting]').nth(3); // a row per oil, a cell per load case (three): the proposed oil's first cell
    await expect.poll(() => proposed.getAttribute('data-value'), { timeout: WAIT }).not.toBeNull();
    expect(await resultValue(proposed)).toBeGreaterThan(0);
    const words = await page.locator('[data-testid=sbs-micropitting-finding] .qty__val').allTextContents();
    expect(words.some((w) => /^(meets|short: a higher micropitting class is needed) \(Sλ [≥<] 1\)$/.test(w))).toBe(true);
    await shootPanel(page, 'side-by-side', 'side-by-side-micropitting');
    expect(s.pageErrors).toEqual([]);
  });
});

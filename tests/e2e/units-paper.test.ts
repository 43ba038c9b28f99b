import { describe, expect, it } from 'vitest';
import { edition, field, sessionForFile, typeInto, waitForNewResults, WAIT } from './support';

const s = sessionForFile();

describe('US customary: diametral pitch, and the record paper never changed silently', () => {
  it('switching to US units moves the paper to Letter and says so; a chosen paper stays', async () => {
    const { page } = s;
    await expect(page.locator('[data-testid=paper]').inputValue()).resolves.toBe('a4');
    await page.locator('[data-testid=units-us]').check();
    await expect(page.locator('[data-testid=paper]').inputValue()).resolves.toBe('letter');
    await expect(page.locator('[data-testid=notice]').textContent()).resolves.toMatch(/paper is now Letter, with the US customary units/);
    // Once chosen, the paper no longer follows the units, and nothing is said.
    await page.locator('[data-testid=paper]').selectOption('a4');
    await page.locator('[data-testid=units-si]').check();
    await page.locator('[data-testid=units-us]').check();
    await expect(page.locator('[data-testid=paper]').inputValue()).resolves.toBe('a4');
  });

  it('the normal diametral pitch sits beside the module: Pnd = 25.4 / mn', async () => {
    const { page } = s;
    const pitch = field(page, 'gearPair.normalDiametralPitch');
    // The crusher demo's mn = 4 mm: Pnd = 25.4 / 4 = 6.35 1/in.
    await expect(pitch.inputValue()).resolves.toBe('6.35');
    const e0 = await edition(page);
    await typeInto(pitch, '5');
    await pitch.press('Enter');
    await waitForNewResults(page, e0);
    // Pnd = 5 1/in → mn = 25.4 / 5 = 5.08 mm = 0.2 in, as the module field shows it in US units.
    await expect.poll(() => field(page, 'gearPair.normalModule_mm').inputValue(), { timeout: WAIT }).toBe('0.2');
    expect(s.pageErrors).toEqual([]);
  });
});

describe('reasons and cautions follow the display units', () => {
  it('in US customary, a reason reads °F where the engine wrote °C', async () => {
    const { page } = s;
    await page.locator('[data-testid=units-us]').check();
    const reasons = await page.locator('details.reasons-box[open] .reasons').first().innerText();
    expect(reasons).toMatch(/\d °F/);
    expect(reasons).not.toMatch(/\d °C/);
    await page.locator('[data-testid=units-si]').check();
    await expect(page.locator('details.reasons-box[open] .reasons').first().innerText()).resolves.toMatch(/\d °C/);
  });
});

import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { chartSummary, field, resultValue, shootPanel, sessionForFile, WAIT } from './support';

const s = sessionForFile();

/** Every numeric input's text, by review path. */
async function numberInputs(page: Page): Promise<Record<string, string>> {
  return page.evaluate(() =>
    Object.fromEntries([...document.querySelectorAll<HTMLInputElement>('input[inputmode=decimal][data-path]')].map((i) => [i.dataset.path ?? '', i.value])),
  );
}
const unitOf = (page: Page, path: string) => page.locator(`[data-path="${path}"] + .field__unit`).textContent();
const shownResult = (page: Page, testId: string) => page.locator(`[data-testid=${testId}] .qty__val`).textContent();

// Exact factors: 1 in = 25.4 mm; 1 lbf·in = 0.1129848290276167 N·m; 1 hp = 0.7456998715822702 kW;
// 1 lb/ft³ = 16.01846337396014 kg/m³ (NIST SP 811, appendix B.9); °F = 1.8 °C + 32; 1 ksi = 6.894757293168361 MPa.
// The demo gives power, so T1 is a derived readout (six digits); every stored input converts to 1e-9.
const CHECKS: [string, string, (si: number) => number, number?][] = [
  ['gearPair.faceWidth_mm', 'in', (mm) => mm / 25.4],
  ['gearPair.normalModule_mm', 'in', (mm) => mm / 25.4],
  ['gearPair.pinion.roughnessRa_um', 'µin', (um) => um / 0.0254],
  ['loadCases[0].pinionTorque_Nm', 'lbf·in', (nm) => nm / 0.1129848290276167, 1e-5],
  ['loadCases[0].power_kW', 'hp', (kw) => kw / 0.7456998715822702],
  ['loadCases[0].oilTemperature_C', '°F', (c) => c * 1.8 + 32],
  ['oils[0].kv40_mm2s', 'cSt', (v) => v],
  ['oils[0].density15_kgm3', 'lb/ft³', (rho) => rho / 16.01846337396014],
  ['policy.temperatureRange_C[1]', '°F', (c) => c * 1.8 + 32],
];

describe('SI / US customary', () => {
  it('converts every displayed input and result consistently, and back to the same text', async () => {
    const { page } = s;
    const si = await numberInputs(page);
    expect(Object.keys(si).length).toBeGreaterThan(40);
    const hertzSi = await resultValue(page.locator('[data-testid=mesh-max-hertz]'));
    const hertzShownSi = Number(await shownResult(page, 'mesh-max-hertz'));
    expect(await unitOf(page, 'gearPair.faceWidth_mm')).toBe('mm');

    await page.locator('[data-testid=units-us]').check();
    await expect.poll(() => unitOf(page, 'gearPair.faceWidth_mm'), { timeout: WAIT }).toBe('in');
    const us = await numberInputs(page);
    for (const [path, unit, convert, tolerance = 1e-9] of CHECKS) {
      expect(await unitOf(page, path), path).toBe(unit);
      const expected = convert(Number(si[path]));
      expect(Math.abs(Number(us[path]) - expected) / Math.abs(expected), `${path}: ${si[path]} → ${us[path]} ${unit}`).toBeLessThan(tolerance);
    }
    // Inputs without a unit to convert keep their text (teeth, factors, angles).
    expect(us['gearPair.pinion.teeth']).toBe(si['gearPair.pinion.teeth']);
    expect(us['loadCases[0].applicationFactor']).toBe(si['loadCases[0].applicationFactor']);
    // Results too: σH,max in ksi, same underlying value.
    await expect(page.locator('[data-testid=mesh-max-hertz] .qty__unit').textContent()).resolves.toContain('ksi');
    expect(Number(await shownResult(page, 'mesh-max-hertz'))).toBeCloseTo(hertzShownSi / 6.894757293168361, 0);
    expect(await resultValue(page.locator('[data-testid=mesh-max-hertz]'))).toBe(hertzSi);
    // Charts are drawn in the chosen units: the path axis in inches.
    const [hertzUs] = await chartSummary(page, 'hertz');
    expect((hertzUs?.max ?? 0) / (hertzSi / 6.894757293168361)).toBeCloseTo(1, 6);
    await shootPanel(page, 'duty', 'duty-us');
    await shootPanel(page, 'mesh', 'mesh-us');

    await page.locator('[data-testid=units-si]').check();
    await expect.poll(() => unitOf(page, 'gearPair.faceWidth_mm'), { timeout: WAIT }).toBe('mm');
    expect(await numberInputs(page)).toEqual(si);
    expect(s.pageErrors).toEqual([]);
  });

  it('a value typed in US units is stored in file units (2.5 in face width = 63.5 mm)', async () => {
    const { page } = s;
    await page.locator('[data-testid=units-us]').check();
    const width = field(page, 'gearPair.faceWidth_mm');
    await width.fill('2.5');
    await page.locator('[data-testid=units-si]').check();
    await expect.poll(() => width.inputValue(), { timeout: WAIT }).toBe('63.5'); // 2.5 × 25.4 mm exactly
  });
});

import { describe, expect, it } from 'vitest';
import { viscosityIndex } from '../../app/engine/oil/viscosityIndex';
import { centistokes } from '../../app/engine/units';
import { edition, field, sessionForFile, shootPanel, typeInto, waitForNewResults, WAIT } from './support';

const s = sessionForFile();

describe('entry that never lies', () => {
  it('the status line drops "Opened the demo" at the first edit', async () => {
    const { page } = s;
    await expect(page.locator('[data-testid=notice]').textContent()).resolves.toContain('Opened the invented demo review');
    await typeInto(field(page, 'loadCases[0].name'), 'Normal duty');
    await expect.poll(() => page.locator('[data-testid=notice]').count()).toBe(0);
  });

  it('typing "1600" computes 1600 once, never "1", "16" or "160"; "computing" shows until then', async () => {
    const { page } = s;
    const speed = field(page, 'loadCases[0].pinionSpeed_rpm');
    // Settle first: the name typed before commits per keystroke, and its recomputes may still be arriving.
    await page.locator('.computing').waitFor({ state: 'detached', timeout: WAIT });
    const e0 = await edition(page);
    await speed.click();
    await speed.press('Control+A');
    await speed.pressSequentially('1600', { delay: 40 });
    // the typed text is not yet taken: the sheet says so
    await expect(page.locator('[data-testid=computing]').textContent()).resolves.toContain('computing');
    const e1 = await waitForNewResults(page, e0);
    expect(e1).toBe(e0 + 1); // one edit for four keystrokes
    await expect(speed.inputValue()).resolves.toBe('1600');
    // Power follows the torque at the new speed (P = T·2πn/60): the crusher demo gives power, so the torque moves.
    const power = Number(await field(page, 'loadCases[0].power_kW').inputValue());
    const torque = Number(await field(page, 'loadCases[0].pinionTorque_Nm').inputValue());
    expect((torque * 2 * Math.PI * 1600) / 60 / 1000).toBeCloseTo(power, 2);
  });

  it('Enter takes the value at once, without waiting for the pause', async () => {
    const { page } = s;
    const temp = field(page, 'loadCases[0].oilTemperature_C');
    await page.locator('.computing').waitFor({ state: 'detached', timeout: WAIT });
    const e0 = await edition(page);
    await temp.click();
    await temp.press('Control+A');
    await temp.pressSequentially('62');
    await temp.press('Enter');
    expect(await waitForNewResults(page, e0)).toBe(e0 + 1);
  });

  it('letters typed into the torque leave the power alone', async () => {
    const { page } = s;
    const power = field(page, 'loadCases[0].power_kW');
    const before = await power.inputValue();
    expect(before).not.toBe('');
    const torque = field(page, 'loadCases[0].pinionTorque_Nm');
    await torque.click();
    await torque.press('End');
    await torque.pressSequentially('x');
    await torque.press('Tab');
    await expect.poll(() => torque.getAttribute('aria-invalid')).toBe('true');
    await expect(power.inputValue()).resolves.toBe(before);
    await torque.press('Backspace').catch(() => undefined);
    await typeInto(power, before);
    await power.press('Tab');
    await expect.poll(() => torque.getAttribute('aria-invalid'), { timeout: WAIT }).toBe('false');
  });

  it('the VI follows new viscosities by ASTM D2270 unless the user typed one', async () => {
    const { page } = s;
    const vi = field(page, 'oils[0].viscosityIndex');
    // The demo's data sheet gives VI 97 for 220/19 mm²/s.
    await expect(vi.inputValue()).resolves.toBe('97');
    const kv100 = field(page, 'oils[0].kv100_mm2s');
    await typeInto(kv100, '21');
    await kv100.press('Tab');
    const expected = viscosityIndex(centistokes(220), centistokes(21)).value; // ASTM D2270 procedure B above VI 100
    await expect.poll(() => vi.inputValue(), { timeout: WAIT }).toBe(String(expected));
    const noteId = await vi.getAttribute('aria-describedby');
    await expect(page.locator(`[id="${noteId ?? ''}"]`).textContent()).resolves.toContain('computed by ASTM D2270');
    // typed by the user: it stays through a new viscosity, and the field says what D2270 gives
    await typeInto(vi, '90');
    await vi.press('Tab');
    await typeInto(kv100, '20');
    await kv100.press('Tab');
    await expect.poll(() => vi.inputValue()).toBe('90');
    const id2 = await vi.getAttribute('aria-describedby');
    await expect(page.locator(`[id="${id2 ?? ''}"]`).textContent()).resolves.toMatch(/entered; ASTM D2270 gives \d+/);
    await shootPanel(page, 'oils', 'oils-vi');
  });

  it('"Add load case" starts a case that waits for its load; shares not adding to 1 are said at the field, with an offer to normalise', async () => {
    const { page } = s;
    await page.getByRole('button', { name: 'Add load case' }).click();
    const name = field(page, 'loadCases[3].name');
    await expect.poll(() => name.evaluate((e) => e === document.activeElement)).toBe(true);
    await expect(name.inputValue()).resolves.toBe('Load case 4');
    // the machine's speed comes from the case before; the load is for the user to enter
    await expect(field(page, 'loadCases[3].pinionSpeed_rpm').inputValue()).resolves.toBe(await field(page, 'loadCases[2].pinionSpeed_rpm').inputValue());
    await expect(field(page, 'loadCases[3].pinionTorque_Nm').inputValue()).resolves.toBe('');
    await expect(field(page, 'loadCases[3].timeShare').getAttribute('aria-invalid')).resolves.toBe('true'); // the demo's shares already fill the time
    await typeInto(field(page, 'loadCases[3].power_kW'), '150');
    const share = field(page, 'loadCases[3].timeShare');
    await typeInto(share, '0.1');
    await share.press('Tab');
    await expect.poll(() => page.locator('[data-testid=share-sum]').textContent()).toMatch(/add up to 1\.1, not 1/);
    const noteId = await field(page, 'loadCases[0].timeShare').getAttribute('aria-describedby');
    await expect(page.locator(`[id="${noteId ?? ''}"]`).textContent()).resolves.toMatch(/add up to 1\.1/);
    await page.getByRole('button', { name: /Normalise the shares/ }).click();
    await expect.poll(() => page.locator('[data-testid=share-sum]').count()).toBe(0);
    const shares = await Promise.all([0, 1, 2, 3].map(async (i) => Number(await field(page, `loadCases[${i}].timeShare`).inputValue())));
    expect(shares.reduce((a, b) => a + b, 0)).toBeCloseTo(1, 3);
    await shootPanel(page, 'duty', 'duty-shares');
  });

  it('the unsaved marker stays in view beside a long title', async () => {
    const { page } = s;
    const long = 'Bucket-elevator reducer, first stage, change from the in-service R&O oil to an EP oil of the next grade up, '.repeat(2).slice(0, 190);
    await page.getByLabel('Review title').fill(long);
    const mark = page.locator('[data-testid=unsaved]');
    await expect(mark.isVisible()).resolves.toBe(true);
    const box = await mark.boundingBox();
    const width = page.viewportSize()?.width ?? 0;
    expect(box && box.x >= 0 && box.x + box.width <= width).toBe(true);
    expect(s.pageErrors).toEqual([]);
  });
});

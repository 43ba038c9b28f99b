import { describe, expect, it } from 'vitest';
import type { Locator, Page } from 'playwright-core';
import { edition, field, resultValue, shootPanel, typeInto, waitForNewResults, sessionForFile, WAIT } from './support';

const s = sessionForFile();

/** The inline message that describes an input (aria-describedby), or null. */
async function messageOf(page: Page, input: Locator): Promise<string | null> {
  const id = await input.getAttribute('aria-describedby');
  return id ? page.locator(`#${id}`).textContent() : null;
}

describe('an invalid entry', () => {
  it('text that is not a number: a message at the field, no crash, the last valid results stay', async () => {
    const { page } = s;
    const hertz = page.locator('[data-testid=mesh-max-hertz]');
    const torque = field(page, 'loadCases[0].pinionTorque_Nm');
    const e0 = await edition(page);
    await typeInto(torque, '1200');
    await waitForNewResults(page, e0);
    const before = await resultValue(hertz);
    // One more keystroke makes it text: the results of 1200 N·m must stay.
    await torque.press('End');
    await torque.pressSequentially('x');
    await expect.poll(() => messageOf(page, torque), { timeout: WAIT }).toContain('enter a number');
    await expect(torque.getAttribute('aria-invalid')).resolves.toBe('true');
    await expect.poll(() => page.locator('.sheet__findings').getAttribute('data-stale')).toBe('true');
    await expect(page.locator('.stale-note').textContent()).resolves.toContain('last valid entry');
    expect(await resultValue(hertz)).toBe(before);
    await expect(page.locator('[data-testid=export-record]').isDisabled()).resolves.toBe(true);
    await shootPanel(page, 'duty', 'duty-invalid');
  });

  it('a value the schema refuses: the schema’s own message at the field', async () => {
    const { page } = s;
    const torque = field(page, 'loadCases[0].pinionTorque_Nm');
    await typeInto(torque, '-5');
    // app/review/schema.ts: pinionTorque_Nm must be at least 0.001 N·m (one message, not one per check it fails).
    await expect.poll(() => messageOf(page, torque), { timeout: WAIT }).toContain('must be at least 0.001 N·m');
    // The summary names the field in words (panel, load case, label), never by its path; a click goes to it.
    const problems = page.locator('[data-testid=problems]');
    await expect(problems.textContent()).resolves.toContain('Duty · Normal crushing: Pinion torque T1: must be at least 0.001 N·m');
    await expect(problems.locator('li').count()).resolves.toBe(1);
    await expect(problems.textContent()).resolves.not.toMatch(/loadCases|\[0\]|_Nm/);
    await problems.getByRole('button', { name: /Pinion torque/ }).click();
    await expect.poll(() => page.evaluate(() => document.activeElement?.getAttribute('data-path'))).toBe('loadCases[0].pinionTorque_Nm');
    const teeth = field(page, 'gearPair.pinion.teeth');
    await typeInto(teeth, '4');
    await expect.poll(() => messageOf(page, teeth), { timeout: WAIT }).toContain('must be at least 5 teeth');
    await typeInto(teeth, '23');
    await expect.poll(() => teeth.getAttribute('aria-invalid')).toBe('false');
  });

  it('a value the physics refuses (EngineInputError): its message at its field', async () => {
    const { page } = s;
    const e0 = await edition(page);
    const torque = field(page, 'loadCases[0].pinionTorque_Nm');
    await typeInto(torque, '1500');
    await waitForNewResults(page, e0);
    await expect.poll(() => page.locator('.sheet__findings').getAttribute('data-stale')).toBe('false');
    const good = await resultValue(page.locator('[data-testid=mesh-max-hertz]'));

    const centre = field(page, 'gearPair.centerDistance_mm');
    await typeInto(centre, '100');
    // Base circles of 4 mm module, 23/88 teeth overlap at a = 100 mm: the geometry raises EngineInputError for this field.
    await expect.poll(() => messageOf(page, centre), { timeout: WAIT }).toMatch(/The centre distance 100\.000 mm is impossible/);
    await expect(page.locator('[data-testid=engine-error]').textContent()).resolves.toMatch(/^Gear set: Centre distance a: The centre distance 100\.000 mm is impossible/);
    await expect(page.locator('[data-testid=engine-error]').textContent()).resolves.not.toContain('centerDistance_mm');
    await expect.poll(() => page.locator('.sheet__findings').getAttribute('data-stale')).toBe('true');
    expect(await resultValue(page.locator('[data-testid=mesh-max-hertz]'))).toBe(good);
    await shootPanel(page, 'gear-pair', 'gear-pair-engine-error');

    // Empty again (optional): the geometry takes the profile shifts and computes once more.
    const e1 = await edition(page);
    await typeInto(centre, '');
    await centre.press('Backspace');
    await waitForNewResults(page, e1);
    await expect.poll(() => page.locator('.sheet__findings').getAttribute('data-stale')).toBe('false');
    await expect(page.locator('[data-testid=problems]').count()).resolves.toBe(0);
    expect(s.pageErrors).toEqual([]);
  });
});

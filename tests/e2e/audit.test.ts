import { readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { OPEN_NAME } from '../harness/server';
import { CRUSHER, loadDemo } from '../report/helpers';
import { signReview } from '../../app/review/signoff';
import { edition, field, sessionForFile, shootPanel, typeInto, waitForNewResults, WAIT } from './support';

const s = sessionForFile();

const status = (page: Page) => page.locator('[data-testid=review-status]').getAttribute('data-status');
const items = (page: Page, list = 'change-list') => page.locator(`[data-testid=${list}] li`);

async function edit(page: Page, path: string, text: string): Promise<void> {
  const e0 = await edition(page);
  await typeInto(field(page, path), text);
  await waitForNewResults(page, e0);
}

describe('changes since signing, on the Sign-off panel', () => {
  it('signs the demo; two edits are listed with their before and after values', async () => {
    const { page } = s;
    await page.locator('[data-testid=open-signoff]').click();
    await page.locator('#so-reviewer').fill('A. Auditor (invented)');
    await page.locator('#so-role').fill('Reliability engineer');
    await page.locator('[data-testid=signoff-dialog] button[type=submit]').click();
    await expect.poll(() => status(page), { timeout: WAIT }).toBe('signed');
    await expect(page.locator('[data-testid=changes-since-signing]').count()).resolves.toBe(0);

    await edit(page, 'loadCases[1].oilTemperature_C', '75');
    await edit(page, 'oils[0].kv40_mm2s', '240');
    await expect.poll(() => status(page), { timeout: WAIT }).toBe('changed-since-signing');
    await expect.poll(() => items(page).count(), { timeout: WAIT }).toBe(2);
    const paths = await items(page).evaluateAll((li) => li.map((l) => (l as HTMLElement).dataset.changePath));
    expect(paths).toEqual(['loadCases[1].oilTemperature_C', 'oils[0].kv40_mm2s']);
    const text = await page.locator('[data-testid=change-list]').textContent();
    expect(text).toContain('Hard-rock peak: Oil temperature θoil: 68 °C → 75 °C');
    expect(text).toContain('Viscosity at 40 °C: 220 mm²/s → 240 mm²/s');
    expect(text).not.toMatch(/kv40_mm2s|oilTemperature_C/);
    await expect(page.locator('[data-testid=verdict-moved]').textContent()).resolves.toMatch(/The verdict (did not change|changed)/);
    await shootPanel(page, 'sign-off', 'sign-off-changes');
  });

  it('"show" scrolls to the field, focuses it and highlights it', async () => {
    const { page } = s;
    await page.locator('[data-testid=change-list] li').first().getByRole('button', { name: /^Show/ }).click();
    await expect.poll(() => page.evaluate(() => (document.activeElement as HTMLElement | null)?.dataset.path ?? null)).toBe('loadCases[1].oilTemperature_C');
    await expect(page.locator('.is-shown [data-path="loadCases[1].oilTemperature_C"]').count()).resolves.toBe(1);
  });

  it('"undo this change" on each change returns the review to Signed', async () => {
    const { page } = s;
    for (let n = 2; n > 0; n--) {
      const e0 = await edition(page);
      await items(page).first().getByRole('button', { name: /^Undo this change/ }).click();
      await waitForNewResults(page, e0);
      await expect.poll(() => items(page).count(), { timeout: WAIT }).toBe(n - 1);
    }
    await expect.poll(() => status(page), { timeout: WAIT }).toBe('signed');
    await expect(field(page, 'oils[0].kv40_mm2s').inputValue()).resolves.toBe('220');
    await expect(field(page, 'loadCases[1].oilTemperature_C').inputValue()).resolves.toBe('68');
    expect(s.pageErrors).toEqual([]);
  });

  it('"Compare with…" opens another revision and lists what changed from it: one added load case', async () => {
    const { page, harness } = s;
    const other = JSON.parse(readFileSync(CRUSHER, 'utf8'));
    other.loadCases.splice(1, 1); // the earlier revision lacked the hard-rock case
    writeFileSync(join(harness.workDir, OPEN_NAME), JSON.stringify(other));
    await page.locator('[data-testid=compare-with]').click();
    await expect.poll(() => items(page, 'compare-list').count(), { timeout: WAIT }).toBe(1);
    await expect(items(page, 'compare-list').first().getAttribute('data-change-kind')).resolves.toBe('added');
    await expect(page.locator('[data-testid=compare-list]').textContent()).resolves.toContain('Load case “Hard-rock peak” added');
    // The review on screen is not replaced by the compared file.
    await expect(status(page)).resolves.toBe('signed');
    await shootPanel(page, 'sign-off', 'sign-off-compare');
    // The same from the menu's File → Compare with….
    await page.getByRole('button', { name: 'Close the comparison' }).click();
    await expect.poll(() => items(page, 'compare-list').count()).toBe(0);
    harness.sendMenu({ command: 'compare' });
    await expect.poll(() => items(page, 'compare-list').count(), { timeout: WAIT }).toBe(1);
    expect(s.pageErrors).toEqual([]);
  });

  it('opening a file whose kept signed state was altered says so, and offers no list of changes', async () => {
    const { page, harness } = s;
    const { review, results } = loadDemo();
    const signed = signReview(review, results, { reviewer: 'B. Signer (invented)', role: 'Plant engineer', decision: 'approved', signedAt: '2026-12-01T09:30:00Z' });
    if (!signed.ok) throw new Error('sign failed');
    const tampered = JSON.parse(JSON.stringify(signed.review));
    tampered.signoff.signedState.oils[0].kv40_mm2s = 150; // as if someone rewrote what was signed
    writeFileSync(join(harness.workDir, OPEN_NAME), JSON.stringify(tampered));
    const e0 = await edition(page);
    await page.getByRole('button', { name: 'Open…' }).click();
    await waitForNewResults(page, e0);
    await expect.poll(() => status(page), { timeout: WAIT }).toBe('changed-since-signing');
    const note = page.locator('[data-testid=audit-unavailable]');
    await expect.poll(() => note.getAttribute('data-audit'), { timeout: WAIT }).toBe('altered');
    await expect(note.textContent()).resolves.toContain('altered after signing');
    await expect(page.locator('[data-testid=change-list]').count()).resolves.toBe(0);
    expect(s.pageErrors).toEqual([]);
  });
});

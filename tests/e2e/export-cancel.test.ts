/**
 * The record export runs in main's worker: the window shows how far it has got and can cancel it.
 * Cancel leaves no file behind; a second export runs to the end and shows determinate progress.
 */
import { existsSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { sessionForFile, WAIT } from './support';

const s = sessionForFile();

describe('record export: progress and cancel', () => {
  it('Cancel stops the export: a notice says so and no record is written', async () => {
    const { page, harness } = s;
    await page.locator('[data-testid=export-record]').click();
    await page.locator('[data-testid=cancel-record]').click({ timeout: WAIT });
    await expect.poll(() => page.locator('[data-testid=notice]').textContent().catch(() => ''), { timeout: WAIT }).toBe('No record made (canceled).');
    expect(existsSync(join(harness.workDir, 'record.pdf'))).toBe(false);
  });

  it('an export that runs to the end shows how far it has got', async () => {
    const { page, harness } = s;
    await page.evaluate(() => {
      const w = window as unknown as { progressValues?: string[] };
      w.progressValues = [];
      new MutationObserver(() => {
        const v = document.querySelector('[data-testid=progress] progress')?.getAttribute('value');
        if (v) w.progressValues!.push(v);
      }).observe(document.body, { subtree: true, childList: true, attributes: true });
    });
    await page.locator('[data-testid=export-record]').click();
    await expect.poll(() => page.locator('[data-testid=notice]').textContent().catch(() => ''), { timeout: WAIT }).toMatch(/Record saved to record\.pdf/);
    expect(existsSync(join(harness.workDir, 'record.pdf'))).toBe(true);
    const seen = await page.evaluate(() => (window as unknown as { progressValues?: string[] }).progressValues ?? []);
    expect(seen.length).toBeGreaterThan(0);
  });
});

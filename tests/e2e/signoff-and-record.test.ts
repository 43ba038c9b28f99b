import { execFileSync } from 'node:child_process';
import { existsSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { edition, field, shoot, shootPanel, waitForNewResults, sessionForFile, WAIT } from './support';

const s = sessionForFile();

const status = (page: Page) => page.locator('[data-testid=review-status]').getAttribute('data-status');
const activePath = (page: Page) => page.evaluate(() => (document.activeElement as HTMLElement | null)?.dataset.path ?? null);
const activeText = (page: Page) => page.evaluate(() => document.activeElement?.textContent?.trim() ?? '');

/** Press Tab (or Shift+Tab) until `done` holds; fails after `max` presses. */
async function tabUntil(page: Page, done: () => Promise<boolean>, key: 'Tab' | 'Shift+Tab' = 'Tab', max = 250): Promise<void> {
  for (let i = 0; i < max; i++) {
    if (await done()) return;
    await page.keyboard.press(key);
  }
  throw new Error(`focus never reached the target after ${max} × ${key}`);
}

describe('sign-off and record, by keyboard alone', () => {
  it('edits a value and signs with the keyboard only; the status says Signed', async () => {
    const { page } = s;
    expect(await status(page)).toBe('draft');
    await page.locator('body').focus();
    // Tab from the top of the page to the oil temperature of the first load case.
    await tabUntil(page, async () => (await activePath(page)) === 'loadCases[0].oilTemperature_C');
    const e0 = await edition(page);
    await page.keyboard.press('Control+A');
    await page.keyboard.type('65');
    await waitForNewResults(page, e0);
    await expect(field(page, 'loadCases[0].oilTemperature_C').inputValue()).resolves.toBe('65');

    // Back up to the header's "Sign off…" and open the dialog with Enter.
    await tabUntil(page, async () => (await activeText(page)) === 'Sign off…', 'Shift+Tab');
    await page.keyboard.press('Enter');
    const dialog = page.locator('[data-testid=signoff-dialog]');
    await expect.poll(() => dialog.evaluate((d) => (d as HTMLDialogElement).open)).toBe(true);
    await expect.poll(() => page.evaluate(() => document.activeElement?.id)).toBe('so-reviewer');
    await page.keyboard.type('A. Keyboard-Reviewer');
    await page.keyboard.press('Tab');
    await page.keyboard.type('Reliability engineer');
    await page.keyboard.press('Tab');
    await page.keyboard.type('Harrow Creek (invented)');
    await page.keyboard.press('Tab'); // the decision radio group
    await page.keyboard.press('ArrowDown'); // approved → approved with conditions
    await page.keyboard.press('Tab');
    await page.keyboard.type('Oil analysis every 500 h');
    // Focus stays in the dialog however far one tabs (a modal <dialog> with a trap).
    for (let i = 0; i < 12; i++) {
      await page.keyboard.press('Tab');
      await expect(page.evaluate(() => Boolean(document.activeElement?.closest('dialog')))).resolves.toBe(true);
    }
    await tabUntil(page, async () => (await activeText(page)) === 'Sign');
    await shoot(dialog, 'sign-off-dialog');
    await page.keyboard.press('Enter');
    await expect.poll(() => dialog.evaluate((d) => (d as HTMLDialogElement).open), { timeout: WAIT }).toBe(false);
    await expect.poll(() => status(page), { timeout: WAIT }).toBe('signed');
    await expect(page.locator('[data-testid=review-status]').textContent()).resolves.toContain('Signed');
    await expect(page.locator('[data-testid=signoff-reviewer]').textContent()).resolves.toBe('A. Keyboard-Reviewer');
    await expect(page.locator('[data-testid=signoff-details]').textContent()).resolves.toContain('Approved with conditions');
    await shootPanel(page, 'sign-off', 'sign-off-signed');
  });

  it('exports the record: progress, then a PDF whose text names the reviewer', async () => {
    const { page, harness } = s;
    // Watch for the progress bar from before the click: the PDF may take only a moment.
    await page.evaluate(() => {
      const w = window as unknown as { sawProgress?: string };
      new MutationObserver(() => {
        const p = document.querySelector('[data-testid=progress] progress');
        if (p) w.sawProgress = p.getAttribute('aria-label') ?? '';
      }).observe(document.body, { subtree: true, childList: true });
    });
    await page.locator('[data-testid=export-record]').click();
    await expect.poll(() => page.locator('[data-testid=notice]').textContent().catch(() => ''), { timeout: WAIT }).toMatch(/Record saved to .*record\.pdf/);
    const pdf = join(harness.workDir, 'record.pdf');
    expect(existsSync(pdf)).toBe(true);
    await expect(page.evaluate(() => (window as unknown as { sawProgress?: string }).sawProgress)).resolves.toContain('Making the record');
    expect(statSync(pdf).size).toBeGreaterThan(1000);
    const text = execFileSync('pdftotext', ['-layout', pdf, '-'], { encoding: 'utf8' });
    expect(text).toContain('A. Keyboard-Reviewer');
    expect(text).toContain('Harrow Creek');
  });

  it('exports the CSV', async () => {
    const { page, harness } = s;
    await page.locator('[data-testid=export-csv]').click();
    await expect.poll(() => page.locator('[data-testid=notice]').textContent().catch(() => ''), { timeout: WAIT }).toMatch(/CSV saved as .*cases\.csv/);
    expect(statSync(join(harness.workDir, 'cases.csv')).size).toBeGreaterThan(100);
  });

  it('any edit after signing shows "Changed since signing"; undoing it shows Signed again', async () => {
    const { page } = s;
    const input = field(page, 'loadCases[0].oilTemperature_C');
    await input.focus();
    const e0 = await edition(page);
    await page.keyboard.press('Control+A');
    await page.keyboard.type('66');
    await waitForNewResults(page, e0);
    await expect.poll(() => status(page), { timeout: WAIT }).toBe('changed-since-signing');
    await expect(page.locator('[data-testid=review-status]').textContent()).resolves.toContain('Changed since signing');
    await expect(page.locator('[data-testid=signoff-status]').textContent()).resolves.toContain('Changed since signing');
    await shootPanel(page, 'sign-off', 'sign-off-changed');
    // The fingerprint covers content, not history: the signed value again matches the signature.
    const e1 = await edition(page);
    await page.keyboard.press('Control+A');
    await page.keyboard.type('65');
    await waitForNewResults(page, e1);
    await expect.poll(() => status(page), { timeout: WAIT }).toBe('signed');
    expect(s.pageErrors).toEqual([]);
  });

  it('a load-case name the record cannot draw: no record, and the notice names the field in words, not by its path', async () => {
    const { page, harness } = s;
    const name = field(page, 'loadCases[0].name');
    const before = await name.inputValue();
    const e0 = await edition(page);
    await name.fill(`${before} 齿`);
    await name.press('Tab');
    await waitForNewResults(page, e0);
    await page.locator('[data-testid=export-record]').click();
    const notice = page.locator('[data-testid=notice]');
    await expect.poll(() => notice.textContent().catch(() => ''), { timeout: WAIT }).toContain('cannot draw "齿"');
    const text = (await notice.textContent()) ?? '';
    expect(text).toContain(`Duty · ${before} 齿: Name`);
    expect(text).not.toMatch(/loadCases\[|\w\[\d+\]\./);
    expect(existsSync(join(harness.workDir, 'record.pdf'))).toBe(true); // the earlier record, not overwritten by a failed one
    const e1 = await edition(page);
    await name.fill(before);
    await name.press('Tab');
    await waitForNewResults(page, e1);
    expect(s.pageErrors).toEqual([]);
  });
});

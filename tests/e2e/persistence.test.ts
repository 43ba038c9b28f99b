import { existsSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { edition, field, openApp, sessionForFile, typeInto, waitForNewResults, waitForResults, WAIT } from './support';

// One harness for the file: its userData (the autosave) outlives each page.
const file = sessionForFile({ open: false, harness: true });

describe('autosave, recovery, window state and menu commands', () => {
  it('tells main the document is dirty, keeps the edit in the autosave, and offers it back on the next start', async () => {
    const s = await openApp(file.browser, { harness: file.harness });
    try {
      await expect.poll(() => file.harness.documentState()?.dirty, { timeout: WAIT }).toBe(false);
      expect(file.harness.documentState()?.title).toContain('Harrow Creek');
      const e0 = await edition(s.page);
      await typeInto(field(s.page, 'gearPair.faceWidth_mm'), '72');
      await waitForNewResults(s.page, e0);
      await expect.poll(() => file.harness.documentState()?.dirty, { timeout: WAIT }).toBe(true);
      // The autosave is debounced (1.5 s) and lands in main's userData.
      await expect.poll(() => existsSync(join(file.harness.workDir, 'userData')), { timeout: WAIT }).toBe(true);
      await s.page.waitForTimeout(2500);
    } finally {
      await s.context.close();
    }

    const context = await file.browser.newContext({ viewport: { width: 1440, height: 1000 } });
    try {
      const page = await context.newPage();
      page.setDefaultTimeout(WAIT);
      await page.goto(file.harness.url);
      const prompt = page.locator('[data-testid=recovery]');
      await expect.poll(() => prompt.evaluate((d) => (d as HTMLDialogElement).open).catch(() => false), { timeout: WAIT }).toBe(true);
      // Focus starts on "Recover the edits": Enter takes them.
      await page.keyboard.press('Enter');
      await waitForResults(page);
      await expect(field(page, 'gearPair.faceWidth_mm').inputValue()).resolves.toBe('72');
      await expect(page.locator('.topbar__title').textContent()).resolves.toContain('unsaved');
    } finally {
      await context.close();
    }
  });

  it('menu commands from main (server-sent events) switch the units and open Methods and sources', async () => {
    const context = await file.browser.newContext({ viewport: { width: 1440, height: 1000 } });
    try {
      const page = await context.newPage();
      page.setDefaultTimeout(WAIT);
      const errors: string[] = [];
      page.on('pageerror', (e) => errors.push(e.message));
      await page.goto(file.harness.url);
      // The edit of the first test was never saved, so the recovery is offered again: discard it.
      await page.getByRole('button', { name: /Discard them/ }).click();
      await waitForResults(page);
      await expect(field(page, 'gearPair.faceWidth_mm').inputValue()).resolves.toBe('70');
      await page.waitForTimeout(500); // the event stream opens as the page starts
      file.harness.sendMenu({ command: 'units-us' });
      await expect.poll(() => page.locator('[data-testid=units-us]').isChecked(), { timeout: WAIT }).toBe(true);
      file.harness.sendMenu({ command: 'units-si' });
      await expect.poll(() => page.locator('[data-testid=units-si]').isChecked(), { timeout: WAIT }).toBe(true);
      // Help → Methods and sources lists every formula with its source and how firmly it is held.
      file.harness.sendMenu({ command: 'methods' });
      const dialog = page.getByRole('dialog', { name: 'Methods and sources' });
      await expect.poll(() => dialog.isVisible(), { timeout: WAIT }).toBe(true);
      const text = await dialog.innerText();
      expect(text).toMatch(/Dowson & Higginson/);
      expect(text).toMatch(/ISO\/TS 6336-20/);
      expect(text).toMatch(/\[memory\]/);
      await dialog.getByRole('button', { name: 'Close' }).click();
      expect(errors).toEqual([]);
    } finally {
      await context.close();
    }
  });

  it('a review file dropped on the window opens', async () => {
    const s = await openApp(file.browser);
    try {
      const text = readFileSync('assets/demo/harrow-creek-conveyor-spur-pair.flankfilm.json', 'utf8');
      const e0 = await edition(s.page);
      await s.page.evaluate((t) => {
        const dt = new DataTransfer();
        dt.items.add(new File([t], 'conveyor.flankfilm.json', { type: 'application/json' }));
        window.dispatchEvent(new DragEvent('dragover', { dataTransfer: dt, cancelable: true }));
        window.dispatchEvent(new DragEvent('drop', { dataTransfer: dt, cancelable: true }));
      }, text);
      await waitForNewResults(s.page, e0);
      await expect.poll(() => s.page.locator('.topbar__title').textContent(), { timeout: WAIT }).toContain('conveyor head-pulley drive');
      // The spur pair gives torque, so T1 is stored and P follows from it.
      const torque = (JSON.parse(text) as { loadCases: { pinionTorque_Nm: number }[] }).loadCases[0]?.pinionTorque_Nm;
      await expect(field(s.page, 'loadCases[0].pinionTorque_Nm').inputValue()).resolves.toBe(String(torque));
      await expect(s.page.locator('[data-testid=case-verdict]').count()).resolves.toBe(4); // 2 load cases × 2 oils
    } finally {
      await s.close();
    }
  });
});

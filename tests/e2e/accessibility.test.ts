import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { openApp, sessionForFile, shootPanel, type Session, WAIT } from './support';

const PANELS = ['gear-pair', 'duty', 'oils', 'policy', 'verdict', 'side-by-side', 'mesh', 'map', 'sign-off'];

// Each test opens its own page (a colour scheme, a dialog): the file shares only the browser.
const file = sessionForFile({ open: false });

/** Chromium's own accessible name of every rendered input, select and textarea (CDP Accessibility domain). */
async function accessibleNames(page: Page): Promise<{ html: string; role: string; name: string }[]> {
  // Controls of a closed dialog are not rendered, hence not exposed: check what a user can reach.
  await page.evaluate(() => {
    for (const el of document.querySelectorAll('input, select, textarea')) {
      el.toggleAttribute('data-ax-check', el.checkVisibility());
    }
  });
  const cdp = await page.context().newCDPSession(page);
  await cdp.send('DOM.enable');
  await cdp.send('Accessibility.enable');
  const { root } = await cdp.send('DOM.getDocument', { depth: -1 });
  const { nodeIds } = await cdp.send('DOM.querySelectorAll', { nodeId: root.nodeId, selector: '[data-ax-check]' });
  const out: { html: string; role: string; name: string }[] = [];
  for (const nodeId of nodeIds) {
    const { nodes } = await cdp.send('Accessibility.getPartialAXTree', { nodeId, fetchRelatives: false });
    const node = nodes.find((n) => !n.ignored) ?? nodes[0];
    const { outerHTML } = await cdp.send('DOM.getOuterHTML', { nodeId });
    out.push({ html: outerHTML.replace(' data-ax-check=""', '').slice(0, 400), role: String(node?.role?.value ?? ''), name: String(node?.name?.value ?? '').trim() });
  }
  await cdp.detach();
  return out;
}

const luminance = (rgb: string): number => {
  const [r, g, b] = (rgb.match(/\d+/g) ?? []).map(Number);
  return (0.2126 * (r ?? 0) + 0.7152 * (g ?? 0) + 0.0722 * (b ?? 0)) / 255;
};

describe('accessibility, tooltips, theme and PNG export', () => {
  it('every input has an accessible name, the Sign-off dialog included', async () => {
    const s: Session = await openApp(file.browser);
    try {
      const names = await accessibleNames(s.page);
      expect(names.length).toBeGreaterThan(60);
      expect(names.filter((n) => !n.name), 'inputs without an accessible name').toEqual([]);
      // Numeric inputs name their unit as well (the unit is part of the name, not only beside it).
      const torque = names.find((n) => n.html.includes('data-path="loadCases[0].pinionTorque_Nm"'));
      expect(torque?.name).toMatch(/torque.*N·m/);

      await s.page.locator('[data-testid=open-signoff]').click();
      await expect.poll(() => s.page.locator('[data-testid=signoff-dialog]').evaluate((d) => (d as HTMLDialogElement).open)).toBe(true);
      const inDialog = (await accessibleNames(s.page)).filter((n) => /so-|name="decision"/.test(n.html));
      expect(inDialog.length).toBe(7); // reviewer, role, organisation, 3 decisions, conditions
      expect(inDialog.filter((n) => !n.name)).toEqual([]);
      await s.page.keyboard.press('Escape');
      await expect.poll(() => s.page.locator('[data-testid=signoff-dialog]').evaluate((d) => (d as HTMLDialogElement).open)).toBe(false);
    } finally {
      await s.close();
    }
  });

  it('every result carries its definition and source as a tooltip', async () => {
    const s = await openApp(file.browser);
    try {
      const tips = await s.page.locator('.qty').evaluateAll((els) => els.map((e) => ({ title: e.getAttribute('title') ?? '', described: Boolean(e.getAttribute('aria-describedby')) })));
      expect(tips.length).toBeGreaterThan(50);
      expect(tips.filter((t) => !/Source: \S/.test(t.title) || !t.described)).toEqual([]);
      const sbTitle = await s.page.locator('[data-testid=sbs-sb]').first().getAttribute('title');
      expect(sbTitle).toContain('ISO/TS 6336-20');
    } finally {
      await s.close();
    }
  });

  it('follows the OS colour scheme (dark), and shows every panel legibly', async () => {
    const s = await openApp(file.browser, { colorScheme: 'dark' });
    try {
      const bg = await s.page.evaluate(() => getComputedStyle(document.body).backgroundColor);
      expect(luminance(bg)).toBeLessThan(0.2);
      const fg = await s.page.evaluate(() => getComputedStyle(document.body).color);
      expect(luminance(fg)).toBeGreaterThan(0.8);
      // The Map is shown before it is computed here; map.test.ts saves dark-map.png with the maps drawn.
      for (const id of PANELS) await shootPanel(s.page, id, id === 'map' ? 'dark-map-idle' : `dark-${id}`);
    } finally {
      await s.close();
    }
    const light = await openApp(file.browser, { colorScheme: 'light' });
    try {
      expect(luminance(await light.page.evaluate(() => getComputedStyle(document.body).backgroundColor))).toBeGreaterThan(0.8);
    } finally {
      await light.close();
    }
  });

  it('each Mesh chart exports a PNG through a download link', async () => {
    const s = await openApp(file.browser);
    try {
      for (const id of ['hertz', 'velocity', 'film', 'hmin', 'temperature', 'flash']) {
        await s.page.locator(`[data-chart=${id}] button`).click();
        const link = s.page.locator(`[data-testid=png-${id}]`);
        await expect(link.getAttribute('href')).resolves.toMatch(/^data:image\/png;base64,/);
        const [download] = await Promise.all([s.page.waitForEvent('download', { timeout: WAIT }), link.click()]);
        expect(download.suggestedFilename()).toBe(`flankfilm-mesh-1-${id}.png`);
        const bytes = readFileSync(await download.path());
        expect([...bytes.subarray(0, 8)]).toEqual([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]); // PNG signature (ISO/IEC 15948 §5.2)
        expect(bytes.length).toBeGreaterThan(5000);
      }
    } finally {
      await s.close();
    }
  });
});

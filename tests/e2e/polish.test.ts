import { describe, expect, it } from 'vitest';
import { field, sessionForFile, shootPanel, WAIT } from './support';

const s = sessionForFile();

describe('the polish an engineer expects', () => {
  it('"(invented)" is said once, in a demo banner, not in every name', async () => {
    const { page } = s;
    await expect(page.locator('[data-testid=demo-banner]').count()).resolves.toBe(1);
    await expect(page.locator('[data-testid=demo-banner]').textContent()).resolves.toMatch(/Invented demo/);
    const names = await page.locator('[data-path$=".name"]').evaluateAll((els) => els.map((e) => (e as HTMLInputElement).value));
    expect(names.length).toBeGreaterThan(3);
    for (const n of names) expect(n).not.toMatch(/invented/i);
  });

  it('an oil above FZG stage 12 reads "above stage 12: not limiting", never a θS "(at least)"', async () => {
    const { page } = s;
    const verdict = await page.locator('[data-panel=verdict]').innerText();
    expect(verdict).toContain('above stage 12: not limiting');
    expect(verdict).not.toMatch(/at least\)/);
  });

  it('the additive chemistry names the trade’s classes: R&O DIN 51517-2 CL, EP DIN 51517-3 CLP, AW as DIN 51524-2 HLP', async () => {
    const { page } = s;
    const options = await field(page, 'oils[0].chemistry').locator('option').allTextContents();
    expect(options).toEqual(['R&O, rust and oxidation (DIN 51517-2 CL)', 'AW, anti-wear (as DIN 51524-2 HLP)', 'EP, extreme pressure (DIN 51517-3 CLP)']);
  });

  it('no drop-down shows its chosen option cut off', async () => {
    const { page } = s;
    const cut = await page.locator('select').evaluateAll((els) => {
      const ctx = document.createElement('canvas').getContext('2d');
      if (!ctx) return ['no canvas'];
      return els.flatMap((el) => {
        const sel = el as HTMLSelectElement;
        const text = sel.selectedOptions[0]?.textContent ?? '';
        const cs = getComputedStyle(sel);
        ctx.font = `${cs.fontWeight} ${cs.fontSize} ${cs.fontFamily}`;
        // The text box is the width less padding and the drop-down arrow (Chromium draws it in about 1.2 em).
        const room = sel.clientWidth - parseFloat(cs.paddingLeft) - parseFloat(cs.paddingRight) - 1.25 * parseFloat(cs.fontSize);
        return ctx.measureText(text).width > room ? [`${sel.dataset.path ?? sel.id}: “${text}”`] : [];
      });
    });
    expect(cut).toEqual([]);
    await shootPanel(page, 'oils', 'oils-drop-downs');
  });

  it('the disclaimer appears once on the Verdict, not on every card', async () => {
    const text = await s.page.locator('[data-panel=verdict]').innerText();
    expect(text.match(/lubricant list/g)).toHaveLength(1);
  });

  it('Methods and sources explains “[memory]” once', async () => {
    const { page, harness } = s;
    harness.sendMenu({ command: 'methods' });
    const dialog = page.locator('dialog[open]');
    await dialog.waitFor({ state: 'visible', timeout: WAIT });
    const items = await dialog.locator('li').allTextContents();
    expect(items.filter((t) => /“\[memory\]” marks/.test(t))).toHaveLength(1);
    await dialog.getByRole('button', { name: 'Close' }).click();
    expect(s.pageErrors).toEqual([]);
  });
});

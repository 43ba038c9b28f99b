import { describe, expect, it } from 'vitest';
import { execFileSync } from 'node:child_process';
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { runFleet } from '../../app/fleet/fleet';
import { parseOilsText } from '../../app/fleet/oilsFile';
import { parseReviewText } from '../../app/review/parse';
import { sessionForFile, shoot, WAIT } from './support';

const s = sessionForFile();
const DIR = 'assets/demo/fleet';
const REVIEWS = readdirSync(DIR).filter((f) => f.endsWith('.flankfilm.json')).sort();
const OILS = join(DIR, 'harrow-creek-candidates.flankfilm-oils.json');

/** The same consolidation in Node, for the screen to agree with. */
function expected() {
  const oils = parseOilsText(readFileSync(OILS, 'utf8'));
  if (!oils.ok) throw new Error('demo oils');
  const gearboxes = REVIEWS.map((f) => {
    const p = parseReviewText(readFileSync(join(DIR, f), 'utf8'));
    if (!p.ok) throw new Error(f);
    return { source: f, review: p.review };
  });
  return runFleet({ gearboxes, oils: oils.oils, failed: [{ source: 'broken.flankfilm.json', message: 'x' }] });
}

describe('the Fleet view', () => {
  it('reads several reviews and a candidate list, computes in a worker and shows the fit table and the set', async () => {
    const page = s.page;
    await page.locator('[data-testid=view-fleet]').click();
    await page.locator('[data-testid=fleet-reviews]').setInputFiles([
      ...REVIEWS.map((f) => ({ name: f, mimeType: 'application/json', buffer: readFileSync(join(DIR, f)) })),
      { name: 'broken.flankfilm.json', mimeType: 'application/json', buffer: Buffer.from('{"format": "flankfilm.review", "version": 1') },
    ]);
    await page.locator('[data-testid=fleet-oils]').setInputFiles(OILS);
    // One entry a file (a broken one nests the list of its problems).
    await expect.poll(() => page.locator('[data-testid=fleet-files] > li').count(), { timeout: WAIT }).toBe(REVIEWS.length + 2);
    expect(await page.locator('[data-testid=fleet-files]').innerText()).toMatch(/✗ broken\.flankfilm\.json/);
    await page.locator('[data-testid=fleet-compute]').click();
    await page.locator('[data-testid=fleet-fit]').waitFor({ state: 'visible', timeout: WAIT });
    const want = expected();
    expect(await page.locator('[data-testid=fleet-cell]').count()).toBe(want.gearboxes.length * want.oils.length);
    const meets = await page.locator('[data-testid=fleet-cell][data-meets=true]').count();
    expect(meets).toBe(want.fit.filter((c) => c.meets).length);
    const chosen = await page.locator('[data-testid=fleet-chosen-oil]').allInnerTexts();
    expect(chosen.map((t) => t.replace(/ ★ in the set$/, ''))).toEqual(want.oils.filter((o) => want.cover.includes(o.name)).map((o) => o.name));
    expect(await page.locator('[data-testid=fleet-failed]').innerText()).toContain('broken.flankfilm.json');
    const text = await page.locator('main.fleet').innerText();
    expect(text).not.toMatch(/fzg-stage|extreme-pressure|not-computed|beyond-oil/);
    expect(text).toMatch(/licensed engineer/);
    await shoot(page.locator('main.fleet'), 'fleet-view');
    expect(s.pageErrors).toEqual([]);
  });

  it('exports the fleet record through main', async () => {
    const page = s.page;
    await page.locator('[data-testid=fleet-export]').click();
    await page.getByText(/Fleet record saved as/).waitFor({ timeout: WAIT });
    const pdf = join(s.harness.workDir, 'record.pdf');
    const text = execFileSync('pdftotext', ['-layout', pdf, '-'], { encoding: 'utf8' });
    expect(text).toContain('Fit table');
    expect(text).toContain('Sign-off');
    expect(text).toContain('broken.flankfilm.json');
  });

  it('keeps the review sheet as it was when switching back', async () => {
    const page = s.page;
    await page.getByRole('button', { name: 'Review', exact: true }).click();
    await page.locator('[data-panel=verdict] .vbadge').first().waitFor({ state: 'visible', timeout: WAIT });
    expect(await page.locator('main.fleet').isHidden()).toBe(true);
  });
});

import { describe, expect, it } from 'vitest';
import { shoot, sessionForFile, WAIT } from './support';

const s = sessionForFile();

describe('Film detail', () => {
  it('opens from the Mesh panel at a point, solves in a worker and shows the film against the bands, in words', async () => {
    const { page } = s;
    await page.locator('[data-testid=film-point]').selectOption('C');
    await page.locator('[data-testid=film-open]').click();
    const dialog = page.locator('[data-testid=film-detail]');
    await expect.poll(() => dialog.getAttribute('data-phase'), { timeout: WAIT }).toBe('done');
    await expect(dialog.locator('[data-testid=film-status]').getAttribute('data-converged')).resolves.toBe('true');
    await expect(dialog.locator('[data-testid=film-status]').textContent()).resolves.toMatch(/in a worker/);
    // The solve ran in its own worker, not on the UI thread.
    expect(page.workers().some((w) => /film/.test(w.url()))).toBe(true);
    const hMin = Number(await dialog.locator('[data-testid=film-hmin]').getAttribute('data-value'));
    const formula = Number(await dialog.locator('[data-testid=film-formula-hmin]').getAttribute('data-value'));
    expect(hMin).toBeGreaterThan(0);
    expect(Math.abs(hMin / formula - 1)).toBeLessThan(0.3); // the numerical film near the review's formula (Pan–Hamrock 1989 [memory] bands)
    await expect(dialog.locator('h2').textContent()).resolves.toBe('Film detail');
    await expect(dialog.textContent()).resolves.toMatch(/C \(pitch point\)/);
    const words = await dialog.locator('[data-testid=film-words]').textContent();
    expect(words).toMatch(/tribofilm of 50–150 nm \(common practice\)/);
    expect(words).toMatch(/roughness/);
    const label = await dialog.locator('[data-testid=film-chart]').getAttribute('aria-label');
    expect(label).toMatch(/composite roughness band/);
    expect(label).toMatch(/tribofilm band \(common practice\)/);
    await shoot(dialog, 'film-detail');
    await dialog.getByRole('button', { name: 'Close' }).click();
    await expect.poll(() => page.locator('[data-testid=film-detail]').count()).toBe(0);
    expect(s.pageErrors).toEqual([]);
  });
});

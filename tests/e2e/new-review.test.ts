import { execFileSync } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { SAVE_NAMES } from '../harness/server';
import { field, sessionForFile, shoot, shootPanel, typeInto, waitForResults, WAIT } from './support';

const s = sessionForFile();

const dialogOpen = (page: Page) => page.evaluate(() => Boolean(document.querySelector<HTMLDialogElement>('[data-testid=new-review]')?.open));
/** Type a value and leave the field (the value is taken on blur). */
async function enter(page: Page, path: string, text: string): Promise<void> {
  const input = field(page, path);
  await typeInto(input, text);
  await input.press('Tab');
}

describe('New review', () => {
  it('Ctrl+N asks before discarding unsaved edits; Cancel keeps them', async () => {
    const { page } = s;
    await typeInto(field(page, 'title'), 'My own edits');
    await expect.poll(() => page.locator('[data-testid=unsaved]').count()).toBe(1);
    await page.keyboard.press('Control+n');
    await expect.poll(() => dialogOpen(page)).toBe(true);
    await expect(page.locator('[data-testid=new-review-discard]').textContent()).resolves.toContain('unsaved edits');
    // every kind of gear set can be started: spur, helical, internal pair, planetary stage
    for (const name of [/Spur pair/, /Helical pair/, /Internal pair/, /Planetary stage/]) await expect(page.getByRole('radio', { name }).isDisabled()).resolves.toBe(false);
    await shoot(page.locator('[data-testid=new-review]'), 'new-review-dialog');
    await page.locator('[data-testid=new-review]').getByRole('button', { name: 'Cancel' }).click();
    await expect.poll(() => dialogOpen(page)).toBe(false);
    await expect(field(page, 'title').inputValue()).resolves.toBe('My own edits');
    // The File menu's "New review…" sends the same command.
    s.harness.sendMenu({ command: 'new' });
    await expect.poll(() => dialogOpen(page)).toBe(true);
    await page.keyboard.press('Escape');
    await expect.poll(() => dialogOpen(page)).toBe(false);
  });

  it('the button starts a helical review: engineering defaults, nothing of the demo, the missing values marked, commands say why they wait', async () => {
    const { page } = s;
    const button = page.getByRole('button', { name: /^New review/ });
    await button.click();
    const dialog = page.locator('[data-testid=new-review]');
    await dialog.getByRole('radio', { name: /Helical pair/ }).check();
    await dialog.getByRole('button', { name: 'Discard the edits and start' }).click();
    await expect.poll(() => field(page, 'gearPair.helixAngle_deg').inputValue(), { timeout: WAIT }).toBe('15');
    await expect(field(page, 'gearPair.normalPressureAngle_deg').inputValue()).resolves.toBe('20'); // ISO 53 basic rack
    const body = await page.locator('body').innerText();
    expect(body.match(/.{0,60}(Harrow|invented|HC-DEMO|Loaded belt|crusher).{0,60}/i)?.[0] ?? null).toBeNull();
    await expect(page.locator('[data-testid=notice]').textContent()).resolves.toContain('new review from the helical pair template');
    await expect(page.locator('[data-testid=problems]').textContent()).resolves.toMatch(/to correct/);
    await expect(field(page, 'gearPair.normalModule_mm').getAttribute('aria-invalid')).resolves.toBe('true');
    // A disabled command says why, as a tooltip and by aria-describedby.
    const record = page.locator('[data-testid=export-record]');
    await expect(record.isDisabled()).resolves.toBe(true);
    await expect(record.getAttribute('title')).resolves.toMatch(/fill in the marked inputs/);
    const why = await record.getAttribute('aria-describedby');
    await expect(page.locator(`[id="${why ?? ''}"]`).textContent()).resolves.toMatch(/fill in the marked inputs/);
    await expect(page.locator('[data-testid=unsaved]').count()).resolves.toBe(0);
  });

  it('filled in as a real pair, it computes; the record carries its own id, date and notes, and the files are named by the id', async () => {
    const { page, harness } = s;
    await page.getByLabel('Review id').fill('PL-2026-014');
    await page.getByLabel('Date', { exact: true }).fill('2026-12-02');
    await page.getByLabel('Notes').fill('Bucket-elevator reducer, first stage.');
    for (const [path, v] of [
      ['gearPair.normalModule_mm', '5'],
      ['gearPair.faceWidth_mm', '60'],
      ['gearPair.pinion.teeth', '21'],
      ['gearPair.wheel.teeth', '84'],
      ['gearPair.pinion.roughnessRa_um', '0.6'],
      ['gearPair.wheel.roughnessRa_um', '0.6'],
      ['loadCases[0].pinionSpeed_rpm', '1000'],
      ['loadCases[0].pinionTorque_Nm', '900'],
      ['loadCases[0].oilTemperature_C', '60'],
      ['oils[0].kv40_mm2s', '220'],
      ['oils[0].kv100_mm2s', '19'],
      ['oils[0].density15_kgm3', '885'],
      ['oils[1].kv40_mm2s', '320'],
      ['oils[1].kv100_mm2s', '24'],
      ['oils[1].density15_kgm3', '895'],
    ] as const) await enter(page, path, v);
    for (const i of [0, 1]) await field(page, `oils[${i}].baseOil`).selectOption({ label: 'Mineral' });
    await field(page, 'oils[0].chemistry').selectOption({ label: 'R&O, rust and oxidation (DIN 51517-2 CL)' });
    await field(page, 'oils[1].chemistry').selectOption({ label: 'EP, extreme pressure (DIN 51517-3 CLP)' });
    await field(page, 'oils[0].fzgFailureStage').selectOption({ label: '8' });
    await field(page, 'oils[1].fzgFailureStage').selectOption({ label: 'above 12' });
    await waitForResults(page);
    await expect(page.locator('[data-testid=problems]').count()).resolves.toBe(0);
    await shootPanel(page, 'record-details', 'record-details');

    // Sign, then export: the suggested names follow the review id.
    const asked: string[] = [];
    harness.setDialogs({ savePath: async (kind, name) => (asked.push(name), join(harness.workDir, kind === 'review' ? name : SAVE_NAMES[kind])) });
    await page.locator('[data-testid=sign]').click();
    await page.locator('#so-reviewer').fill('P. Engineer');
    await page.locator('#so-role').fill('Plant engineer');
    // The decision names what it approves: the change from the in-service oil to the proposed one.
    await expect(page.locator('[data-testid=signoff-subject]').textContent()).resolves.toContain('the change from the in-service oil “In-service oil” to the proposed oil “Proposed oil”');
    await page.getByRole('radio', { name: 'Approved with conditions' }).check();
    await page.locator('#so-conditions').fill('Oil analysis after 500 h');
    await page.getByRole('button', { name: 'Sign', exact: true }).click();
    await expect.poll(() => page.locator('[data-testid=review-status]').getAttribute('data-status'), { timeout: WAIT }).toBe('signed');
    await page.locator('[data-testid=export-record]').click();
    await expect.poll(() => page.locator('[data-testid=notice]').textContent().catch(() => ''), { timeout: WAIT }).toMatch(/Record saved/);
    expect(asked).toContain('PL-2026-014.pdf');
    const pdf = join(harness.workDir, 'record.pdf');
    const text = execFileSync('pdftotext', ['-layout', pdf, '-'], { encoding: 'utf8' });
    expect(text).toContain('PL-2026-014');
    expect(text).toContain('2026-12-02');
    expect(text).toContain('Bucket-elevator reducer');
    expect(text).not.toMatch(/HC-DEMO|Harrow|2026-11-30/);
    // The cover (page 1) gives the decision with what it approves and its conditions; no command line anywhere.
    const cover = execFileSync('pdftotext', ['-f', '1', '-l', '1', pdf, '-'], { encoding: 'utf8' }).replace(/\s+/g, ' ');
    // (pdftotext joins a word hyphenated at a line end: "in-service" may read "inservice")
    expect(cover).toMatch(/Approved with conditions: the change from the in-?service oil “In-service oil” to the proposed oil “Proposed oil”/);
    expect(cover).toContain('Oil analysis after 500 h');
    expect(text).not.toMatch(/flankfilm sign|--reviewer/);
    // The summary CSV: one row per case × oil, named by the review id.
    await page.locator('[data-testid=export-summary-csv]').click();
    await expect.poll(() => page.locator('[data-testid=notice]').textContent().catch(() => ''), { timeout: WAIT }).toMatch(/Summary CSV saved/);
    expect(asked).toContain('PL-2026-014-summary.csv');
    const summary = readFileSync(join(harness.workDir, SAVE_NAMES.csv), 'utf8').replace(/^\uFEFF/, '').trimEnd().split('\r\n');
    expect(summary).toHaveLength(1 + 1 * 2); // 1 case × 2 oils
    expect(summary[0]).toContain('all limits pass');
    // Dates on screen are ISO 8601.
    await expect(page.locator('[data-testid=signoff-details]').textContent()).resolves.toMatch(/\d{4}-\d{2}-\d{2} \d{2}:\d{2} UTC/);
    // pdfdetach lists the attached review by the id's name.
    const attached = execFileSync('pdfdetach', ['-list', pdf], { encoding: 'utf8' });
    expect(attached).toContain('PL-2026-014.flankfilm.json');
    expect(s.pageErrors).toEqual([]);
  });

  it('a planetary stage from its template: each missing value is named by its member, and filled in it computes both meshes', async () => {
    const { page } = s;
    await page.getByRole('button', { name: /^New review/ }).click();
    const dialog = page.locator('[data-testid=new-review]');
    await dialog.getByRole('radio', { name: /Planetary stage/ }).check();
    await expect(dialog.textContent()).resolves.toContain('number of planets, the member held');
    await dialog.getByRole('button', { name: /start/ }).click();
    await expect.poll(() => page.locator('[data-testid=notice]').textContent().catch(() => ''), { timeout: WAIT }).toContain('planetary stage template');
    const problems = (await page.locator('[data-testid=problems]').textContent()) ?? '';
    for (const member of ['Sun', 'Planet', 'Ring']) expect(problems).toContain(`Gear set · ${member}: Teeth`);
    expect(problems).toContain('Gear set: Member held: choose one');
    expect(problems).not.toMatch(/planetary\.|\w\[\d+\]/);
    // The stage and its duty from the invented demo's ball mill (the file, so no numbers of its own here).
    const demo = JSON.parse(readFileSync(join('assets/demo', 'harrow-creek-ball-mill-planetary.flankfilm.json'), 'utf8'));
    const st = demo.planetary;
    const lc = demo.loadCases[0];
    for (const [path, v] of [
      ['planetary.normalModule_mm', st.normalModule_mm],
      ['planetary.faceWidth_mm', st.faceWidth_mm],
      ['planetary.planets', st.planets],
      ...(['sun', 'planet', 'ring'] as const).flatMap((m) => [[`planetary.${m}.teeth`, st[m].teeth], [`planetary.${m}.roughnessRa_um`, st[m].roughnessRa_um]]),
      ['loadCases[0].sunSpeed_rpm', lc.sunSpeed_rpm],
      ['loadCases[0].power_kW', lc.power_kW],
      ['loadCases[0].oilTemperature_C', lc.oilTemperature_C],
      ...[0, 1].flatMap((i) => [[`oils[${i}].kv40_mm2s`, demo.oils[i].kv40_mm2s], [`oils[${i}].kv100_mm2s`, demo.oils[i].kv100_mm2s], [`oils[${i}].density15_kgm3`, demo.oils[i].density15_kgm3]]),
    ] as Array<[string, number]>) await enter(page, path, String(v));
    const ringHeld = await field(page, 'planetary.held').locator('option', { hasText: /^Ring held/ }).getAttribute('value');
    await field(page, 'planetary.held').selectOption(ringHeld ?? '');
    for (const i of [0, 1]) {
      await field(page, `oils[${i}].baseOil`).selectOption({ label: 'Mineral' });
      await field(page, `oils[${i}].chemistry`).selectOption({ label: 'EP, extreme pressure (DIN 51517-3 CLP)' });
      await field(page, `oils[${i}].fzgFailureStage`).selectOption({ label: '12' });
    }
    await waitForResults(page);
    await expect(page.locator('[data-testid=problems]').count()).resolves.toBe(0);
    const verdict = (await page.locator('[data-panel=verdict]').textContent()) ?? '';
    expect(verdict).toMatch(/sun–planet|planet–ring/);
    expect(s.pageErrors).toEqual([]);
  });
});

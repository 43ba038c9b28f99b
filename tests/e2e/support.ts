/**
 * Shared set-up of the e2e specs: a Chromium (findChromium.ts: environment variable, playwright's
 * own browser, Debian's) driven by playwright-core, the built renderer served with the contract by tests/harness/server.ts, and helpers
 * that read what the sheet shows.
 */
import { mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { chromium, type Browser, type BrowserContext, type Locator, type Page } from 'playwright-core';
import { afterAll, beforeAll, expect } from 'vitest';
import { startHarness, type Harness } from '../harness/server';
import { findChromium } from './findChromium';

export const SCREENSHOTS = join('test-output', 'screenshots');
const CHROMIUM_ARGS = ['--no-sandbox', '--disable-gpu', '--disable-background-networking', '--disable-component-update', '--disable-sync', '--no-first-run'];
/** Two shared cores: everything that waits, waits long. */
export const WAIT = 60_000;

export interface Session {
  readonly browser: Browser;
  readonly context: BrowserContext;
  readonly page: Page;
  readonly harness: Harness;
  /** Errors thrown in the page (a crash of the renderer shows here). */
  readonly pageErrors: string[];
  close(): Promise<void>;
}

export async function launch(): Promise<Browser> {
  return chromium.launch({ executablePath: findChromium().path, args: CHROMIUM_ARGS });
}

/** A fresh harness (its own work folder) and a page on it, with the demo open and computed. */
export async function openApp(browser: Browser, options: { colorScheme?: 'light' | 'dark'; harness?: Harness } = {}): Promise<Session> {
  const harness = options.harness ?? (await startHarness());
  const context = await browser.newContext({ viewport: { width: 1440, height: 1000 }, colorScheme: options.colorScheme ?? 'light', acceptDownloads: true });
  const page = await context.newPage();
  page.setDefaultTimeout(WAIT);
  const pageErrors: string[] = [];
  page.on('pageerror', (e) => pageErrors.push(e.message));
  await page.goto(harness.url);
  try {
    await waitForResults(page);
  } catch (e) {
    const shown = await page.locator('body').innerText().catch(() => '(no page)');
    throw new Error(`the demo did not compute: ${(e as Error).message}\npage errors: ${pageErrors.join('; ')}\npage: ${shown.slice(0, 2000)}`);
  }
  return {
    browser,
    context,
    page,
    harness,
    pageErrors,
    async close() {
      await context.close();
      if (!options.harness) await harness.close();
    },
  };
}

export interface FileSessionOptions {
  /** Open the demo on a page (default true); false gives only the browser (and the harness, if asked). */
  readonly open?: boolean;
  /** With `open: false`: start a harness for the whole file anyway. */
  readonly harness?: boolean;
  readonly colorScheme?: 'light' | 'dark';
}

/**
 * The set-up every spec file shares: one Chromium for the file and, unless `open: false`, a fresh
 * harness with the demo open and computed; all closed after the file. Call it at the top of the
 * file (it registers beforeAll/afterAll); the session's members are there once the tests run.
 */
export function sessionForFile(options: FileSessionOptions = {}): Session {
  let browser: Browser | null = null;
  let session: Session | null = null;
  let harness: Harness | null = null;
  beforeAll(async () => {
    browser = await launch();
    if (options.open !== false) session = await openApp(browser, { colorScheme: options.colorScheme });
    else if (options.harness) harness = await startHarness();
  });
  afterAll(async () => {
    await session?.close();
    await harness?.close();
    await browser?.close();
  });
  const open = (): Session => {
    if (!session) throw new Error('no page is open for this file: sessionForFile({ open: false }), or the set-up failed');
    return session;
  };
  return {
    get browser() {
      if (!browser) throw new Error('the browser did not start');
      return browser;
    },
    get harness() {
      if (harness) return harness;
      return open().harness;
    },
    get context() {
      return open().context;
    },
    get page() {
      return open().page;
    },
    get pageErrors() {
      return open().pageErrors;
    },
    close: () => open().close(),
  };
}

/** The sheet has results on screen and no recompute is pending. */
export async function waitForResults(page: Page): Promise<void> {
  await page.locator('[data-panel=verdict] .vbadge').first().waitFor({ state: 'visible', timeout: WAIT });
  await page.locator('.computing').waitFor({ state: 'detached', timeout: WAIT });
}

/** The input (or select) for a review path such as `loadCases[0].pinionTorque_Nm`. */
export const field = (page: Page, path: string): Locator => page.locator(`[data-path="${path}"]`);

/** Replace the text of an input as a user would: select all, type. */
export async function typeInto(input: Locator, text: string): Promise<void> {
  await input.click();
  await input.press('Control+A');
  await input.pressSequentially(text, { delay: 15 });
}

/** The raw number behind a result (data-value, in file units), not its rounded text. */
export async function resultValue(locator: Locator): Promise<number> {
  const raw = await locator.getAttribute('data-value');
  expect(raw, 'the result carries its value').not.toBeNull();
  return Number(raw);
}

export interface SeriesSummary {
  label: string;
  n: number;
  min: number | null;
  max: number | null;
}

/** What a Mesh chart plots, from its element's data-summary. */
export async function chartSummary(page: Page, id: string): Promise<SeriesSummary[]> {
  const raw = await page.locator(`[data-chart="${id}"]`).getAttribute('data-summary');
  return JSON.parse(raw ?? '[]') as SeriesSummary[];
}

/** The recompute answered an edition newer than `after`. */
export async function waitForNewResults(page: Page, after: number): Promise<number> {
  const findings = page.locator('.sheet__findings');
  await expect.poll(async () => Number(await findings.getAttribute('data-edition')), { timeout: WAIT, interval: 100 }).toBeGreaterThan(after);
  await page.locator('.computing').waitFor({ state: 'detached', timeout: WAIT });
  return Number(await findings.getAttribute('data-edition'));
}

export const edition = async (page: Page): Promise<number> => Number(await page.locator('.sheet__findings').getAttribute('data-edition'));

/** Save a screenshot of one panel for a human to look at (never compared by pixels). */
export async function shootPanel(page: Page, panel: string, name = panel): Promise<void> {
  mkdirSync(SCREENSHOTS, { recursive: true });
  // A viewport as tall as the page keeps the sticky header out of the middle of long panels.
  const height = await page.evaluate(() => document.documentElement.scrollHeight);
  const before = page.viewportSize();
  await page.setViewportSize({ width: before?.width ?? 1440, height: Math.min(Math.max(height, 1000), 12000) });
  await page.locator(`[data-panel="${panel}"]`).screenshot({ path: join(SCREENSHOTS, `${name}.png`), animations: 'disabled' });
  if (before) await page.setViewportSize(before);
}

/** Save a screenshot of any element (a dialog, say) for a human to look at. */
export async function shoot(locator: Locator, name: string): Promise<void> {
  mkdirSync(SCREENSHOTS, { recursive: true });
  await locator.screenshot({ path: join(SCREENSHOTS, `${name}.png`), animations: 'disabled' });
}

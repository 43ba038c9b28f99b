/**
 * Which Chromium the browser tests drive, in this order: the FLANKFILM_CHROMIUM environment
 * variable, playwright's own downloaded browser, then Debian's /usr/bin/chromium. None found: an
 * error that says how to install one, so the e2e suite stops at once rather than timing out.
 */
import { existsSync } from 'node:fs';
import { chromium } from 'playwright-core';

export const CHROMIUM_ENV = 'FLANKFILM_CHROMIUM';
export const SYSTEM_CHROMIUM = '/usr/bin/chromium';

export const NO_CHROMIUM = `No Chromium for the browser tests. Install one, then run npm test again:
  - Debian/Ubuntu: sudo apt-get install chromium   (gives ${SYSTEM_CHROMIUM})
  - with internet access: npx playwright-core install chromium   (playwright's own browser)
  - or point ${CHROMIUM_ENV} at a Chromium or Chrome executable.`;

export interface ChromiumChoice {
  readonly path: string;
  readonly from: 'environment' | 'playwright' | 'system';
}

/** The first Chromium that exists; `exists` and `playwrightPath` are parameters so the order can be tested. */
export function findChromium(
  env: Readonly<Record<string, string | undefined>> = process.env,
  exists: (path: string) => boolean = existsSync,
  playwrightPath: () => string | null = () => {
    try {
      return chromium.executablePath();
    } catch {
      return null;
    }
  },
): ChromiumChoice {
  const fromEnv = env[CHROMIUM_ENV];
  if (fromEnv) {
    if (!exists(fromEnv)) throw new Error(`${CHROMIUM_ENV}=${fromEnv} does not exist.\n${NO_CHROMIUM}`);
    return { path: fromEnv, from: 'environment' };
  }
  const own = playwrightPath();
  if (own && exists(own)) return { path: own, from: 'playwright' };
  if (exists(SYSTEM_CHROMIUM)) return { path: SYSTEM_CHROMIUM, from: 'system' };
  throw new Error(NO_CHROMIUM);
}

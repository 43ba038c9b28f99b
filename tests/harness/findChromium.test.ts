import { describe, expect, it } from 'vitest';
import { CHROMIUM_ENV, findChromium, NO_CHROMIUM, SYSTEM_CHROMIUM } from '../e2e/findChromium';

const OWN = '/home/u/.cache/ms-playwright/chromium-1/chrome-linux64/chrome';
const only = (...present: string[]) => (p: string) => present.includes(p);

describe('the Chromium of the browser tests', () => {
  it('is found in order: environment variable, playwright’s own, then /usr/bin/chromium', () => {
    expect(findChromium({ [CHROMIUM_ENV]: '/opt/c/chrome' }, only('/opt/c/chrome', OWN, SYSTEM_CHROMIUM), () => OWN)).toEqual({ path: '/opt/c/chrome', from: 'environment' });
    expect(findChromium({}, only(OWN, SYSTEM_CHROMIUM), () => OWN)).toEqual({ path: OWN, from: 'playwright' });
    expect(findChromium({}, only(SYSTEM_CHROMIUM), () => OWN)).toEqual({ path: SYSTEM_CHROMIUM, from: 'system' });
  });
  it('none found: the error says how to install one (Debian package, playwright download, the variable)', () => {
    expect(() => findChromium({}, only(), () => OWN)).toThrow(NO_CHROMIUM);
    expect(NO_CHROMIUM).toMatch(/apt-get install chromium/);
    expect(NO_CHROMIUM).toMatch(/npx playwright-core install chromium/);
    expect(() => findChromium({ [CHROMIUM_ENV]: '/nope' }, only(SYSTEM_CHROMIUM), () => null)).toThrow(/does not exist/);
  });
});

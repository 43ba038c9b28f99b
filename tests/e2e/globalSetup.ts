import { findChromium } from './findChromium';

/** Before any browser test: stop the suite at once, with how to install one, when no Chromium is found. */
export default function setup(): void {
  const { path, from } = findChromium();
  process.stdout.write(`e2e: Chromium ${path} (${from})\n`);
}

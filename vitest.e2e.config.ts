import { defineConfig } from 'vitest/config';

// End-to-end: the built renderer (dist/renderer) in Debian Chromium through the HTTP harness.
// One file at a time: the machine has two shared cores and each file runs its own browser.
export default defineConfig({
  test: {
    include: ['tests/e2e/**/*.test.ts'],
    // No Chromium: fail at once with how to install one (tests/e2e/findChromium.ts).
    globalSetup: ['tests/e2e/globalSetup.ts'],
    environment: 'node',
    pool: 'forks',
    fileParallelism: false,
    testTimeout: 180_000,
    hookTimeout: 120_000,
  },
});

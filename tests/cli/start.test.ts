import { describe, expect, it } from 'vitest';
import { spawnSync } from 'node:child_process';

describe('npm start where the Electron binary is missing (our build machines)', () => {
  it('prints a clear message naming the headless commands, not a stack trace, and exits 1', () => {
    const r = spawnSync(process.execPath, ['scripts/start.mjs'], { encoding: 'utf8', env: { ...process.env, ELECTRON_SKIP_BINARY_DOWNLOAD: '1' } });
    expect(r.status).toBe(1);
    expect(r.stderr).toMatch(/Electron binary is not installed/);
    expect(r.stderr).toMatch(/npm run -s flankfilm -- review/);
    expect(r.stderr).not.toMatch(/\n\s+at /);
  });
});

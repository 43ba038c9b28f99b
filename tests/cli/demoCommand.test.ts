import { describe, expect, it } from 'vitest';
import { mkdtempSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { cli } from './cliHarness';

describe('flankfilm demo DIR', () => {
  it('writes the demo reviews, which then review cleanly, and never overwrites', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'flankfilm-demo-'));
    const first = await cli('demo', dir);
    expect(first.code).toBe(0);
    const files = first.out.trim().split('\n');
    expect(files).toHaveLength(3);
    for (const f of files) {
      expect(readFileSync(f, 'utf8')).toMatch(/INVENTED DEMO SCENARIO/);
      expect((await cli('review', f, '--json')).code).toBe(0);
    }
    const again = await cli('demo', dir);
    expect(again.code).toBe(1);
    expect(again.err).toMatch(/not overwritten/);
  });
});

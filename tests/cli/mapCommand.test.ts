import { describe, expect, it } from 'vitest';
import { mkdtempSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { cli } from './cliHarness';

describe('flankfilm review FILE --map OUT.csv', () => {
  it('writes the 60 × 60 grid per load case × oil, with a header of names and units and no NaN', async () => {
    const out = join(mkdtempSync(join(tmpdir(), 'flankfilm-map-')), 'map.csv');
    const { code } = await cli('review', 'assets/demo/harrow-creek-conveyor-spur-pair.flankfilm.json', '--map', out);
    expect(code).toBe(0);
    const lines = readFileSync(out, 'utf8').trim().split('\n');
    expect(lines[0]).toBe('load case,oil,oil temperature (°C),load (% of case torque),lambda_min (-),S_B (-),S_intS (-),verdict,lambda_GF_min (-),S_lambda micropitting (-)');
    expect(lines.length - 1).toBe(2 * 2 * 60 * 60);
    expect(lines.join('\n')).not.toMatch(/NaN|Infinity/);
    expect(lines[1]).toMatch(/,(aw-suffices|ep-warranted|beyond-oil),[0-9.]+,$/); // λGF,min given; Sλ empty: the demo oils give no micropitting stage
  });
});

import { describe, expect, it } from 'vitest';
import { cli } from './cliHarness';

const DEMO = 'assets/demo/harrow-creek-crusher-hs-pair.flankfilm.json';
/** What a person must not read: field paths, enum codes and rule ids (they stay in --json). */
const CODES = /falls-short|r-and-o|extreme-pressure|steel-carburi[sz]ed|full-film|\b[a-zA-Z]+_(mm|um|C|kW|Nm|mm2s|MPa)\b|gearPair\.|loadCases\[|oils\[\d|scuffing\.required|oil\.fzg-stage|film\.lambda|approved-with-conditions/;

describe('review summary: the need apart from the fit, the change first', () => {
  it('states the need once at the top, then the change finding, then each oil against the need', async () => {
    const { code, out } = await cli('review', DEMO);
    expect(code).toBe(0);
    const need = out.indexOf('What the duty needs');
    const change = out.indexOf('Change: ');
    const oils = out.indexOf('Each oil against the need');
    expect(need).toBeGreaterThan(0);
    expect(change).toBeGreaterThan(need);
    expect(oils).toBeGreaterThan(change);
    expect(out.match(/What the duty needs/g)).toHaveLength(1);
  });
  it('marks every figure against its limit in words, and never calls a safety below its minimum a pass', async () => {
    const { out } = await cli('review', DEMO);
    for (const m of out.matchAll(/(SB|SintS|λmin) (\d+\.\d+) (<|≥) (\d+(?:\.\d+)?) (pass|FAIL)/g)) {
      const [value, limit, word] = [Number(m[2]), Number(m[4]), m[5]];
      expect(word, m[0]).toBe(value >= limit ? 'pass' : 'FAIL');
    }
    expect(out).toMatch(/SB \d+\.\d+ < 1\.5 FAIL/); // the in-service R&O oil in the hard-rock case
  });
  it('each caution once; shows no internal codes', async () => {
    const { out } = await cli('review', DEMO);
    expect(out.match(/drain hot, flush with the new oil/g)).toHaveLength(1);
    expect(out.match(/engineering aid, not an approval/g)).toHaveLength(1);
    expect(out).not.toMatch(CODES);
  });
});

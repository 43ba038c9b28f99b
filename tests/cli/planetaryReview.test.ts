import { describe, expect, it } from 'vitest';
import { cli } from './cliHarness';

const DEMO = 'assets/demo/harrow-creek-ball-mill-planetary.flankfilm.json';

describe('flankfilm review of a planetary stage', () => {
  it('the summary shows the stage, both meshes and the governing mesh in words', async () => {
    const { code, out } = await cli('review', DEMO);
    expect(code).toBe(0);
    for (const s of ['Planetary stage: sun/planet/ring 21/33/87 teeth, 3 planets, ring held', 'Ratio 5.1429 (sun to carrier)', 'Sun–planet mesh (external', 'Planet–ring mesh (internal', 'across both meshes', 'The sun–planet mesh governs.', ': sun–planet']) expect(out).toContain(s);
    expect(out).not.toMatch(/sun-planet|planet-ring|NaN/); // words, not codes
  });
  it('--json gives planetary and meshes', async () => {
    const { code, out } = await cli('review', DEMO, '--json');
    expect(code).toBe(0);
    const r = JSON.parse(out);
    expect(r.planetary.ratio).toBeCloseTo(108 / 21, 12); // 1 + zR/zS
    expect(r.meshes.map((m: { mesh: string }) => m.mesh)).toEqual(['sun-planet', 'planet-ring']);
  });
});

import { describe, expect, it } from 'vitest';
import { cli } from './cliHarness';

const DEMO = 'assets/demo/harrow-creek-crusher-hs-pair.flankfilm.json';
const CASE = 'Hard-rock peak (invented)';

describe('flankfilm ehl', () => {
  it('--json gives the issue\'s keys, with a converged solution and a profile across the contact', async () => {
    const { code, out } = await cli('ehl', DEMO, '--case', CASE, '--at', 'lambda-min', '--json');
    expect(code).toBe(0);
    const r = JSON.parse(out);
    for (const k of ['converged', 'iterations', 'residual', 'nodes', 'ms', 'hMin_um', 'hCentral_um', 'pMax_MPa', 'hertzP0_MPa', 'formulaHMin_um', 'formulaHCentral_um', 'profile']) expect(r).toHaveProperty(k);
    expect(r.converged).toBe(true);
    expect(r.nodes).toBe(257);
    expect(r.profile).toHaveLength(257);
    expect(Object.keys(r.profile[0])).toEqual(['x_over_b', 'p_MPa', 'h_um']);
    expect(r.hMin_um).toBeLessThan(r.hCentral_um);
  });

  it('the summary is in words: no field names', async () => {
    const { code, out } = await cli('ehl', DEMO, '--case', CASE, '--at', 'C', '--nodes', '129');
    expect(code).toBe(0);
    expect(out).toMatch(/Converged in \d+ iterations on 129 nodes/);
    expect(out).toMatch(/tribofilm/);
    expect(out).not.toMatch(/hMin_um|_MPa|loadCases\[/);
  });

  it.each([
    [['--case', CASE, '--at', 'F'], /--at is A, B, C, D, E, lambda-min or a position/],
    [['--case', CASE, '--at', '0.5'], /outside the path of contact A–E/],
    [['--case', 'Nope', '--at', 'C'], /no load case named "Nope"/],
    [['--case', CASE, '--oil', 'Nope', '--at', 'C'], /no oil named "Nope"/],
    [['--case', CASE, '--at', 'C', '--nodes', '20'], /--nodes is a whole number from 65 to 1025/],
    [['--case', CASE, '--at', 'C', '--nodes', 'many'], /--nodes is a whole number/],
    [['--at', 'C'], /--case NAME is needed/],
  ])('bad input %j: a clear message and usage exit 2', async (args, message) => {
    const { code, err } = await cli('ehl', DEMO, ...(args as string[]));
    expect(code).toBe(2);
    expect(err).toMatch(message as RegExp);
    expect(err).toMatch(/usage:/);
  });
});

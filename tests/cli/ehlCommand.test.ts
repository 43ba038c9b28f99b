import { describe, expect, it } from 'vitest';
import { cli } from './cliHarness';

const DEMO = 'assets/demo/harrow-creek-crusher-hs-pair.flankfilm.json';
const CASE = 'Hard-rock peak';

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

describe('flankfilm review --pdf --film-detail', () => {
  it('adds the Film detail at least λ to the record, only when asked', async () => {
    const { mkdtempSync } = await import('node:fs');
    const { tmpdir } = await import('node:os');
    const { join } = await import('node:path');
    const { execFileSync } = await import('node:child_process');
    const dir = mkdtempSync(join(tmpdir(), 'flankfilm-ehl-'));
    const withFilm = join(dir, 'with.pdf');
    const without = join(dir, 'without.pdf');
    expect((await cli('review', DEMO, '--pdf', withFilm, '--film-detail')).code).toBe(0);
    expect((await cli('review', DEMO, '--pdf', without)).code).toBe(0);
    const text = (f: string) => execFileSync('pdftotext', [f, '-'], { encoding: 'utf8' }).replace(/\s+/g, ' '); // lines wrap in the PDF
    const a = text(withFilm);
    expect(a).toMatch(/Film detail: the numerical film at the point of least λ/);
    expect(a).toMatch(/anti-wear tribofilm of 50–150 nm \(common practice\)/);
    expect(a).toMatch(/Converged in \d+ iterations/);
    expect(text(without)).not.toMatch(/Film detail/);
  });

  it('--film-detail without --pdf is a usage error', async () => {
    const { code, err } = await cli('review', DEMO, '--film-detail');
    expect(code).toBe(2);
    expect(err).toMatch(/--film-detail adds a page to the record: give --pdf OUT too/);
  });
});

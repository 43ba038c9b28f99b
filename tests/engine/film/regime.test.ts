import { describe, expect, it } from 'vitest';
import { EngineInputError } from '../../../app/engine/diagnostics';
import { classifyRegime } from '../../../app/engine/film/regime';

describe('lubrication regime from λ (common practice: boundary < 1 ≤ mixed < 3 ≤ full film)', () => {
  it.each([
    [0, 'boundary'],
    [0.99, 'boundary'],
    [1, 'mixed'],
    [2.99, 'mixed'],
    [3, 'full-film'],
    [12, 'full-film'],
  ] as const)('λ %f → %s', (lambda, regime) => {
    expect(classifyRegime(lambda)).toBe(regime);
  });

  it('takes the thresholds of the policy', () => {
    const t = { boundaryBelow: 0.8, fullFilmFrom: 2 };
    expect(classifyRegime(0.9, t)).toBe('mixed');
    expect(classifyRegime(2, t)).toBe('full-film');
  });

  it('rejects a negative λ and inverted thresholds', () => {
    expect(() => classifyRegime(-0.1)).toThrow(EngineInputError);
    expect(() => classifyRegime(Number.NaN)).toThrow(EngineInputError);
    expect(() => classifyRegime(1, { boundaryBelow: 3, fullFilmFrom: 1 })).toThrow(EngineInputError);
  });
});

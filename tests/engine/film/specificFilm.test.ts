import { describe, expect, it } from 'vitest';
import { EngineInputError } from '../../../app/engine/diagnostics';
import { specificFilmThickness, specificFilmThicknessGF } from '../../../app/engine/film/specificFilm';
import type { Metres } from '../../../app/engine/units';

const um = (v: number) => (v * 1e-6) as Metres;

describe('specific film thickness', () => {
  it('λ = h/√(Rq1² + Rq2²), Rq = 1.25 Ra (common practice): h 0.5 µm, Ra 0.4 and 0.3 µm → 0.8', () => {
    expect(specificFilmThickness(um(0.5), um(0.4), um(0.3))).toBeCloseTo(0.8, 12); // 0.5/(1.25·0.5)
    expect(specificFilmThickness(um(0.5), um(0.4), um(0.3), 1)).toBeCloseTo(1, 12);
  });

  it('λ_GF = h/Ra_avg (ISO/TS 6336-22): h 0.5 µm, Ra 0.4 and 0.3 µm → 1.4286', () => {
    expect(specificFilmThicknessGF(um(0.5), um(0.4), um(0.3))).toBeCloseTo(0.5 / 0.35, 12);
  });

  it('for equal roughness λ_GF = 1.25·√2·λ = 1.768·λ: the two must not be mixed up', () => {
    expect(specificFilmThicknessGF(um(0.3), um(0.5), um(0.5)) / specificFilmThickness(um(0.3), um(0.5), um(0.5))).toBeCloseTo(1.25 * Math.SQRT2, 12);
  });

  it('one smooth flank is allowed; no roughness at all, or negative values, throw', () => {
    expect(specificFilmThickness(um(0.5), um(0), um(0.4))).toBeCloseTo(1, 12);
    expect(() => specificFilmThickness(um(0.5), um(0), um(0))).toThrow(EngineInputError);
    expect(() => specificFilmThicknessGF(um(0.5), um(0), um(0))).toThrow(EngineInputError);
    expect(() => specificFilmThickness(um(-0.1), um(0.4), um(0.4))).toThrow(EngineInputError);
  });
});

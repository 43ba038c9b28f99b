import { describe, expect, it } from 'vitest';
import { EngineInputError } from '../../../app/engine/diagnostics';
import { tribofilmNote } from '../../../app/engine/film/tribofilmNote';
import type { Metres } from '../../../app/engine/units';

const um = (v: number) => (v * 1e-6) as Metres;

describe('tribofilm note (anti-wear tribofilm ≈ 50–150 nm, common practice)', () => {
  it('boundary: asperities touch and the tribofilm carries the contact', () => {
    expect(tribofilmNote(um(0.12), um(0.5))).toBe(
      'film 0.12 µm vs composite roughness 0.50 µm (λ 0.24): asperities touch; an anti-wear tribofilm (≈0.05–0.15 µm, common practice) is what carries the contact. The oil film is no thicker than the tribofilm itself.',
    );
    expect(tribofilmNote(um(0.3), um(0.5))).not.toMatch(/no thicker/);
  });

  it('mixed and full film read differently', () => {
    expect(tribofilmNote(um(0.8), um(0.5))).toMatch(/^film 0\.80 µm vs composite roughness 0\.50 µm \(λ 1\.60\): the highest asperities still touch/);
    expect(tribofilmNote(um(1.8), um(0.5))).toMatch(/\(λ 3\.60\): the oil film separates the flanks/);
    expect(tribofilmNote(um(0.8), um(0.5), { boundaryBelow: 2, fullFilmFrom: 4 })).toMatch(/asperities touch; an anti-wear/);
  });

  it('zero roughness throws', () => {
    expect(() => tribofilmNote(um(0.5), um(0))).toThrow(EngineInputError);
  });
});

import { describe, expect, it } from 'vitest';
import { numericalFilmInWords } from '../../../app/engine/ehl/filmInWords';
import type { Metres } from '../../../app/engine/units';

const um = (x: number) => (x * 1e-6) as Metres;

describe('the numerical film in words, against the tribofilm range 50–150 nm (common practice) and the roughness', () => {
  it('below both: boundary, the tribofilm carries it', () => {
    expect(numericalFilmInWords(um(0.04), um(0.5), true)).toMatch(/below the tribofilm range and below the roughness.*boundary/);
  });
  it('within the tribofilm range and below the roughness: boundary in practice', () => {
    expect(numericalFilmInWords(um(0.12), um(0.66), true)).toMatch(/within the tribofilm range and below the roughness.*boundary lubrication in practice/);
  });
  it('above the tribofilm, below the roughness: mixed', () => {
    expect(numericalFilmInWords(um(0.35), um(0.66), true)).toMatch(/above the tribofilm range but below the roughness.*mixed/);
  });
  it('above both: the film separates the flanks; an unconverged figure is called provisional', () => {
    expect(numericalFilmInWords(um(1.2), um(0.3), true)).toMatch(/separates the flanks/);
    expect(numericalFilmInWords(um(1.2), um(0.3), false)).toMatch(/provisional/);
    expect(numericalFilmInWords(um(1.2), um(0.3), true)).toMatch(/50–150 nm \(common practice\)/);
  });
});

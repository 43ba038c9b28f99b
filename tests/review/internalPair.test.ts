import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { parseReviewValue } from '../../app/review/parse';
import { run } from '../../app/review/run';
import { findNonFinite } from '../fuzz/fuzzer';

/**
 * The same pinion and duty in an external wheel and in a ring, through the whole review pipeline.
 * The expectations are consequences of the conformal radius ρred = ρ1ρ2/(ρ2 − ρ1) > ρ1ρ2/(ρ1 + ρ2)
 * (Hertz, Johnson §4.2): lower Hertz stress, a thicker film (h ∝ R^0.43 by Dowson–Higginson at equal
 * U and W per unit R) and less sliding, so a lower flash temperature.
 */
function reviewOf(kind: 'external' | 'internal') {
  const raw = JSON.parse(readFileSync('assets/demo/harrow-creek-conveyor-spur-pair.flankfilm.json', 'utf8'));
  raw.gearPair.kind = kind;
  raw.gearPair.pinion = { ...raw.gearPair.pinion, teeth: 25, profileShift: 0 };
  raw.gearPair.wheel = { ...raw.gearPair.wheel, teeth: 77, profileShift: 0 };
  const p = parseReviewValue(raw);
  if (!p.ok) throw new Error(JSON.stringify(p.issues));
  return p.review;
}

describe('internal pair through run()', () => {
  const ext = run(reviewOf('external'));
  const int = run(reviewOf('internal'));
  it('gives finite results with the same keys as an external pair', () => {
    expect(findNonFinite(int)).toBeNull();
    expect(Object.keys(int.gear).sort()).toEqual(Object.keys(ext.gear).sort());
    expect(Object.keys(int.cases[0] ?? {}).sort()).toEqual(Object.keys(ext.cases[0] ?? {}).sort());
  });
  it('centre distance mn (z2 − z1)/2 = 8·52/2 = 208 mm (ISO 21771, zero shifts)', () => {
    expect(int.gear.centerDistance_mm).toBeCloseTo(208, 9);
  });
  it('lower Hertz stress, thicker film and lower flash temperature than the external pair, case by case', () => {
    for (let i = 0; i < ext.cases.length; i++) {
      const e = ext.cases[i];
      const n = int.cases[i];
      if (!e || !n) throw new Error('missing case');
      expect(n.maxHertzStress_MPa).toBeLessThan(e.maxHertzStress_MPa);
      expect(n.pitch.filmThicknessMin_um as number).toBeGreaterThan(e.pitch.filmThicknessMin_um as number);
      expect(n.maxFlashTemperature_K as number).toBeLessThan(e.maxFlashTemperature_K as number);
    }
  });
});

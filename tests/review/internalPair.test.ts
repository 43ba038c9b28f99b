import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { parseReviewValue } from '../../app/review/parse';
import { run } from '../../app/review/run';
import { EngineInputError } from '../../app/engine/diagnostics';
import { findNonFinite } from '../fuzz/fuzzer';

/**
 * The same pinion and duty in an external wheel and in a ring, through the whole review pipeline.
 * The expectations are consequences of the conformal radius ρred = ρ1ρ2/(ρ2 − ρ1) > ρ1ρ2/(ρ1 + ρ2)
 * (Hertz, Johnson §4.2): lower Hertz stress, a thicker film (h ∝ R^0.43 by Dowson–Higginson at equal
 * U and W per unit R) and less sliding, so a lower flash temperature.
 */
function reviewOf(kind: 'external' | 'internal', teeth: readonly [number, number] = [25, 77]) {
  const raw = JSON.parse(readFileSync('assets/demo/harrow-creek-conveyor-spur-pair.flankfilm.json', 'utf8'));
  raw.gearPair.kind = kind;
  raw.gearPair.pinion = { ...raw.gearPair.pinion, teeth: teeth[0], profileShift: 0 };
  raw.gearPair.wheel = { ...raw.gearPair.wheel, teeth: teeth[1], profileShift: 0 };
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
  it('a check on the ring names it a ring, as the sheet does (its field stays the wheel\'s)', () => {
    // z1 = 20 in a z2 = 62 ring, 8 mm module, no shifts: the ring's tip circle reaches past T1 (tip interference).
    let error: unknown = null;
    try {
      run(reviewOf('internal', [20, 62]));
    } catch (e) {
      error = e;
    }
    expect(error).toBeInstanceOf(EngineInputError);
    expect((error as EngineInputError).field).toBe('gearPair.wheel.tipDiameter_mm');
    expect((error as EngineInputError).message).toMatch(/^The ring tip reaches past T1 .* Enlarge the ring's inner \(tip\) diameter or add pinion profile shift\.$/);
  });
});

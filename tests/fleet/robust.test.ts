import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { EngineInputError } from '../../app/engine/diagnostics';
import { closestCell } from '../../app/fleet/fit';
import { runFleet } from '../../app/fleet/fleet';
import { parseOilsValue } from '../../app/fleet/oilsFile';
import type { FitCell } from '../../app/fleet/types';
import { HAND_FLEET, gearbox, parsed } from './fixtures';

const light = { source: 'g2', review: parsed(gearbox(HAND_FLEET[1] as (typeof HAND_FLEET)[number])) };
// Mostly plausible data sheets (so most reach the engine), now and then a wild value.
const wild = fc.oneof(fc.double({ min: -10, max: 1e6 }), fc.constant(Number.NaN), fc.constant(Infinity), fc.constant(0));
const num = (lo: number, hi: number) => fc.oneof({ weight: 8, arbitrary: fc.double({ min: lo, max: hi, noNaN: true }) }, { weight: 1, arbitrary: wild });
const oil = fc.record({
  name: fc.oneof({ weight: 9, arbitrary: fc.constant('') }, { weight: 1, arbitrary: fc.string({ maxLength: 3 }) }),
  kv40_mm2s: num(40, 3000),
  kv100_mm2s: num(2, 40),
  density15_kgm3: num(600, 1200),
  baseOil: fc.oneof({ weight: 9, arbitrary: fc.constantFrom('mineral', 'pao', 'ester') }, { weight: 1, arbitrary: fc.constant('tallow') }),
  chemistry: fc.constantFrom('r-and-o', 'anti-wear', 'extreme-pressure'),
  fzgFailureStage: fc.oneof(fc.integer({ min: 0, max: 14 }), fc.constant('>12')),
});

describe('candidate oils from anywhere', () => {
  it('are refused with a field path, or give a fleet with no NaN; never a crash', () => {
    let reached = 0;
    fc.assert(
      fc.property(fc.array(oil, { minLength: 0, maxLength: 3 }), (oils) => {
        // An empty name becomes a unique one; a generated name may clash, which the schema refuses.
        const named = oils.map((o, i) => ({ ...o, name: o.name || `oil ${i}` }));
        const p = parseOilsValue({ format: 'flankfilm.oils', version: 1, oils: named });
        if (!p.ok) {
          for (const i of p.issues) expect(i.path).toMatch(/^oils/);
          return;
        }
        reached++;
        try {
          const r = runFleet({ gearboxes: [light], oils: p.oils });
          for (const c of r.fit) {
            expect(Number.isFinite(c.dutyShareMet)).toBe(true);
            if (c.worstRatio !== null) expect(Number.isNaN(c.worstRatio)).toBe(false);
          }
          expect(r.fit).toHaveLength(p.oils.length);
        } catch (e) {
          expect(e).toBeInstanceOf(EngineInputError);
          expect((e as EngineInputError).field).toMatch(/^oils\[\d+\]/);
        }
      }),
      { seed: 424242, numRuns: 60 },
    );
    expect(reached).toBeGreaterThan(10); // the property must exercise the engine, not only the schema
  });
});

describe('the closest candidate for a gearbox none serves', () => {
  const cell = (oil: string, over: Partial<FitCell>): FitCell => ({ gearbox: 'g', oil, meets: false, shortfalls: ['film'], governingCase: 'c', code: 'aw-suffices', dutyShareMet: 0.5, worstRatio: 0.8, summary: '', ...over });
  it('prefers a verdict oil can meet, then fewer shortfalls, more duty met, a better worst ratio', () => {
    expect(closestCell([cell('a', { code: 'beyond-oil', shortfalls: ['beyond-oil'] }), cell('b', { shortfalls: ['film', 'chemistry'] })])?.oil).toBe('b');
    expect(closestCell([cell('a', { shortfalls: ['film', 'chemistry'] }), cell('b', {})])?.oil).toBe('b');
    expect(closestCell([cell('a', { dutyShareMet: 0.2 }), cell('b', { dutyShareMet: 0.9 })])?.oil).toBe('b');
    expect(closestCell([cell('a', { worstRatio: 0.5 }), cell('b', { worstRatio: 0.9 })])?.oil).toBe('b');
    expect(closestCell([cell('a', { shortfalls: ['not-computed'], worstRatio: null }), cell('b', { code: 'beyond-oil', shortfalls: ['beyond-oil'] })])?.oil).toBe('b');
    expect(closestCell([])).toBeNull();
  });
});

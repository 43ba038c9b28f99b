import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { readFileSync } from 'node:fs';
import { EngineInputError } from '../../app/engine/diagnostics';
import { parseReviewValue } from '../../app/review/parse';
import { run } from '../../app/review/run';
import { findNonFinite } from '../fuzz/fuzzer';

const SEED = 20261202;
const base = JSON.parse(readFileSync('assets/demo/harrow-creek-ball-mill-planetary.flankfilm.json', 'utf8'));

/**
 * Any tooth counts, planets, held member and shifts: the review either runs with finite figures
 * and the Willis identity, or is refused by the schema or with an EngineInputError that names a
 * field of the stage or of a load case. Never NaN, never an untyped throw.
 */
describe('planetary stage over random sets (property test, fast-check seed 20261202)', () => {
  it('refuses with a named field or gives finite results', () => {
    const seen = { schema: 0, refused: 0, ran: 0 };
    fc.assert(
      fc.property(
        fc.integer({ min: 8, max: 60 }),
        fc.integer({ min: 8, max: 60 }),
        // Mostly coaxial tooth counts and usual planet numbers, so that both branches are exercised.
        fc.constantFrom(0, 0, 0, 0, 0, -1, 2),
        fc.constantFrom(1, 2, 3, 3, 3, 4, 6),
        fc.constantFrom('ring', 'carrier', 'sun'),
        fc.option(fc.double({ min: -0.5, max: 0.8, noNaN: true }), { nil: undefined }),
        (zS, zP, dz, planets, held, xS) => {
          const raw = structuredClone(base);
          raw.planetary = { ...raw.planetary, planets, held, sun: { ...raw.planetary.sun, teeth: zS, profileShift: xS }, planet: { ...raw.planetary.planet, teeth: zP, profileShift: undefined }, ring: { ...raw.planetary.ring, teeth: zS + 2 * zP + dz, profileShift: undefined } };
          if (held === 'sun') raw.loadCases = raw.loadCases.map(({ sunSpeed_rpm, ...c }: Record<string, unknown>) => ({ ...c, carrierSpeed_rpm: sunSpeed_rpm }));
          const p = parseReviewValue(JSON.parse(JSON.stringify(raw)));
          if (!p.ok) {
            seen.schema++;
            return;
          }
          let r;
          try {
            r = run(p.review);
          } catch (e) {
            expect(e).toBeInstanceOf(EngineInputError);
            expect((e as EngineInputError).field).toMatch(/^(planetary\.|loadCases)/);
            seen.refused++;
            return;
          }
          seen.ran++;
          expect(findNonFinite(r)).toBeNull();
          const k = r.planetary?.loadCases[0];
          if (!k) throw new Error('no kinematics');
          // Willis: (nS − nC)/(nR − nC) = −zR/zS
          expect((k.sunSpeed_rpm - k.carrierSpeed_rpm) / (k.ringSpeed_rpm - k.carrierSpeed_rpm)).toBeCloseTo(-(zS + 2 * zP + dz) / zS, 9);
        },
      ),
      { numRuns: 60, seed: SEED },
    );
    // Both branches are exercised with this seed (else the property would prove little).
    console.log(`planetary property: ${JSON.stringify(seen)}`);
    expect(seen.ran).toBeGreaterThan(0);
    expect(seen.refused).toBeGreaterThan(0);
  });
});

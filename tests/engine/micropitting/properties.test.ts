import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { readFileSync } from 'node:fs';
import { parseReviewValue } from '../../../app/review/parse';
import { run } from '../../../app/review/run';
import type { Results } from '../../../app/review/results';

/**
 * Properties of λGF (ISO/TS 6336-22 with the ISO/TR 15144-1 film h ∝ (η vΣ)^0.7 [memory]): it rises
 * with viscosity and speed and falls with roughness, through the whole chain (the bulk temperature
 * moves with them). Gear and duty: the invented demo pair, on a light torque.
 */
const raw = JSON.parse(readFileSync('assets/demo/harrow-creek-crusher-hs-pair.flankfilm.json', 'utf8'));
const SEED = 20261202;
function mp(mutate: (r: any) => void): NonNullable<Results['cases'][number]['micropitting']> {
  const r = structuredClone(raw);
  r.policy = { ...r.policy, pathPoints: 61 };
  r.oils = [{ ...r.oils[0], micropittingFailureStage: 9 }];
  r.loadCases = [{ ...r.loadCases[0], power_kW: undefined, pinionTorque_Nm: 800 }];
  mutate(r);
  const p = parseReviewValue(r);
  if (!p.ok) throw new Error(JSON.stringify(p.issues));
  const m = run(p.review).cases[0]?.micropitting;
  if (!m) throw new Error('no micropitting result');
  return m;
}

describe('λGF properties (fast-check seed 20261202)', () => {
  it('λGF,min rises with viscosity (KV40 and KV100 scaled together)', () => {
    fc.assert(
      fc.property(fc.double({ min: 0.6, max: 1.5, noNaN: true }), fc.double({ min: 1.15, max: 1.6, noNaN: true }), (k, step) => {
        const scale = (f: number) => (r: any) => {
          r.oils[0].kv40_mm2s *= f;
          r.oils[0].kv100_mm2s *= f;
          r.oils[0].viscosityIndex = undefined;
        };
        expect(mp(scale(k * step)).lambdaGFMin).toBeGreaterThan(mp(scale(k)).lambdaGFMin);
      }),
      { numRuns: 8, seed: SEED },
    );
  });
  it('λGF,min rises with speed', () => {
    fc.assert(
      fc.property(fc.double({ min: 300, max: 2500, noNaN: true }), (rpm) => {
        const at = (n: number) => (r: any) => (r.loadCases[0].pinionSpeed_rpm = n);
        expect(mp(at(rpm * 1.3)).lambdaGFMin).toBeGreaterThan(mp(at(rpm)).lambdaGFMin);
      }),
      { numRuns: 8, seed: SEED },
    );
  });
  it('λGF,min falls with roughness; so does Sλ, while λGFT (the test gear\'s own roughness) stays', () => {
    fc.assert(
      fc.property(fc.double({ min: 0.1, max: 1.2, noNaN: true }), (ra) => {
        const at = (x: number) => (r: any) => {
          r.gearPair.pinion.roughnessRa_um = x;
          r.gearPair.wheel.roughnessRa_um = x;
        };
        const smooth = mp(at(ra));
        const rough = mp(at(ra * 1.5));
        expect(rough.lambdaGFMin).toBeLessThan(smooth.lambdaGFMin);
        expect(rough.safety ?? 0).toBeLessThan(smooth.safety ?? 0);
        expect(rough.lambdaGFT).toBe(smooth.lambdaGFT);
      }),
      { numRuns: 8, seed: SEED },
    );
  });
  it('Sλ is finite and never NaN over the duty space, and a higher failure stage never lowers it', () => {
    fc.assert(
      fc.property(fc.double({ min: 50, max: 4000, noNaN: true }), fc.double({ min: 100, max: 4000, noNaN: true }), fc.integer({ min: 5, max: 9 }), (rpm, torque, stage) => {
        const duty = (s: number) => (r: any) => {
          r.loadCases[0].pinionSpeed_rpm = rpm;
          r.loadCases[0].pinionTorque_Nm = torque;
          r.oils[0].micropittingFailureStage = s;
        };
        const lo = mp(duty(stage));
        const hi = mp(duty(stage + 1));
        expect(Number.isFinite(lo.safety)).toBe(true);
        expect(hi.safety ?? 0).toBeGreaterThan(lo.safety ?? 0);
      }),
      { numRuns: 8, seed: SEED },
    );
  });
});

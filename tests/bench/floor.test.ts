/**
 * The recompute's floor (scripts/bench/floor.ts): the transcendental operations are counted and
 * their arguments kept as they are called, including through a name a module kept, and the floor
 * loop repeats exactly those calls on those arguments.
 */
import { afterEach, describe, expect, it } from 'vitest';
import { floorLoop, installMathCounters, opCount } from '../../scripts/bench/floor';

let counters: ReturnType<typeof installMathCounters> | null = null;
afterEach(() => counters?.uninstall());

describe('the recompute floor', () => {
  it('counts each call of each function while counting, and nothing outside it', () => {
    const before = Math.log;
    counters = installMathCounters();
    const LN = Math.log; // as a module that keeps its own name for Math.log
    Math.exp(1);
    const ops = counters.count(() => {
      LN(2);
      Math.pow(2, 3);
      Math.pow(2, 0.5);
      Math.sqrt(4);
      Math.abs(-1); // not transcendental: not counted
    });
    expect(ops).toEqual({ log: 1, pow: 2, sqrt: 1 });
    expect(LN(Math.E)).toBe(1); // the wrapper returns what Math.log returns
    counters.uninstall();
    expect(Math.log).toBe(before);
  });

  it('a failing run still stops the counting', () => {
    counters = installMathCounters();
    expect(() => counters!.count(() => {
      Math.log(2);
      throw new Error('boom');
    })).toThrow('boom');
    expect(counters.count(() => undefined)).toEqual({});
  });

  it('keeps the arguments of each call in call order, both of a two-argument call', () => {
    counters = installMathCounters();
    const LN = Math.log;
    Math.exp(9); // outside the recording
    const args = counters.record(() => {
      LN(2);
      Math.pow(10, 0.5);
      LN(3);
      Math.pow(2, 3);
      Math.hypot(3, 4);
    });
    expect(Object.keys(args).sort()).toEqual(['hypot', 'log', 'pow']);
    expect(Array.from(args.log as Float64Array)).toEqual([2, 3]);
    expect(Array.from(args.pow as Float64Array)).toEqual([10, 0.5, 2, 3]);
    expect(opCount(args)).toEqual({ log: 2, pow: 2, hypot: 1 });
    expect(counters.record(() => undefined)).toEqual({});
  });

  it('the floor loop repeats the recorded calls on their own arguments', () => {
    const args = { log: Float64Array.of(2, 5, 0.3), pow: Float64Array.of(10, 0.5, 1.5, 0.62), sqrt: Float64Array.of(7) };
    const expected = Math.log(2) + Math.log(5) + Math.log(0.3) + Math.pow(10, 0.5) + Math.pow(1.5, 0.62) + Math.sqrt(7);
    expect(floorLoop(args)).toBeCloseTo(expected, 12);
    expect(floorLoop({})).toBe(0);
  });

  it('replaying a recording gives the results of the recorded calls', () => {
    // Record a few calls, then check that the replay computes the same results from the kept arguments.
    counters = installMathCounters();
    let direct = 0;
    const args = counters.record(() => {
      for (const x of [0.25, 3, 40]) direct += Math.log(x) + Math.exp(-x) + Math.pow(10, x / 50);
    });
    counters.uninstall();
    counters = null;
    expect(opCount(args)).toEqual({ log: 3, exp: 3, pow: 3 });
    let replayed = 0;
    for (const [k, a] of Object.entries(args)) replayed += floorLoop({ [k]: a });
    expect(replayed).toBeCloseTo(direct, 12);
  });
});

/**
 * The recompute's floor (scripts/bench/floor.ts): the transcendental operations are counted as they
 * are called, including through a name a module kept, and the floor loop does exactly that many.
 */
import { afterEach, describe, expect, it } from 'vitest';
import { floorLoop, installMathCounters } from '../../scripts/bench/floor';

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

  it('the floor loop does the operations it is given on varying arguments', () => {
    let expected = 0;
    for (let i = 0; i < 3; i++) expected += Math.log(1.0001 + i * 1e-7);
    for (let i = 0; i < 2; i++) expected += Math.pow(1.5 + i * 1e-7, 0.62);
    expect(floorLoop({ log: 3, pow: 2 })).toBe(expected);
    expect(floorLoop({})).toBe(0);
  });
});

/**
 * Path sampling (engine/kinematics/pathSampling.ts): n positions from A to E with B, C and D on the
 * grid, written into a column the caller gives (the mechanics carve it from their own buffer) or a
 * new one, the same numbers either way; the count is checked before anything is written.
 */
import { describe, expect, it } from 'vitest';
import { EngineInputError } from '../../../app/engine/diagnostics';
import { MAX_PATH_POINTS, requirePathPoints, samplePath } from '../../../app/engine/kinematics/pathSampling';
import type { PathPoints } from '../../../app/engine/geometry/types';
import { millimetres } from '../../../app/engine/units';

// Points A…E from T1 in the order a pair gives them (only their order and spacing matter here).
const points: PathPoints = { A: millimetres(10), B: millimetres(15.2), C: millimetres(17.5), D: millimetres(20.1), E: millimetres(25.3) };

describe('path sampling', () => {
  it('into a given column: the same positions as a new one, A first, E last, B, C and D on the grid', () => {
    const fresh = samplePath(points, 41);
    const out = new Float64Array(41);
    expect(samplePath(points, 41, out)).toBe(out);
    expect(Array.from(out)).toEqual(Array.from(fresh));
    expect(out[0]).toBe(points.A);
    expect(out[40]).toBe(points.E);
    for (const p of [points.B, points.C, points.D]) expect(Array.from(out)).toContain(p);
  });

  it('a column of the wrong length, or a count out of range, is refused before anything is written', () => {
    const short = new Float64Array(40);
    expect(() => samplePath(points, 41, short)).toThrow(RangeError);
    expect(short.every((x) => x === 0)).toBe(true);
    expect(() => requirePathPoints(MAX_PATH_POINTS + 1)).toThrow(EngineInputError);
    expect(() => requirePathPoints(20.5)).toThrow(/policy.pathPoints = 20.5 must be a whole number/);
    expect(requirePathPoints(201)).toBe(201);
  });
});

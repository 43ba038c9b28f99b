import { ColumnBlock } from '../columnBlock';
import { requirePositive } from '../diagnostics';
import { BLOK_CONSTANT_SEMI_WIDTH } from '../heat/blokFlash';
import { requireNonNegative } from '../film/inputChecks';
import type { ThermalContactCoefficient } from '../units';
import type { MeshMechanics } from './mechanics';

/**
 * The parts of Blok's flash temperature (heat/blokFlash.ts) along a path that do not depend on the
 * friction: θfl = (0.80 μ w |v1 − v2|) / (√bH (BM1 √v1 + BM2 √v2)). A load case's mechanics are
 * shared by all its oils, and only μ differs between them, so the denominator (the three square
 * roots) is worked out once per path; the slip is the mechanics' sliding velocity. The quotient is evaluated in the same order as
 * blokFlashTemperature, so the result is the same number to the last bit
 * (tests/engine/mesh/blokAlongPath.test.ts). Where v1 = v2 (no slip) the denominator is +∞ and θfl 0.
 */
interface BlokPath {
  readonly bM1: number;
  readonly bM2: number;
  /** √bH (BM1 √v1 + BM2 √v2); +∞ where v1 = v2. The slip |v1 − v2| is the mechanics' sliding velocity. */
  readonly denominator: Float64Array;
}

/** One per mechanics (a recompute's own objects, so nothing outlives the results they belong to). */
const paths = new WeakMap<MeshMechanics, BlokPath>();

function blokPath(m: MeshMechanics, bM1: ThermalContactCoefficient, bM2: ThermalContactCoefficient): BlokPath {
  const known = paths.get(m);
  if (known && known.bM1 === bM1 && known.bM2 === bM2) return known;
  requirePositive('bM1', bM1, 'W·s^0.5/(m²·K)');
  requirePositive('bM2', bM2, 'W·s^0.5/(m²·K)');
  const denominator = new ColumnBlock(m.n, 1).float64();
  for (let i = 0; i < m.n; i++) {
    const w = m.lineLoad[i] as number, v1 = m.v1[i] as number, v2 = m.v2[i] as number, bH = m.hertzSemiWidth[i] as number;
    requireNonNegative('w', w, 'N/m');
    requireNonNegative('v1', v1, 'm/s');
    requireNonNegative('v2', v2, 'm/s');
    requirePositive('bH', bH, 'm');
    denominator[i] = v1 === v2 ? Infinity : Math.sqrt(bH) * (bM1 * Math.sqrt(v1) + bM2 * Math.sqrt(v2));
  }
  const path = { bM1, bM2, denominator };
  paths.set(m, path);
  return path;
}

/**
 * Blok flash temperature θfl at every point of the path for the mean friction μ, into `out`
 * (K, a rise); returns θfl,max. Same validity and errors as heat/blokFlash.ts.
 */
export function blokFlashAlongPath(mu: number, m: MeshMechanics, bM1: ThermalContactCoefficient, bM2: ThermalContactCoefficient, out: Float64Array): number {
  requireNonNegative('mu', mu);
  const { denominator } = blokPath(m, bM1, bM2);
  const slip = m.slidingVelocity; // |v1 − v2|, the same number blokFlashTemperature forms
  let max = 0;
  for (let i = 0; i < m.n; i++) {
    const f = (BLOK_CONSTANT_SEMI_WIDTH * mu * (m.lineLoad[i] as number) * (slip[i] as number)) / (denominator[i] as number);
    out[i] = f;
    if (f > max) max = f;
  }
  return max;
}

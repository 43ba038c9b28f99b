import { EngineInputError } from '../diagnostics';

/**
 * Input checks that app/engine/diagnostics.ts does not provide (finite, and finite ≥ 0).
 * They allocate only when they throw, so they are safe in the hot loop along the path.
 */

/** Throw an EngineInputError unless `value` is a finite number. */
export function requireFinite(field: string, value: number, unit = ''): number {
  if (!Number.isFinite(value)) {
    const u = unit ? ` ${unit}` : '';
    throw new EngineInputError('input.not-finite', field, `finite${u}`, `${field} = ${String(value)} must be a finite number${u}.`);
  }
  return value;
}

/** Throw an EngineInputError unless `value` is finite and ≥ 0. */
export function requireNonNegative(field: string, value: number, unit = ''): number {
  if (!Number.isFinite(value) || value < 0) {
    const u = unit ? ` ${unit}` : '';
    throw new EngineInputError('input.negative', field, `≥ 0${u}`, `${field} = ${String(value)}${u} must be 0 or greater.`);
  }
  return value;
}

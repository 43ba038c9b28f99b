/**
 * Typed diagnostics. The engine never returns a silent NaN: an input outside a
 * formula's range either raises an {@link EngineInputError} (the result would be
 * meaningless) or adds an {@link EngineWarning} (the result is an extrapolation).
 * Both name the field and the limit.
 */
export type Severity = 'info' | 'warning' | 'error';

export interface EngineWarning {
  /** Stable machine code, e.g. `film.speed-parameter-range`. */
  readonly code: string;
  readonly severity: Severity;
  /** The input or derived quantity concerned, as a path, e.g. `oils[0].kv100_mm2s`. */
  readonly field: string;
  /** One sentence for an engineer, with the value and the limit. */
  readonly message: string;
}

export class EngineInputError extends Error {
  readonly code: string;
  readonly field: string;
  readonly limit: string;
  constructor(code: string, field: string, limit: string, message: string) {
    super(message);
    this.name = 'EngineInputError';
    this.code = code;
    this.field = field;
    this.limit = limit;
  }
}

/** Throw an EngineInputError unless `value` is a finite number inside [min, max]. */
export function requireInRange(field: string, value: number, min: number, max: number, unit = ''): number {
  if (!Number.isFinite(value) || value < min || value > max) {
    const u = unit ? ` ${unit}` : '';
    throw new EngineInputError(
      'input.out-of-range',
      field,
      `${min}…${max}${u}`,
      `${field} = ${String(value)}${u} is outside ${min}…${max}${u}.`,
    );
  }
  return value;
}

/** Throw an EngineInputError unless `value` is finite and strictly positive. */
export function requirePositive(field: string, value: number, unit = ''): number {
  if (!Number.isFinite(value) || value <= 0) {
    const u = unit ? ` ${unit}` : '';
    throw new EngineInputError('input.not-positive', field, `> 0${u}`, `${field} = ${String(value)}${u} must be greater than 0.`);
  }
  return value;
}

/** A place to collect warnings while a computation runs; duplicates (same code and field) are kept once. */
export class WarningSink {
  private readonly seen = new Set<string>();
  readonly items: EngineWarning[] = [];
  add(w: EngineWarning): void {
    const key = `${w.code}|${w.field}`;
    if (this.seen.has(key)) return;
    this.seen.add(key);
    this.items.push(w);
  }
}

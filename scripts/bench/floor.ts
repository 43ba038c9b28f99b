/**
 * The floor of the recompute: a bare loop doing the transcendental operations one recompute does,
 * as many of each kind. `floor_ratio` = recompute / floor, so it measures everything a recompute
 * spends besides its mathematics (allocation, objects, words, bookkeeping).
 *
 * The operations are recorded, not estimated: `installMathCounters` wraps every transcendental
 * function of `Math`, and the calls during one recompute are counted and their arguments kept. The
 * floor loop then repeats each call on its own arguments. An earlier hand count (film, Blok and
 * mechanics per point, a fixed 8 per grade-finder cell) missed the powers of the ASTM D341 and
 * ISO/TS 6336-20 formulas (Math.pow, about 45 ns each here) and counted square roots per oil that
 * are taken once per load case. A later floor did the counted calls on made-up arguments (log near
 * 1, exp near −1); those take the cheap paths of the library (here exp(−1.0001) 5.2 ns against 8.6 ns
 * over −20…5, pow(1.5, 0.62) 35 ns against 41–46 ns for the D341 powers of 10), which understated
 * the floor by about a sixth. The recording runs in a child process (opCountChild.ts), so the
 * timed code never sees the wrappers.
 */

/** How many calls of each Math function one recompute makes. */
export type OpCount = Readonly<Record<string, number>>;

/** The arguments of those calls per function, in call order; a two-argument call keeps both, one after the other. */
export type OpArguments = Readonly<Record<string, Float64Array>>;

/** The functions that take two arguments. */
const TWO_ARGUMENTS: ReadonlySet<string> = new Set(['pow', 'atan2', 'hypot']);

/** The number of calls the arguments stand for, per function. */
export function opCount(args: OpArguments): OpCount {
  return Object.fromEntries(Object.entries(args).map(([k, a]) => [k, TWO_ARGUMENTS.has(k) ? a.length / 2 : a.length]));
}

/** The functions counted: every transcendental one of Math (sqrt included; abs, min, max, floor are not). */
export const COUNTED = ['sqrt', 'cbrt', 'exp', 'expm1', 'log', 'log1p', 'log2', 'log10', 'pow', 'sin', 'cos', 'tan', 'asin', 'acos', 'atan', 'atan2', 'sinh', 'cosh', 'tanh', 'hypot'] as const;
type Counted = (typeof COUNTED)[number];

/**
 * Wraps every counted Math function with a counter that counts while `counting` is on. Install it
 * before the engine is imported: a module that keeps `const LN = Math.log` holds what it found then.
 */
export function installMathCounters(): { count(fn: () => void): OpCount; record(fn: () => void): OpArguments; uninstall(): void } {
  const m = Math as unknown as Record<Counted, (...a: number[]) => number>;
  const counts = Object.fromEntries(COUNTED.map((k) => [k, 0])) as Record<Counted, number>;
  const kept = Object.fromEntries(COUNTED.map((k) => [k, [] as number[]])) as Record<Counted, number[]>;
  let counting = false;
  let keeping = false;
  const originals = COUNTED.map((k) => [k, m[k]] as const);
  for (const k of COUNTED) {
    const f = m[k];
    const two = TWO_ARGUMENTS.has(k);
    m[k] = (...a: number[]) => {
      if (counting) counts[k]++;
      if (keeping) {
        kept[k].push(a[0] as number);
        if (two) kept[k].push(a[1] as number);
      }
      return f(...a);
    };
  }
  return {
    count(fn) {
      for (const k of COUNTED) counts[k] = 0;
      counting = true;
      try {
        fn();
      } finally {
        counting = false;
      }
      return Object.fromEntries(Object.entries(counts).filter(([, n]) => n > 0));
    },
    record(fn) {
      for (const k of COUNTED) kept[k] = [];
      keeping = true;
      try {
        fn();
      } finally {
        keeping = false;
      }
      return Object.fromEntries(Object.entries(kept).filter(([, a]) => a.length > 0).map(([k, a]) => [k, Float64Array.from(a)]));
    },
    uninstall() {
      for (const [k, f] of originals) m[k] = f;
    },
  };
}

/**
 * The recorded calls again, each function on its own arguments in its own loop, calling Math
 * directly and summing so the loop cannot be dropped: the floor holds the operations, the reading
 * of their arguments and a loop counter, no calls of ours.
 */
export function floorLoop(args: OpArguments): number {
  let acc = 0;
  for (const [k, x] of Object.entries(args)) {
    const n = x.length;
    switch (k as Counted) {
      case 'sqrt':
        for (let i = 0; i < n; i++) acc += Math.sqrt(x[i] as number);
        break;
      case 'cbrt':
        for (let i = 0; i < n; i++) acc += Math.cbrt(x[i] as number);
        break;
      case 'exp':
        for (let i = 0; i < n; i++) acc += Math.exp(x[i] as number);
        break;
      case 'expm1':
        for (let i = 0; i < n; i++) acc += Math.expm1(x[i] as number);
        break;
      case 'log':
        for (let i = 0; i < n; i++) acc += Math.log(x[i] as number);
        break;
      case 'log1p':
        for (let i = 0; i < n; i++) acc += Math.log1p(x[i] as number);
        break;
      case 'log2':
        for (let i = 0; i < n; i++) acc += Math.log2(x[i] as number);
        break;
      case 'log10':
        for (let i = 0; i < n; i++) acc += Math.log10(x[i] as number);
        break;
      case 'pow':
        for (let i = 0; i < n; i += 2) acc += Math.pow(x[i] as number, x[i + 1] as number);
        break;
      case 'sin':
        for (let i = 0; i < n; i++) acc += Math.sin(x[i] as number);
        break;
      case 'cos':
        for (let i = 0; i < n; i++) acc += Math.cos(x[i] as number);
        break;
      case 'tan':
        for (let i = 0; i < n; i++) acc += Math.tan(x[i] as number);
        break;
      case 'asin':
        for (let i = 0; i < n; i++) acc += Math.asin(x[i] as number);
        break;
      case 'acos':
        for (let i = 0; i < n; i++) acc += Math.acos(x[i] as number);
        break;
      case 'atan':
        for (let i = 0; i < n; i++) acc += Math.atan(x[i] as number);
        break;
      case 'atan2':
        for (let i = 0; i < n; i += 2) acc += Math.atan2(x[i] as number, x[i + 1] as number);
        break;
      case 'sinh':
        for (let i = 0; i < n; i++) acc += Math.sinh(x[i] as number);
        break;
      case 'cosh':
        for (let i = 0; i < n; i++) acc += Math.cosh(x[i] as number);
        break;
      case 'tanh':
        for (let i = 0; i < n; i++) acc += Math.tanh(x[i] as number);
        break;
      case 'hypot':
        for (let i = 0; i < n; i += 2) acc += Math.hypot(x[i] as number, x[i + 1] as number);
        break;
    }
  }
  return acc;
}

/**
 * The floor of the recompute: a bare loop doing the transcendental operations one recompute does,
 * as many of each kind. `floor_ratio` = recompute / floor, so it measures everything a recompute
 * spends besides its mathematics (allocation, objects, words, bookkeeping).
 *
 * The operations are counted, not estimated: `installMathCounters` wraps every transcendental
 * function of `Math`, and the calls during one recompute are counted. An earlier hand count (film, Blok and
 * mechanics per point, a fixed 8 per grade-finder cell) missed the powers of the ASTM D341 and
 * ISO/TS 6336-20 formulas (Math.pow, about 45 ns each here) and counted square roots per oil that
 * are taken once per load case. The count runs in a child process (opCountChild.ts), so the
 * timed code never sees the wrappers.
 */

/** How many calls of each Math function one recompute makes. */
export type OpCount = Readonly<Record<string, number>>;

/** The functions counted: every transcendental one of Math (sqrt included; abs, min, max, floor are not). */
export const COUNTED = ['sqrt', 'cbrt', 'exp', 'expm1', 'log', 'log1p', 'log2', 'log10', 'pow', 'sin', 'cos', 'tan', 'asin', 'acos', 'atan', 'atan2', 'sinh', 'cosh', 'tanh', 'hypot'] as const;
type Counted = (typeof COUNTED)[number];

/**
 * Wraps every counted Math function with a counter that counts while `counting` is on. Install it
 * before the engine is imported: a module that keeps `const LN = Math.log` holds what it found then.
 */
export function installMathCounters(): { count(fn: () => void): OpCount; uninstall(): void } {
  const m = Math as unknown as Record<Counted, (...a: number[]) => number>;
  const counts = Object.fromEntries(COUNTED.map((k) => [k, 0])) as Record<Counted, number>;
  let counting = false;
  const originals = COUNTED.map((k) => [k, m[k]] as const);
  for (const k of COUNTED) {
    const f = m[k];
    m[k] = (...a: number[]) => {
      if (counting) counts[k]++;
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
    uninstall() {
      for (const [k, f] of originals) m[k] = f;
    },
  };
}

/**
 * The same count of operations on arguments that vary with i (inside each domain), summed so the
 * loop cannot be dropped. Each function has its own loop, calling Math directly, so the floor holds
 * the operations and a loop counter, no calls of ours.
 */
export function floorLoop(ops: OpCount): number {
  let acc = 0;
  for (const [k, n] of Object.entries(ops)) {
    switch (k as Counted) {
      case 'sqrt':
        for (let i = 0; i < n; i++) acc += Math.sqrt(1.0001 + i * 1e-7);
        break;
      case 'cbrt':
        for (let i = 0; i < n; i++) acc += Math.cbrt(1.0001 + i * 1e-7);
        break;
      case 'exp':
        for (let i = 0; i < n; i++) acc += Math.exp(-1.0001 - i * 1e-9);
        break;
      case 'expm1':
        for (let i = 0; i < n; i++) acc += Math.expm1(0.01 + i * 1e-9);
        break;
      case 'log':
        for (let i = 0; i < n; i++) acc += Math.log(1.0001 + i * 1e-7);
        break;
      case 'log1p':
        for (let i = 0; i < n; i++) acc += Math.log1p(0.01 + i * 1e-9);
        break;
      case 'log2':
        for (let i = 0; i < n; i++) acc += Math.log2(1.0001 + i * 1e-7);
        break;
      case 'log10':
        for (let i = 0; i < n; i++) acc += Math.log10(1.0001 + i * 1e-7);
        break;
      case 'pow':
        for (let i = 0; i < n; i++) acc += Math.pow(1.5 + i * 1e-7, 0.62);
        break;
      case 'sin':
        for (let i = 0; i < n; i++) acc += Math.sin(0.3 + i * 1e-9);
        break;
      case 'cos':
        for (let i = 0; i < n; i++) acc += Math.cos(0.3 + i * 1e-9);
        break;
      case 'tan':
        for (let i = 0; i < n; i++) acc += Math.tan(0.3 + i * 1e-9);
        break;
      case 'asin':
        for (let i = 0; i < n; i++) acc += Math.asin(0.3 + i * 1e-9);
        break;
      case 'acos':
        for (let i = 0; i < n; i++) acc += Math.acos(0.3 + i * 1e-9);
        break;
      case 'atan':
        for (let i = 0; i < n; i++) acc += Math.atan(0.3 + i * 1e-9);
        break;
      case 'atan2':
        for (let i = 0; i < n; i++) acc += Math.atan2(0.3 + i * 1e-9, 1);
        break;
      case 'sinh':
        for (let i = 0; i < n; i++) acc += Math.sinh(0.3 + i * 1e-9);
        break;
      case 'cosh':
        for (let i = 0; i < n; i++) acc += Math.cosh(0.3 + i * 1e-9);
        break;
      case 'tanh':
        for (let i = 0; i < n; i++) acc += Math.tanh(0.3 + i * 1e-9);
        break;
      case 'hypot':
        for (let i = 0; i < n; i++) acc += Math.hypot(0.3 + i * 1e-9, 1);
        break;
    }
  }
  return acc;
}

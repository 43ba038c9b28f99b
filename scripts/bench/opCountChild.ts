/**
 * Records the transcendental operations of one timed recompute (floor.ts) in a process of its own:
 * which Math functions it calls, and on what arguments. Prints them as JSON on stdout (function →
 * arguments; JSON keeps every double exactly). The wrappers go in before the engine is imported. The review is
 * the bench's workload after a torque edit, as the timed recompute is: the first run fills what is
 * kept per oil model, the second is recorded.
 */
import { installMathCounters } from './floor';

const counters = installMathCounters();
const { run } = await import('../../app/review/run');
const { recomputeEdits } = await import('./workloads');
const [first, second] = recomputeEdits(400, 2);
if (!first || !second) throw new Error('opCountChild: no workload');
run(first);
const args = counters.record(() => run(second));
process.stdout.write(`${JSON.stringify(Object.fromEntries(Object.entries(args).map(([k, a]) => [k, Array.from(a)])))}\n`);

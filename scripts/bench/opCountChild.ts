/**
 * Counts the transcendental operations of one timed recompute (floor.ts) in a process of its own,
 * and prints them as JSON on stdout. The counters go in before the engine is imported. The review is
 * the bench's workload after a torque edit, as the timed recompute is: the first run fills what is
 * kept per oil model, the second is counted.
 */
import { installMathCounters } from './floor';

const counters = installMathCounters();
const { run } = await import('../../app/review/run');
const { recomputeEdits } = await import('./workloads');
const [first, second] = recomputeEdits(400, 2);
if (!first || !second) throw new Error('opCountChild: no workload');
run(first);
process.stdout.write(`${JSON.stringify(counters.count(() => run(second)))}\n`);

/**
 * One `review FILE --json` through the CLI's own code path, in a fresh process, reporting its wall
 * time and peak resident memory on stderr as JSON (scripts/bench.ts starts it per review shape).
 *   npx tsx scripts/bench/largestReviewChild.ts REVIEW.json
 */
import { runCli } from '../../app/cli/runCli';

const file = process.argv[2] as string;
let bytes = 0;
const start = performance.now();
const code = await runCli(['review', file, '--json'], { out: (s) => void (bytes += Buffer.byteLength(s)), err: (s) => void process.stderr.write(s) });
const ms = performance.now() - start;
process.stderr.write(`\n${JSON.stringify({ code, ms, rss_mb: process.resourceUsage().maxRSS / 1024, json_mb: bytes / 2 ** 20 })}\n`);

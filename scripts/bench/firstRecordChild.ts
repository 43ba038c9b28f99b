/**
 * The demo's record made once in a fresh process, as one export costs in the app (each export runs
 * in a new worker thread, main/recordWorker.ts) and as `review --pdf` does: run(), the operating maps,
 * the PDF. The modules are loaded before the clock starts; what is timed is the first, unwarmed
 * record. Prints {"ms": …} on stdout.
 */
import { renderRecord } from '../../app/report/record';
import { operatingMaps } from '../../app/review/operatingMaps';
import { run } from '../../app/review/run';
import { parsed, rawDemo } from './workloads';

const demo = parsed(rawDemo());
const start = performance.now();
await renderRecord(demo, run(demo), { maps: operatingMaps(demo) ?? [] });
process.stdout.write(`${JSON.stringify({ ms: performance.now() - start })}\n`);

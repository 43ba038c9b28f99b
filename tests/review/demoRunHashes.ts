/**
 * Hashes of what run() gives for each shipped review: the whole results and each of their parts
 * (a load case × oil, the grade finder, the need, the changes …), so that a change of results shows
 * which part moved. JSON.stringify writes every number in its shortest round-trip form, so equal
 * hashes mean bit-identical numbers. Shared by the snapshot test and scripts/snapshotDemoRuns.ts.
 */
import { readFileSync, readdirSync } from 'node:fs';
import { join } from 'node:path';
import { parseReviewValue } from '../../app/review/parse';
import { run } from '../../app/review/run';
import { sha256Hex } from '../../app/review/fingerprint';
import { resultsJson } from '../../app/review/pathSeries';

export const SHIPPED_REVIEWS = ['assets/demo', 'assets/demo/fleet'].flatMap((d) =>
  readdirSync(d)
    .filter((f) => f.endsWith('.flankfilm.json'))
    .sort()
    .map((f) => join(d, f)),
);

export type RunHashes = Record<string, string>;

export function demoRunHashes(file: string): RunHashes {
  const parsed = parseReviewValue(JSON.parse(readFileSync(file, 'utf8')));
  if (!parsed.ok) throw new Error(`${file}: ${JSON.stringify(parsed.issues)}`);
  // As JSON writes them (`review --json`): the path as one object per point.
  const results = resultsJson(run(parsed.review)) as unknown as Record<string, unknown>;
  const out: RunHashes = { whole: sha256Hex(JSON.stringify(results)) };
  for (const [key, value] of Object.entries(results)) {
    if (key === 'cases' && Array.isArray(value)) {
      value.forEach((c: { loadCase: string; oil: string | null; mesh?: string }, i) => {
        out[`cases[${i}] ${c.mesh ? `${c.mesh} ` : ''}${c.loadCase} × ${c.oil ?? 'no oil'}`] = sha256Hex(JSON.stringify(c));
      });
    } else out[key] = sha256Hex(JSON.stringify(value));
  }
  return out;
}

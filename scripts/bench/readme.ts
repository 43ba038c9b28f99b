/**
 * Regenerates the README's performance table from bench-results.json (`npm run bench` calls it;
 * `npx tsx scripts/bench/readme.ts` redoes it from the last results).
 */
import { readFileSync, writeFileSync } from 'node:fs';
import { withReadmeTable, type BenchResults } from './targets';

export function updateReadme(results = 'bench-results.json', readme = 'README.md'): void {
  const r = JSON.parse(readFileSync(results, 'utf8')) as BenchResults;
  writeFileSync(readme, withReadmeTable(readFileSync(readme, 'utf8'), r));
  console.log(`regenerated the performance table of ${readme} from ${results}`);
}

if (import.meta.url === `file://${process.argv[1]}`) updateReadme();

/**
 * Rewrites tests/review/fixtures/demoRuns.json, the bit-identity snapshot of run() on the shipped
 * reviews (tests/review/runSnapshot.test.ts). Run it only when a change of results is intended
 * (a method corrected, a demo edited) or when a new Node changes the last bit of Math.exp, and say
 * why in the commit: a speed-up must leave the snapshot as it is.
 *   npx tsx scripts/snapshotDemoRuns.ts
 */
import { writeFileSync } from 'node:fs';
import { SHIPPED_REVIEWS, demoRunHashes } from '../tests/review/demoRunHashes';

const snapshot = { node: process.version, reviews: Object.fromEntries(SHIPPED_REVIEWS.map((f) => [f, demoRunHashes(f)])) };
writeFileSync('tests/review/fixtures/demoRuns.json', `${JSON.stringify(snapshot, null, 2)}\n`);
console.log(`wrote tests/review/fixtures/demoRuns.json (${SHIPPED_REVIEWS.length} reviews, ${process.version})`);

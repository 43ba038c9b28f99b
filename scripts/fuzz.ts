/** `npm run fuzz -- --runs N [--seed S]`: the review fuzzer at any size (npm test runs ~300 cases). */
import { parseArgs } from 'node:util';
import { fuzz, summaryLine } from '../tests/fuzz/fuzzer';
import { fuzzOutputs } from '../tests/fuzz/outputs';

const { values } = parseArgs({ options: { runs: { type: 'string', default: '1000' }, seed: { type: 'string' }, 'record-every': { type: 'string', default: '200' } } });
const seed = values.seed !== undefined ? Number(values.seed) : Date.now() % 2 ** 31;
const runs = Number(values.runs);
console.log(`fuzz: seed ${seed}`);
const s = await fuzz({ runs, seed, recordEvery: Number(values['record-every']), ...fuzzOutputs() });
for (const p of s.firstProblems) console.log(`  ${p}`);
if (s.rejectedWithoutPath) console.log(`fuzz: ${s.rejectedWithoutPath} rejections without a field path`);
console.log(summaryLine(s));
process.exitCode = s.crashes > 0 || s.nonFinite > 0 || s.rejectedWithoutPath > 0 ? 1 : 0;

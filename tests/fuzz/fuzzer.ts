/**
 * The review fuzzer: random and mutated review files through schema → run() → CSV (and, for a
 * sample, the record's text). It counts crashes (any exception that is not a typed rejection),
 * non-finite numbers reaching an output, and rejections, each of which must name a field path.
 */
import fc from 'fast-check';
import { readFileSync } from 'node:fs';
import { EngineInputError } from '../../app/engine/diagnostics';
import { parseReviewText } from '../../app/review/parse';
import { run } from '../../app/review/run';
import type { Results } from '../../app/review/results';
import type { Review } from '../../app/review/schema';

export interface FuzzOptions {
  readonly runs: number;
  readonly seed: number;
  /** Render the record for every k-th accepted case and check its text (0: never). */
  readonly recordEvery?: number;
  /** Extra output check for sampled cases (the record's text); returns the text to scan. */
  readonly recordText?: (review: Review, results: Results) => Promise<string>;
  readonly csv?: (results: Results) => string;
}

export interface FuzzSummary {
  cases: number;
  crashes: number;
  nonFinite: number;
  rejected: number;
  rejectedWithoutPath: number;
  firstProblems: string[];
}

const DEMOS = ['assets/demo/harrow-creek-crusher-hs-pair.flankfilm.json', 'assets/demo/harrow-creek-conveyor-spur-pair.flankfilm.json'].map((f) => JSON.parse(readFileSync(f, 'utf8')) as Record<string, unknown>);

type Json = null | boolean | number | string | Json[] | { [k: string]: Json };

/** Every leaf path of a JSON value. */
function leafPaths(v: Json, prefix: Array<string | number> = []): Array<Array<string | number>> {
  if (v !== null && typeof v === 'object') {
    const entries = Array.isArray(v) ? v.map((x, i) => [i, x] as const) : Object.entries(v);
    return entries.flatMap(([k, x]) => leafPaths(x as Json, [...prefix, k]));
  }
  return [prefix];
}

function setAt(root: Json, path: Array<string | number>, value: Json | undefined): void {
  let o = root as Record<string | number, Json>;
  for (const k of path.slice(0, -1)) o = o[k] as Record<string | number, Json>;
  const last = path[path.length - 1] as string | number;
  if (value === undefined) delete o[last];
  else o[last] = value;
}

const oddValue: fc.Arbitrary<Json | undefined> = fc.oneof(
  fc.constantFrom<Json | undefined>(0, -0, -1, 1e308, -1e308, 5e-324, 1e-12, 1e12, '', 'x', '>12', true, null, [], {}, undefined, 2.5, 12, 13, 1000, 200, -40, 201),
  fc.double({ noNaN: true, noDefaultInfinity: true }),
  fc.integer({ min: -1000, max: 100000 }),
  fc.string({ maxLength: 8 }),
);

/** A mutated demo review: a few leaves changed, deleted, or an odd key added. */
const mutatedReview: fc.Arbitrary<string> = fc
  .tuple(fc.nat({ max: DEMOS.length - 1 }), fc.array(fc.tuple(fc.nat(), oddValue), { minLength: 1, maxLength: 4 }), fc.constantFrom('none', 'proto', 'unknown', 'truncate'))
  .map(([d, edits, extra]) => {
    const r = structuredClone(DEMOS[d]) as Json;
    const paths = leafPaths(r);
    for (const [i, v] of edits) setAt(r, paths[i % paths.length] as Array<string | number>, v);
    let text = JSON.stringify(r);
    if (extra === 'proto') text = text.replace('"gearPair":{', '"gearPair":{"__proto__":{"polluted":true},');
    if (extra === 'unknown') text = text.replace('"policy":{', '"policy":{"surprise":1,');
    if (extra === 'truncate') text = text.slice(0, Math.floor(text.length * 0.7));
    return text;
  });

/** A review drawn inside the schema's ranges: it explores the physics, not the parser. */
const plausibleReview: fc.Arbitrary<string> = fc
  .record({
    z1: fc.integer({ min: 8, max: 60 }),
    ratio: fc.double({ min: 1, max: 7, noNaN: true }),
    mn: fc.double({ min: 1, max: 20, noNaN: true }),
    beta: fc.double({ min: 0, max: 35, noNaN: true }),
    bPerM: fc.double({ min: 5, max: 40, noNaN: true }),
    x1: fc.double({ min: -0.3, max: 0.8, noNaN: true }),
    x2: fc.double({ min: -0.5, max: 0.6, noNaN: true }),
    ra: fc.double({ min: 0.1, max: 2, noNaN: true }),
    rpm: fc.double({ min: 1, max: 6000, noNaN: true }),
    torque: fc.double({ min: 1, max: 50000, noNaN: true }),
    ka: fc.double({ min: 1, max: 2.5, noNaN: true }),
    temp: fc.double({ min: -30, max: 150, noNaN: true }),
    kv40: fc.double({ min: 10, max: 3000, noNaN: true }),
    viRatio: fc.double({ min: 0.04, max: 0.3, noNaN: true }),
    stage: fc.oneof(fc.integer({ min: 1, max: 12 }), fc.constant('>12' as const)),
    baseOil: fc.constantFrom('mineral', 'pao', 'pag-insoluble', 'pag-soluble', 'ester', 'phosphate-ester', 'traction'),
    spray: fc.boolean(),
    film: fc.constantFrom('dowson-higginson', 'pan-hamrock'),
    thermal: fc.boolean(),
  })
  .map((p) =>
    JSON.stringify({
      format: 'flankfilm.review',
      version: 1,
      title: 'fuzz',
      gearPair: {
        normalModule_mm: p.mn,
        helixAngle_deg: p.beta,
        faceWidth_mm: p.bPerM * p.mn,
        pinion: { teeth: p.z1, profileShift: p.x1, roughnessRa_um: p.ra, material: 'steel-carburized' },
        wheel: { teeth: Math.round(p.z1 * p.ratio), profileShift: p.x2, roughnessRa_um: p.ra, material: 'steel-through-hardened' },
      },
      loadCases: [{ name: 'c', pinionSpeed_rpm: p.rpm, pinionTorque_Nm: p.torque, applicationFactor: p.ka, oilTemperature_C: p.temp, lubrication: p.spray ? 'spray' : 'dip' }],
      oils: [{ name: 'o', kv40_mm2s: p.kv40, kv100_mm2s: Math.max(2, p.kv40 * p.viRatio), density15_kgm3: 880, baseOil: p.baseOil, chemistry: 'anti-wear', fzgFailureStage: p.stage }],
      policy: { pathPoints: 41, filmFormula: p.film, thermalFilmCorrection: p.thermal },
    }),
  );

/** Any non-finite number anywhere in a results object (JSON.stringify would hide NaN as null). */
export function findNonFinite(v: unknown, path = ''): string | null {
  if (typeof v === 'number') return Number.isFinite(v) ? null : `${path} = ${v}`;
  if (v && typeof v === 'object') {
    for (const [k, x] of Object.entries(v)) {
      const hit = findNonFinite(x, `${path}.${k}`);
      if (hit) return hit;
    }
  }
  return null;
}

export async function fuzz(options: FuzzOptions): Promise<FuzzSummary> {
  const s: FuzzSummary = { cases: 0, crashes: 0, nonFinite: 0, rejected: 0, rejectedWithoutPath: 0, firstProblems: [] };
  const note = (t: string) => s.firstProblems.length < 10 && s.firstProblems.push(t);
  const samples = fc.sample(fc.oneof(mutatedReview, plausibleReview), { numRuns: options.runs, seed: options.seed });
  let accepted = 0;
  for (const text of samples) {
    s.cases++;
    try {
      const parsed = parseReviewText(text);
      if (!parsed.ok) {
        s.rejected++;
        if (parsed.issues.some((i) => !i.path)) {
          s.rejectedWithoutPath++;
          note(`rejection without a path: ${JSON.stringify(parsed.issues)}`);
        }
        continue;
      }
      let results: Results;
      try {
        results = run(parsed.review);
      } catch (e) {
        if (e instanceof EngineInputError) {
          s.rejected++;
          if (!e.field) {
            s.rejectedWithoutPath++;
            note(`engine rejection without a field: ${e.message}`);
          }
          continue;
        }
        throw e;
      }
      const bad = findNonFinite(results);
      const csv = options.csv?.(results) ?? '';
      let recordText = '';
      accepted++;
      if (options.recordText && options.recordEvery && accepted % options.recordEvery === 0) recordText = await options.recordText(parsed.review, results);
      if (bad || /NaN|Infinity/.test(csv) || /NaN|Infinity/.test(recordText)) {
        s.nonFinite++;
        note(`non-finite output ${bad ?? '(CSV or record text)'} for ${text.slice(0, 300)}`);
      }
      if (({} as Record<string, unknown>).polluted !== undefined) throw new Error('prototype polluted');
    } catch (e) {
      s.crashes++;
      note(`crash: ${(e as Error).stack?.split('\n').slice(0, 3).join(' | ')} for ${text.slice(0, 300)}`);
    }
  }
  return s;
}

export function summaryLine(s: FuzzSummary): string {
  return `fuzz: ${s.cases} cases, ${s.crashes} crashes, ${s.nonFinite} non-finite, ${s.rejected} rejected`;
}

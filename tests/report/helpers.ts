import { SCUFFING_METHODS } from '../../app/engine/mesh/types';
import { execFileSync, spawnSync } from 'node:child_process';
import { mkdirSync, mkdtempSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { Results } from '../../app/review/results';
import { run } from '../../app/review/run';
import type { Review } from '../../app/review/schema';
import { MATERIAL_PRESETS } from '../../app/engine/materials';
import { BASE_OILS, CHEMISTRIES } from '../../app/engine/oil/types';
import { parseReviewText, parseReviewValue } from '../../app/review/parse';
import { COMPONENTS, DECISIONS, FILM_FORMULAS } from '../../app/review/schema';

export const DEMO_DIR = 'assets/demo';
export const DEMOS = ['harrow-creek-crusher-hs-pair.flankfilm.json', 'harrow-creek-conveyor-spur-pair.flankfilm.json', 'harrow-creek-ball-mill-planetary.flankfilm.json'] as const;
export const CRUSHER = join(DEMO_DIR, DEMOS[0]);

export function parseOrThrow(text: string): Review {
  const p = parseReviewText(text);
  if (!p.ok) throw new Error(p.issues.map((i) => `${i.path}: ${i.message}`).join('\n'));
  return p.review;
}

export function loadDemo(file: string = DEMOS[0]): { review: Review; results: Results; text: string } {
  const text = readFileSync(join(DEMO_DIR, file), 'utf8');
  const review = parseOrThrow(text);
  return { review, results: run(review), text };
}

export function tempDir(prefix = 'flankfilm-report-'): string {
  return mkdtempSync(join(tmpdir(), prefix));
}

/** Where rendered pages are kept for a human to look at (git-ignored). */
export function outputDir(sub: string): string {
  const d = join('test-output', sub);
  mkdirSync(d, { recursive: true });
  return d;
}

/** Run a poppler tool and return its stdout (throws on a non-zero exit). */
export function tool(cmd: string, args: string[]): string {
  return execFileSync(cmd, args, { encoding: 'utf8', maxBuffer: 64 * 1024 * 1024 });
}

export function toolResult(cmd: string, args: string[]): { status: number | null; out: string } {
  const r = spawnSync(cmd, args, { encoding: 'utf8', maxBuffer: 64 * 1024 * 1024 });
  return { status: r.status, out: `${r.stdout}${r.stderr}` };
}

export function pdfPages(path: string): number {
  const m = /^Pages:\s+(\d+)/m.exec(tool('pdfinfo', [path]));
  if (!m) throw new Error('pdfinfo printed no page count');
  return Number(m[1]);
}

/** Every leaf (a primitive value) of a JSON value, with its path as a list of keys. */
export function leafPaths(value: unknown, prefix: Array<string | number> = []): Array<Array<string | number>> {
  if (value === null || typeof value !== 'object') return [prefix];
  const entries: Array<[string | number, unknown]> = Array.isArray(value) ? value.map((v, i) => [i, v]) : Object.entries(value as Record<string, unknown>);
  return entries.flatMap(([k, v]) => (v === undefined ? [] : leafPaths(v, [...prefix, k])));
}

export function getAt(obj: unknown, path: ReadonlyArray<string | number>): unknown {
  return path.reduce<unknown>((o, k) => (o as Record<string | number, unknown>)[k], obj);
}

export function setAt<T>(obj: T, path: ReadonlyArray<string | number>, value: unknown): T {
  const copy = structuredClone(obj) as unknown;
  let o = copy as Record<string | number, unknown>;
  for (const k of path.slice(0, -1)) o = o[k] as Record<string | number, unknown>;
  o[path[path.length - 1] as string | number] = value;
  return copy as T;
}


const ENUM_VALUES: readonly string[] = [...MATERIAL_PRESETS, ...BASE_OILS, ...CHEMISTRIES, ...COMPONENTS, ...DECISIONS, ...FILM_FORMULAS, ...SCUFFING_METHODS, 'in-service', 'proposed', 'candidate', 'dip', 'spray', 'si', 'us'];

/** Candidate edits of one leaf value, most natural first. */
export function candidateEdits(v: unknown): unknown[] {
  if (typeof v === 'boolean') return [!v];
  if (typeof v === 'number') return Number.isInteger(v) ? [v + 1, v - 1, v * 1.01, v * 0.99] : [v * 1.01, v * 0.99, v + 0.01, v - 0.01];
  if (typeof v === 'string') {
    if (/^\d{4}-\d{2}-\d{2}$/.test(v)) return [v === '2025-01-02' ? '2025-01-03' : '2025-01-02'];
    return [...ENUM_VALUES.filter((e) => e !== v), `${v} (edited)`, 12, 7];
  }
  return [];
}

/** Paths of the leaves a reviewer can edit: all but the format tag, the version and the two sign-off fields the fingerprint leaves out. */
export function editableLeaves(review: Review): Array<Array<string | number>> {
  const skip = new Set(['format', 'version', 'signoff.fingerprint', 'signoff.signedAt']);
  return leafPaths(review).filter((p) => !skip.has(p.join('.')));
}

/** The review with one leaf changed to the first candidate the schema (and, if asked, the engine) accepts; null if none. */
export function editLeaf(review: Review, path: ReadonlyArray<string | number>, mustRun = false): Review | null {
  for (const c of candidateEdits(getAt(review, path))) {
    const parsed = parseReviewValue(setAt(review, path, c));
    if (!parsed.ok) continue;
    if (mustRun) {
      try {
        run(parsed.review);
      } catch {
        continue;
      }
    }
    return parsed.review;
  }
  return null;
}

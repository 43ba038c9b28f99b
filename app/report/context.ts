import type { FingerprintParts } from '../review/fingerprint';
import type { Results, ReviewStatus } from '../review/results';
import type { Review } from '../review/schema';
import type { Layout } from './layout';
import type { Units } from './units';

/** Everything a section of the record draws from. */
export interface RecordContext {
  readonly review: Review;
  readonly results: Results;
  readonly units: Units;
  readonly status: ReviewStatus;
  readonly parts: FingerprintParts;
  readonly layout: Layout;
  /** Set while drawing one mesh of a planetary stage (its results stand in `results`), e.g. "sun–planet mesh". */
  readonly meshLabel?: string;
}

/**
 * The contexts to draw per-mesh sections with: one per mesh of a planetary stage, each with that
 * mesh's gear, cases, verdicts and grade finder; the context itself for a gear pair.
 */
export function meshContexts(ctx: RecordContext, words: Readonly<Record<NonNullable<Results['meshes']>[number]['mesh'], string>>): RecordContext[] {
  const meshes = ctx.results.meshes;
  if (!meshes) return [ctx];
  return meshes.map((m) => ({ ...ctx, results: { ...ctx.results, gear: m.gear, cases: m.cases, verdicts: m.verdicts, gradeFinder: m.gradeFinder }, meshLabel: `${words[m.mesh]} mesh` }));
}

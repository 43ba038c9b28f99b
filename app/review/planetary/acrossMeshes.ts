import type { GradeFinderResult, OverallVerdict, PlanetaryMesh, VerdictCode } from '../results';
import { MESH_WORDS } from '../vocabulary';

/** One mesh's per-oil verdicts, as the per-pair pipeline gives them. */
export interface MeshVerdicts {
  readonly mesh: PlanetaryMesh;
  readonly verdicts: readonly OverallVerdict[];
}

export interface GovernedVerdict {
  readonly verdict: OverallVerdict;
  readonly mesh: PlanetaryMesh;
}

const SEVERITY: Record<VerdictCode, number> = { 'aw-suffices': 0, 'ep-warranted': 1, 'beyond-oil': 2 };

/**
 * The verdict per oil across the meshes of a planetary stage: the stage is only as good as its worst
 * mesh, so the most severe mesh verdict governs (ties: the mesh that meets less of the duty, then
 * the sun–planet mesh, the one listed first). The oil meets the need only if it does on every
 * mesh; the shortfalls are those of every mesh. The summary says which mesh governs.
 * Kept apart from the per-pair verdict so it can follow that verdict wherever it goes.
 */
export function governAcrossMeshes(meshes: readonly MeshVerdicts[]): GovernedVerdict[] {
  const oils = meshes[0]?.verdicts.map((v) => v.oil) ?? [];
  const out: GovernedVerdict[] = [];
  for (const oil of oils) {
    const mine = meshes.flatMap((m) => m.verdicts.filter((v) => v.oil === oil).map((v) => ({ mesh: m.mesh, v })));
    let gov = mine[0];
    if (!gov) continue;
    for (const x of mine) {
      const a = SEVERITY[x.v.code];
      const b = SEVERITY[gov.v.code];
      if (a > b || (a === b && x.v.dutyShareMet < gov.v.dutyShareMet)) gov = x;
    }
    const fit = mine.every((x) => x.v.oilFit === 'meets') ? 'meets' : 'falls-short';
    const shortfalls = [...new Set(mine.flatMap((x) => x.v.shortfalls))];
    out.push({
      mesh: gov.mesh,
      verdict: {
        ...gov.v,
        oilFit: fit,
        shortfalls,
        dutyShareMet: Math.min(...mine.map((x) => x.v.dutyShareMet)),
        summary: `Governing mesh: ${MESH_WORDS[gov.mesh]}. ${gov.v.summary}`,
      },
    });
  }
  return out;
}

/** Per oil, the grade finder of the mesh that needs the higher grade (no grade that suffices counts highest). */
export function gradeFinderAcrossMeshes(meshes: ReadonlyArray<{ mesh: PlanetaryMesh; gradeFinder: readonly GradeFinderResult[] }>): GradeFinderResult[] {
  const first = meshes[0]?.gradeFinder ?? [];
  return first.map((row) => {
    let worst = row;
    let worstMesh = meshes[0]?.mesh ?? 'sun-planet';
    for (const m of meshes) {
      const r = m.gradeFinder.find((g) => g.oil === row.oil);
      if (!r) continue;
      const need = (g: GradeFinderResult) => (g.recommendedVG === null ? Infinity : g.recommendedVG);
      if (need(r) > need(worst)) {
        worst = r;
        worstMesh = m.mesh;
      }
    }
    return { ...worst, note: `${MESH_WORDS[worstMesh]} mesh: ${worst.note}` };
  });
}

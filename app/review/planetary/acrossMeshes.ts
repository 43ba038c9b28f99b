import type { CautionSummary, ChangeFinding, ChangeFindingCode, DutyNeed, GradeFinderResult, LimitCheck, MicropittingStageNeeded, OverallVerdict, PlanetaryMesh, VerdictCode } from '../results';
import { stageNumber, stageOf } from '../overall';
import { MESH_WORDS, SHORTFALL_ORDER } from '../vocabulary';

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
      const sa = stageNumber(x.v.neededFzgStage);
      const sb = stageNumber(gov.v.neededFzgStage);
      if (a > b || (a === b && (sa > sb || (sa === sb && x.v.dutyShareMet < gov.v.dutyShareMet)))) gov = x;
    }
    const fit = mine.every((x) => x.v.oilFit === 'meets') ? 'meets' : 'falls-short';
    const shortfalls = SHORTFALL_ORDER.filter((k) => mine.some((x) => x.v.shortfalls.includes(k)));
    const worst = new Map<LimitCheck['quantity'], OverallVerdict['checks'][number]>();
    for (const x of mine) {
      for (const k of x.v.checks) {
        const prev = worst.get(k.quantity);
        if (!prev || (k.value !== null && (prev.value === null || k.value < prev.value))) worst.set(k.quantity, { ...k, loadCase: `${k.loadCase}, ${MESH_WORDS[x.mesh]} mesh` });
      }
    }
    out.push({
      mesh: gov.mesh,
      verdict: {
        ...gov.v,
        oilFit: fit,
        shortfalls,
        neededFzgStage: stageOf(Math.max(...mine.map((x) => stageNumber(x.v.neededFzgStage)))),
        micropitting: mine.some((x) => x.v.micropitting === 'short') ? 'short' : mine.some((x) => x.v.micropitting === 'unknown') ? 'unknown' : 'meets',
        neededMicropittingStage: mostDemandingMicropitting(mine.map((x) => x.v.neededMicropittingStage)),
        checks: [...worst.values()],
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

/**
 * What the stage needs: the more demanding mesh's need (most severe word, then the higher FZG
 * stage), each stage figure the higher of the two meshes', the ISO VG the higher (none if either
 * mesh has none); its statement names the governing mesh.
 */
export function needAcrossMeshes(meshes: ReadonlyArray<{ mesh: PlanetaryMesh; need: DutyNeed | null }>): DutyNeed | null {
  const withNeed = meshes.filter((m): m is { mesh: PlanetaryMesh; need: DutyNeed } => m.need !== null);
  const top = (n: DutyNeed) => Math.max(stageNumber(n.fzgStageFlash), stageNumber(n.fzgStageIntegral));
  let gov = withNeed[0];
  if (!gov) return null;
  for (const m of withNeed) {
    const a = SEVERITY[m.need.code], b = SEVERITY[gov.need.code];
    if (a > b || (a === b && top(m.need) > top(gov.need))) gov = m;
  }
  const maxStage = (pick: (n: DutyNeed) => DutyNeed['fzgStageFlash']) => (pick(gov.need) === null ? null : stageOf(Math.max(...withNeed.map((m) => stageNumber(pick(m.need))))));
  const vgs = withNeed.map((m) => m.need.isoVG);
  return {
    ...gov.need,
    fzgStageFlash: maxStage((n) => n.fzgStageFlash),
    fzgStageIntegral: maxStage((n) => n.fzgStageIntegral),
    isoVG: vgs.every((v): v is number => v !== null) ? Math.max(...vgs) : null,
    micropittingStage: mostDemandingMicropitting(withNeed.map((m) => m.need.micropittingStage)),
    governingLoadCase: `${gov.need.governingLoadCase}, ${MESH_WORDS[gov.mesh]} mesh`,
    statement: `${gov.need.statement} The ${MESH_WORDS[gov.mesh]} mesh governs.`,
  };
}

const FINDING_ORDER: readonly ChangeFindingCode[] = ['supported', 'supported-with-conditions', 'not-supported'];

/** Per proposed oil, the change finding of the mesh where it is worst; the statement names that mesh. */
export function changesAcrossMeshes(meshes: ReadonlyArray<{ mesh: PlanetaryMesh; changes: readonly ChangeFinding[] }>): ChangeFinding[] {
  const first = meshes[0]?.changes ?? [];
  return first.map((ch) => {
    let worst = { mesh: meshes[0]?.mesh ?? 'sun-planet', ch };
    for (const m of meshes) {
      const other = m.changes.find((x) => x.to === ch.to);
      if (other && FINDING_ORDER.indexOf(other.finding) > FINDING_ORDER.indexOf(worst.ch.finding)) worst = { mesh: m.mesh, ch: other };
    }
    const conditions = [...new Set(meshes.flatMap((m) => m.changes.find((x) => x.to === ch.to)?.conditions ?? []))];
    return { ...worst.ch, conditions, statement: `${worst.ch.statement} The ${MESH_WORDS[worst.mesh]} mesh is the one where the change fares worst.` };
  });
}

/** Every caution once over both meshes: it applies where it applies on either. */
export function cautionsAcrossMeshes(meshes: ReadonlyArray<{ mesh: PlanetaryMesh; cautions: readonly CautionSummary[] }>): CautionSummary[] {
  const byId = new Map<string, CautionSummary>();
  for (const m of meshes) {
    for (const k of m.cautions) {
      const prev = byId.get(k.id);
      if (!prev) byId.set(k.id, { ...k, appliesTo: [...k.appliesTo] });
      else {
        if (k.applies && !prev.applies) prev.text = k.text;
        prev.applies = prev.applies || k.applies;
        prev.appliesTo.push(...k.appliesTo);
      }
    }
  }
  const all = [...byId.values()];
  return [...all.filter((k) => k.applies), ...all.filter((k) => !k.applies)];
}

/** The highest micropitting stage needed ('>10' above any number); null when none is known. */
function mostDemandingMicropitting(xs: ReadonlyArray<MicropittingStageNeeded | null>): MicropittingStageNeeded | null {
  const known = xs.filter((x): x is MicropittingStageNeeded => x !== null);
  if (known.length === 0) return null;
  return known.includes('>10') ? '>10' : Math.max(...(known as number[]));
}

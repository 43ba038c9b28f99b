import type { GearPairGeometry } from '../../engine/geometry/types';
import { multipleMeshFactor } from '../../engine/heat/meshingPinions';
import { toMillimetres } from '../../engine/units';
import type { MeshResult, PlanetaryCaseKinematics, PlanetaryResult, Results } from '../results';
import type { PairReview, Review } from '../schema';
import { cautionsAcrossMeshes, changesAcrossMeshes, governAcrossMeshes, gradeFinderAcrossMeshes, needAcrossMeshes } from './acrossMeshes';
import { MESH_WORDS } from '../vocabulary';
import { planetaryMeshReviews, planetaryDutyOf, type PlanetaryReview } from './meshReviews';

const rpm = (w: number) => (w * 60) / (2 * Math.PI);

/**
 * A planetary review: the per-pair pipeline (`runPair`, passed in to keep run.ts and this module out
 * of an import circle) once per mesh in the carrier frame, then the verdict across the meshes.
 * The top-level `gear`, `cases`, `verdicts` and `gradeFinder` keep the shape of a pair's results:
 * gear and cases are those of the mesh that governs the first oil (`planetary.shownMesh`), the
 * verdicts and grade finder govern across both meshes; `meshes` holds every mesh in full.
 */
export function runPlanetary(review: Review, runPair: (r: PairReview, g: GearPairGeometry) => Results): Results {
  if (!review.planetary) throw new TypeError('runPlanetary: not a planetary review');
  const pr = review as PlanetaryReview;
  const { stage, duties, meshes } = planetaryMeshReviews(pr);
  const perMesh = meshes.map((m) => ({ mesh: m.mesh, results: runPair(m.review, m.geometry) }));
  const governed = governAcrossMeshes(perMesh.map((m) => ({ mesh: m.mesh, verdicts: m.results.verdicts })));
  const meshResults: MeshResult[] = perMesh.map(({ mesh, results }) => ({ mesh, gear: results.gear, cases: results.cases, verdicts: results.verdicts, gradeFinder: results.gradeFinder }));
  const shownMesh = governed[0]?.mesh ?? mostStressed(meshResults);
  const shown = perMesh.find((m) => m.mesh === shownMesh) ?? (perMesh[0] as (typeof perMesh)[number]);
  const p = pr.planetary;
  const loadCases: PlanetaryCaseKinematics[] = duties.map((d, i) => {
    const s = d.speeds;
    return {
      loadCase: pr.loadCases[i]?.name ?? '',
      sunSpeed_rpm: rpm(s.sun),
      planetSpeed_rpm: rpm(s.planet),
      ringSpeed_rpm: rpm(s.ring),
      carrierSpeed_rpm: rpm(s.carrier),
      sunRelativeSpeed_rpm: rpm(s.sunRelative),
      planetRelativeSpeed_rpm: rpm(s.planetRelative),
      ringRelativeSpeed_rpm: rpm(s.ringRelative),
      sunTorque_Nm: planetaryDutyOf(pr, stage, i).sunTorque,
      meshTorque_Nm: { 'sun-planet': d['sun-planet'].pinionTorque, 'planet-ring': d['planet-ring'].pinionTorque },
    };
  });
  const speeds0 = duties[0]?.speeds;
  const planetary: PlanetaryResult = {
    held: p.held,
    planets: p.planets,
    meshLoadFactorKgamma: p.meshLoadFactorKgamma,
    teeth: { sun: stage.zS, planet: stage.zP, ring: stage.zR },
    ratio: speeds0?.ratio ?? 0,
    driving: speeds0?.driving ?? 'sun',
    driven: speeds0?.driven ?? 'carrier',
    centerDistance_mm: toMillimetres(stage.centerDistance),
    planetTipGap_mm: Number.isFinite(stage.planetTipGap) ? toMillimetres(stage.planetTipGap) : null,
    multipleMeshFactor: { 'sun-planet': multipleMeshFactor(p.planets), 'planet-ring': multipleMeshFactor(2) },
    loadCases,
    governingMesh: governed.map((g) => ({ oil: g.verdict.oil, mesh: g.mesh })),
    shownMesh,
    checks: stage.checks.map((c) => ({ code: c.code, severity: c.severity, message: c.message })),
  };
  return {
    ...shown.results,
    need: needAcrossMeshes(perMesh.map((m) => ({ mesh: m.mesh, need: m.results.need }))),
    changes: changesAcrossMeshes(perMesh.map((m) => ({ mesh: m.mesh, changes: m.results.changes }))),
    cautions: cautionsAcrossMeshes(perMesh.map((m) => ({ mesh: m.mesh, cautions: m.results.cautions }))),
    verdicts: governed.map((g) => g.verdict),
    gradeFinder: gradeFinderAcrossMeshes(meshResults),
    assumptions: [...planetaryAssumptions(p.planets, p.meshLoadFactorKgamma), ...shown.results.assumptions],
    planetary,
    meshes: meshResults,
  };
}

/** With no oil there is no verdict: show the mesh with the higher Hertz stress. */
function mostStressed(meshes: readonly MeshResult[]): MeshResult['mesh'] {
  const peak = (m: MeshResult) => Math.max(...m.cases.map((c) => c.maxHertzStress_MPa));
  const [a, b] = meshes;
  if (!a || !b) return 'sun-planet';
  return peak(b) > peak(a) ? b.mesh : a.mesh;
}

function planetaryAssumptions(planets: number, kGamma: number): string[] {
  return [
    `Planetary stage: each mesh is computed as a gear pair in the carrier frame (speeds relative to the carrier, Willis equation); centrifugal effects, carrier and ring deflection and mesh losses are not considered.`,
    `Torque per planet mesh T_sun · Kγ/planets with Kγ = ${kGamma} and ${planets} planet${planets === 1 ? '' : 's'}; the planet carries the same force on the line of action into the ring.`,
    `Bulk temperature: the ${MESH_WORDS['sun-planet']} mesh takes Xmp = (1 + ${planets})/2 (the sun meshes with every planet), the ${MESH_WORDS['planet-ring']} mesh Xmp = (1 + 2)/2 (a planet meshes with two members), ISO/TS 6336-20 [memory].`,
    'Per-case figures of each mesh (pinionSpeed_rpm, pinionTorque_Nm) are the mesh pinion’s in the carrier frame: the sun on the sun–planet mesh, the planet on the planet–ring mesh.',
  ];
}

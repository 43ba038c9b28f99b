/**
 * The fingerprint of a review: SHA-256 over canonical JSON (canonicalJson.ts) of
 *   - the inputs: the parsed review (defaults filled in) with `signoff.fingerprint` and
 *     `signoff.signedAt` left out — the first cannot hash itself, and the second says *when*, not
 *     *what*: signing the same content with the same decision again gives the same fingerprint.
 *     Every other field counts, the sign-off's reviewer, role, organisation, decision, conditions
 *     and engine version included, so editing any of them after signing shows as "Changed since
 *     signing";
 *   - the results summary ({@link resultsSummary}): per case the key figures and verdict codes,
 *     and the overall verdict per oil. Numbers are rounded to 6 significant digits, so the last
 *     bit of a Math.exp in another JavaScript engine cannot change the fingerprint;
 *   - the engine version (app/engine/version.ts).
 * The three part hashes are kept as well, so a mismatch can say which part differs.
 * Pure (no Node APIs): runs in Node and in the renderer.
 */
import { sha256 } from '@noble/hashes/sha2.js';
import { bytesToHex, utf8ToBytes } from '@noble/hashes/utils.js';
import { ENGINE_VERSION } from '../engine/version';
import { canonicalJson } from './canonicalJson';
import type { Results } from './results';
import type { Review } from './schema';

/** Changes whenever the recipe below changes, so old and new fingerprints never collide. */
export const FINGERPRINT_SCHEME = 'flankfilm.fingerprint/1';

export interface FingerprintParts {
  /** SHA-256 of the inputs (the review without signoff.fingerprint and signoff.signedAt). */
  readonly inputs: string;
  /** SHA-256 of the results summary. */
  readonly results: string;
  /** SHA-256 of the engine version string. */
  readonly engine: string;
  /** The fingerprint: SHA-256 over scheme, inputs, results summary and engine version together. */
  readonly combined: string;
  readonly engineVersion: string;
}

export type FingerprintPart = 'inputs' | 'results' | 'engine';

export function sha256Hex(text: string): string {
  return bytesToHex(sha256(utf8ToBytes(text)));
}

/** The review as hashed: a copy without `signoff.fingerprint` and `signoff.signedAt`. */
export function fingerprintInputs(review: Review): Record<string, unknown> {
  const { signoff, ...rest } = review;
  if (!signoff) return rest;
  const { fingerprint: _f, signedAt: _s, ...kept } = signoff;
  return { ...rest, signoff: kept };
}

const round = (x: number): number => (Number.isFinite(x) ? Number(x.toPrecision(6)) : x);
const roundOrNull = (x: number | null): number | null => (x === null ? null : round(x));

/** The subset of the results that the fingerprint covers. */
export function resultsSummary(results: Results): Record<string, unknown> {
  return {
    cases: results.cases.map(caseSummary),
    verdicts: results.verdicts.map((v) => ({
      oil: v.oil,
      code: v.code,
      oilFit: v.oilFit,
      governingLoadCase: v.governingLoadCase,
      dutyShareMet: round(v.dutyShareMet),
    })),
    // A planetary stage: every mesh's cases and the mesh that governs each oil (absent for a pair,
    // so a pair's fingerprint is what it was).
    ...(results.meshes ? { meshes: results.meshes.map((m) => ({ mesh: m.mesh, cases: m.cases.map(caseSummary) })) } : {}),
    ...(results.planetary ? { governingMesh: results.planetary.governingMesh } : {}),
  };
}

function caseSummary(c: Results['cases'][number]): Record<string, unknown> {
  return {
    loadCase: c.loadCase,
    oil: c.oil,
    pinionTorque_Nm: round(c.pinionTorque_Nm),
    pitchLineVelocity_mps: round(c.pitchLineVelocity_mps),
    nominalContactStress_MPa: round(c.nominalContactStress_MPa),
    maxHertzStress_MPa: round(c.maxHertzStress_MPa),
    lambdaMin: roundOrNull(c.lambdaMin),
    regime: c.regime,
    maxFlashTemperature_K: roundOrNull(c.maxFlashTemperature_K),
    maxContactTemperature_C: roundOrNull(c.maxContactTemperature_C),
    scuffingTemperature_C: roundOrNull(c.scuffingTemperature_C),
    scuffingSafety: roundOrNull(c.scuffingSafety),
    integralSafety: roundOrNull(c.integralSafety),
    requiredFzgStage: c.requiredFzgStage,
    micropittingSafety: roundOrNull(c.micropitting?.safety ?? null),
    requiredMicropittingStage: c.micropitting?.requiredFailureStage ?? null,
    verdict: c.verdict ? { code: c.verdict.code, oilFit: c.verdict.oilFit, micropitting: c.verdict.micropitting, rules: c.verdict.reasons.map((r) => r.rule) } : null,
  };
}

/** Fingerprint and part hashes of a review and the results `run(review)` gave for it. */
export function fingerprintParts(review: Review, results: Results, engineVersion: string = ENGINE_VERSION): FingerprintParts {
  const inputs = fingerprintInputs(review);
  const summary = resultsSummary(results);
  const combined = sha256Hex(canonicalJson({ scheme: FINGERPRINT_SCHEME, inputs, results: summary, engineVersion }));
  return {
    inputs: sha256Hex(canonicalJson(inputs)),
    results: sha256Hex(canonicalJson(summary)),
    engine: sha256Hex(canonicalJson(engineVersion)),
    combined,
    engineVersion,
  };
}

/** The fingerprint alone (64 hex digits). */
export function fingerprint(review: Review, results: Results): string {
  return fingerprintParts(review, results).combined;
}

/** Which parts differ between a stored and a recomputed set of part hashes. */
export function differingParts(stored: Pick<FingerprintParts, FingerprintPart>, now: Pick<FingerprintParts, FingerprintPart>): FingerprintPart[] {
  return (['inputs', 'results', 'engine'] as const).filter((p) => stored[p] !== now[p]);
}

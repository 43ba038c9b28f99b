/**
 * The fingerprint of a fleet record, after the review's (app/review/fingerprint.ts): SHA-256 over
 * canonical JSON of the inputs (every review as its fingerprint hashes it, and the candidate-oil
 * file), a summary of the fleet's results (the fit table's codes, the set, the assignment, the
 * unserved) and the engine version. Pure.
 */
import { canonicalJson } from '../review/canonicalJson';
import { fingerprintInputs, sha256Hex, type FingerprintParts } from '../review/fingerprint';
import type { Review } from '../review/schema';
import type { OilsFile } from './oilsFile';
import type { FleetResult } from './types';

export const FLEET_FINGERPRINT_SCHEME = 'flankfilm.fleet-fingerprint/1';

export interface FleetInputs {
  readonly gearboxes: ReadonlyArray<{ readonly review: Review }>;
  readonly oilsFile: OilsFile;
}

const round = (x: number): number => (Number.isFinite(x) ? Number(x.toPrecision(6)) : x);

export function fleetFingerprintInputs(inputs: FleetInputs): Record<string, unknown> {
  return { reviews: inputs.gearboxes.map((g) => fingerprintInputs(g.review)), oils: inputs.oilsFile };
}

export function fleetResultsSummary(r: FleetResult): Record<string, unknown> {
  return {
    fit: r.fit.map((c) => ({ gearbox: c.gearbox, oil: c.oil, meets: c.meets, shortfalls: c.shortfalls, code: c.code, governingCase: c.governingCase, dutyShareMet: round(c.dutyShareMet) })),
    cover: r.cover,
    assignment: r.assignment,
    unserved: r.unserved.map((u) => ({ gearbox: u.gearbox, closest: u.closest, shortfalls: u.shortfalls })),
    failed: r.failed.length,
  };
}

export function fleetFingerprintParts(inputs: FleetInputs, r: FleetResult): FingerprintParts {
  const i = fleetFingerprintInputs(inputs);
  const s = fleetResultsSummary(r);
  return {
    inputs: sha256Hex(canonicalJson(i)),
    results: sha256Hex(canonicalJson(s)),
    engine: sha256Hex(canonicalJson(r.flankfilm)),
    combined: sha256Hex(canonicalJson({ scheme: FLEET_FINGERPRINT_SCHEME, inputs: i, results: s, engineVersion: r.flankfilm })),
    engineVersion: r.flankfilm,
  };
}

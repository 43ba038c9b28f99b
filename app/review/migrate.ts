import { REVIEW_VERSION } from './schema';

/**
 * Bring an older review file up to the current version, one step at a time. Version 1 is the
 * first, so there is nothing to do yet; each future version adds one step here, never edits one.
 * A step must bring the signed states a sign-off keeps (`signoff.signedState` and each
 * `signoff.history[].signedState`) along with the inputs, or the audit would compare two versions.
 */
const STEPS: Record<number, (r: Record<string, unknown>) => Record<string, unknown>> = {};

/**
 * Keys that version 1 once had and no longer means anything by. `policy.integralFlashCalibration`
 * scaled the integral method's flash temperature to hide an error in θintS (its flash part was
 * missing); with θintS as ISO/TS 6336-21 writes it the method reproduces its own test unscaled.
 */
const RETIRED_POLICY_KEYS = ['integralFlashCalibration'] as const;

function dropRetiredKeys(raw: Record<string, unknown>): Record<string, unknown> {
  const policy = raw.policy;
  if (typeof policy !== 'object' || policy === null || Array.isArray(policy)) return raw;
  const p = policy as Record<string, unknown>;
  if (!RETIRED_POLICY_KEYS.some((k) => Object.hasOwn(p, k))) return raw;
  const kept = Object.fromEntries(Object.entries(p).filter(([k]) => !(RETIRED_POLICY_KEYS as readonly string[]).includes(k)));
  return { ...raw, policy: kept };
}

export function migrate(raw: Record<string, unknown>, fromVersion: number): Record<string, unknown> {
  let r = dropRetiredKeys(raw);
  for (let v = fromVersion; v < REVIEW_VERSION; v++) {
    const step = STEPS[v];
    if (!step) throw new Error(`no migration from review version ${v}`);
    r = step(r);
  }
  return r;
}

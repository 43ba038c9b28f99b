import { REVIEW_VERSION } from './schema';

/**
 * Bring an older review file up to the current version, one step at a time. Version 1 is the
 * first, so there is nothing to do yet; each future version adds one step here, never edits one.
 * A step must bring the signed states a sign-off keeps (`signoff.signedState` and each
 * `signoff.history[].signedState`) along with the inputs, or the audit would compare two versions.
 */
const STEPS: Record<number, (r: Record<string, unknown>) => Record<string, unknown>> = {};

export function migrate(raw: Record<string, unknown>, fromVersion: number): Record<string, unknown> {
  let r = raw;
  for (let v = fromVersion; v < REVIEW_VERSION; v++) {
    const step = STEPS[v];
    if (!step) throw new Error(`no migration from review version ${v}`);
    r = step(r);
  }
  return r;
}

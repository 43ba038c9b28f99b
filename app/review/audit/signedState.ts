/**
 * The signed state a sign-off keeps, and whether it can be trusted. A sign-off's fingerprint
 * covers its own `signedState` (fingerprint.ts hashes the whole sign-off but its fingerprint and
 * time), so the review as signed is the signed state with this very sign-off: recomputing that
 * review's fingerprint must give the stored one. If it does not, the signed state (or the
 * sign-off itself) was altered after signing, and no field-level audit is offered. Pure.
 */
import { ENGINE_VERSION } from '../../engine/version';
import { canonicalJson } from '../canonicalJson';
import { fingerprint } from '../fingerprint';
import type { Results } from '../results';
import { run } from '../run';
import { REVIEW_FORMAT, REVIEW_VERSION, type Review, type SignedState, type Signoff } from '../schema';

/** The inputs of a review: all but format, version and sign-off. */
export function inputsOf(review: Review): SignedState {
  const { format: _f, version: _v, signoff: _s, ...body } = review;
  return body;
}

/** The review a sign-off covers, rebuilt from its signed state. */
export function reviewAsSigned(state: SignedState, signoff: Signoff): Review {
  return { format: REVIEW_FORMAT, version: REVIEW_VERSION, ...state, signoff };
}

export type SignedStateCheck =
  | { readonly kind: 'draft' }
  /** Signed by a Flankfilm that kept no signed state: no field-level audit is possible. */
  | { readonly kind: 'not-kept' }
  /** The signed state (or the sign-off) no longer gives the signed fingerprint. */
  | { readonly kind: 'altered' }
  /**
   * The signed state, and its results by this engine. `confirmed` is false when it was signed by
   * another engine version: its fingerprint cannot be recomputed here, so the state is shown but
   * not vouched for.
   */
  | { readonly kind: 'kept'; readonly signed: Review; readonly confirmed: boolean; readonly results: Results | null };

/** Check the signed state a review keeps against its sign-off's fingerprint. */
export function checkSignedState(review: Review): SignedStateCheck {
  const so = review.signoff;
  if (!so) return { kind: 'draft' };
  if (!so.signedState) return { kind: 'not-kept' };
  const signed = reviewAsSigned(so.signedState, so);
  let results: Results;
  try {
    results = run(signed);
  } catch {
    // Inputs that the engine refuses were not what was signed (signing computes them first),
    // unless another engine signed them.
    return so.engineVersion === ENGINE_VERSION ? { kind: 'altered' } : { kind: 'kept', signed, confirmed: false, results: null };
  }
  if (so.engineVersion !== ENGINE_VERSION) return { kind: 'kept', signed, confirmed: false, results };
  return fingerprint(signed, results) === so.fingerprint ? { kind: 'kept', signed, confirmed: true, results } : { kind: 'altered' };
}

/** Whether two sets of inputs are the same to the fingerprint. */
export const sameInputs = (a: SignedState, b: SignedState): boolean => canonicalJson(a) === canonicalJson(b);

/** Words for a check that gives no audit, for the CLI, the record and the Sign-off panel. */
export const NO_AUDIT_WORDS = {
  'not-kept': 'This file was signed by an earlier Flankfilm that did not keep the signed inputs: no field-level audit is possible. Compare it with the file of the signed revision instead.',
  altered: 'The signed inputs kept in this file do not match its sign-off’s fingerprint: they, or the sign-off, were altered after signing. No field-level audit is possible.',
} as const;

/**
 * The revision history of a review, one line a signing: who, when, the decision, and the fields
 * changed since the previous signing. It holds only what the file keeps: the sign-off's bounded
 * history of earlier sign-offs and their signed states. Pure.
 */
import type { EarlierSignoff, Signoff } from '../schema';
import { diffInputs, type InputChange } from './diff';

export interface Signing {
  readonly reviewer: string;
  readonly role: string;
  readonly signedAt: string;
  readonly decision: Signoff['decision'];
  /** Changes since the previous signing kept; null where it is not known (first kept, or no signed state). */
  readonly changes: InputChange[] | null;
  /** True for the oldest signing the file keeps. */
  readonly first: boolean;
}

/** Every signing the sign-off knows of, oldest first, the current one last. */
export function revisionHistory(signoff: Signoff): Signing[] {
  const all: EarlierSignoff[] = [...(signoff.history ?? []), signoff];
  return all.map((s, i) => {
    const prev = i > 0 ? all[i - 1] : undefined;
    const changes = prev?.signedState && s.signedState ? diffInputs(prev.signedState, s.signedState) : null;
    return { reviewer: s.reviewer, role: s.role, signedAt: s.signedAt, decision: s.decision, changes, first: i === 0 };
  });
}

/**
 * An input the editor empties when another input changes, so that the value derived from them
 * follows: a viscosity index the user did not type is dropped when KV40 or KV100 changes, and
 * ASTM D2270 computes it from the new pair. The editor applies the rule
 * (renderer/state/reviewState.ts); the audit lists the emptied input with the edit that emptied
 * it, not as a change of its own (audit/diff.ts). Pure.
 */
export interface FollowingInput {
  /** The list whose entries hold both fields. */
  readonly list: 'oils';
  /** The input emptied … */
  readonly field: string;
  /** … when one of these, in the same entry, changes. */
  readonly causes: readonly string[];
}

export const VISCOSITY_INDEX_FOLLOWS: FollowingInput = { list: 'oils', field: 'viscosityIndex', causes: ['kv40_mm2s', 'kv100_mm2s'] };

export const FOLLOWING_INPUTS: readonly FollowingInput[] = [VISCOSITY_INDEX_FOLLOWS];

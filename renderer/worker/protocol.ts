import type { Results, ReviewStatus } from '../../app/review/results';
import type { Review } from '../../app/review/schema';

/** Ask for the results of one edition of the review. */
export interface RecomputeRequest {
  readonly edition: number;
  readonly review: Review;
}

/** An input the schema accepts but the physics cannot (EngineInputError), or a failure of the engine. */
export interface RecomputeFailure {
  readonly field: string | null;
  readonly code: string;
  readonly message: string;
}

export type RecomputeResponse =
  | { readonly edition: number; readonly ok: true; readonly results: Results; readonly status: ReviewStatus; readonly millis: number }
  | { readonly edition: number; readonly ok: false; readonly error: RecomputeFailure };

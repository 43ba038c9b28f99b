import type { EhlPointResult } from '../../app/review/ehlAtPoint';
import type { EhlPointRequest } from '../../app/review/ehlPoint';
import type { Review } from '../../app/review/schema';

/** Solve the numerical film at one point of one edition of the review. */
export interface FilmRequest {
  /** Bumped by the client for every request; answers of another run are dropped. */
  readonly run: number;
  readonly review: Review;
  readonly point: EhlPointRequest;
  readonly nodes?: number;
}

export type FilmMessage =
  | { readonly run: number; readonly kind: 'done'; readonly result: EhlPointResult }
  | { readonly run: number; readonly kind: 'failed'; readonly message: string };

import type { OperatingMapResult } from '../../app/review/operatingMaps';
import type { Review } from '../../app/review/schema';

/** Sweep the operating maps of one edition of the review. */
export interface MapRequest {
  /** Bumped by the client for every sweep; answers of another run are dropped. */
  readonly run: number;
  readonly review: Review;
  readonly temperatures?: number;
  readonly loads?: number;
}

export type MapMessage =
  | { readonly run: number; readonly kind: 'progress'; readonly done: number; readonly total: number }
  | { readonly run: number; readonly kind: 'done'; readonly maps: OperatingMapResult[]; readonly millis: number }
  | { readonly run: number; readonly kind: 'failed'; readonly message: string };

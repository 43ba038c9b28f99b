import type { FleetFailure, FleetResult } from '../../app/fleet/types';
import type { Oil, Review } from '../../app/review/schema';

/** Run one consolidation: the gearboxes (reviews named by their file names) against the candidates. */
export interface FleetRequest {
  /** Bumped by the client for every run; answers of another run are dropped. */
  readonly run: number;
  readonly gearboxes: ReadonlyArray<{ readonly source: string; readonly review: Review }>;
  readonly oils: readonly Oil[];
  readonly failed: readonly FleetFailure[];
}

export type FleetMessage =
  | { readonly run: number; readonly kind: 'progress'; readonly done: number; readonly total: number }
  | { readonly run: number; readonly kind: 'done'; readonly result: FleetResult; readonly millis: number }
  | { readonly run: number; readonly kind: 'failed'; readonly message: string };

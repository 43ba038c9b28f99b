import type { FingerprintParts } from '../review/fingerprint';
import type { Results, ReviewStatus } from '../review/results';
import type { Review } from '../review/schema';
import type { Layout } from './layout';
import type { Units } from './units';

/** Everything a section of the record draws from. */
export interface RecordContext {
  readonly review: Review;
  readonly results: Results;
  readonly units: Units;
  readonly status: ReviewStatus;
  readonly parts: FingerprintParts;
  readonly layout: Layout;
}

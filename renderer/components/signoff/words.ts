import type { Decision } from '../../../app/review/schema';

/** What the reviewer enters in the Sign-off dialog. */
export interface SignoffForm {
  reviewer: string;
  role: string;
  organisation: string;
  decision: Decision;
  conditions: string;
}

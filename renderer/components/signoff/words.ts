import type { Decision } from '../../../app/review/schema';

export const DECISION_WORDS: Readonly<Record<Decision, string>> = {
  approved: 'Approved',
  'approved-with-conditions': 'Approved with conditions',
  'not-approved': 'Not approved',
};

/** What the reviewer enters in the Sign-off dialog. */
export interface SignoffForm {
  reviewer: string;
  role: string;
  organisation: string;
  decision: Decision;
  conditions: string;
}

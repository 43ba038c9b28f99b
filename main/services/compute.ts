import { EngineInputError } from '../../app/engine/diagnostics';
import type { Results } from '../../app/review/results';
import { run } from '../../app/review/run';
import type { Review } from '../../app/review/schema';
import { UserError } from './errors';

/** run(review), with the engine's refusal (field and limit named) turned into a UserError. */
export function resultsOf(review: Review, doing: string): Results {
  try {
    return run(review);
  } catch (e) {
    if (e instanceof EngineInputError) throw new UserError(`${doing}: the review cannot be computed: ${e.message}`);
    throw e;
  }
}

import { run } from '../../app/review/run';
import { status } from '../../app/review/status';
import type { RecomputeRequest, RecomputeResponse } from './protocol';

/** run() and status() for one request, with an EngineInputError turned into a field message. Pure. */
export function compute(req: RecomputeRequest): RecomputeResponse {
  const start = performance.now();
  try {
    const results = run(req.review);
    return { edition: req.edition, ok: true, results, status: status(req.review, results), millis: performance.now() - start };
  } catch (e) {
    const err = e as { name?: unknown; field?: unknown; code?: unknown; message?: unknown };
    const isInput = err?.name === 'EngineInputError';
    return {
      edition: req.edition,
      ok: false,
      error: {
        field: isInput && typeof err.field === 'string' ? err.field : null,
        code: typeof err.code === 'string' ? err.code : 'engine.failure',
        message: typeof err.message === 'string' ? err.message : String(e),
      },
    };
  }
}

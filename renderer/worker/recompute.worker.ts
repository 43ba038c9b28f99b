import { compute } from './compute';
import type { RecomputeRequest, RecomputeResponse } from './protocol';

// The renderer's tsconfig has the DOM lib, not the webworker one; this is the part of the worker scope used here.
const scope = self as unknown as { onmessage: ((e: MessageEvent<RecomputeRequest>) => void) | null; postMessage(message: RecomputeResponse): void };

// One request at a time; the client sends only the newest edition (latest wins).
scope.onmessage = (e) => {
  scope.postMessage(compute(e.data));
};

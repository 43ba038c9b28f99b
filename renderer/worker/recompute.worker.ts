import { compute } from './compute';
import type { RecomputeRequest, RecomputeResponse } from './protocol';
import { pathBuffers } from './transferables';

// The renderer's tsconfig has the DOM lib, not the webworker one; this is the part of the worker scope used here.
const scope = self as unknown as { onmessage: ((e: MessageEvent<RecomputeRequest>) => void) | null; postMessage(message: RecomputeResponse, transfer: Transferable[]): void };

// One request at a time; the client sends only the newest edition (latest wins). The path columns
// are moved to the page, not copied.
scope.onmessage = (e) => {
  const response = compute(e.data);
  scope.postMessage(response, response.ok ? pathBuffers(response.results) : []);
};

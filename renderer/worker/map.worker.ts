import { sweep } from './mapSweep';
import type { MapMessage, MapRequest } from './mapProtocol';

// The renderer's tsconfig has the DOM lib, not the webworker one; this is the part of the worker scope used here.
const scope = self as unknown as { onmessage: ((e: MessageEvent<MapRequest>) => void) | null; postMessage(message: MapMessage): void };

// The sweep is synchronous: a cancel cannot reach it, so the client stops it by terminating this worker.
scope.onmessage = (e) => sweep(e.data, (m) => scope.postMessage(m));

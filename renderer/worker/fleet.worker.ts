import { runFleetJob } from './fleetRun';
import type { FleetMessage, FleetRequest } from './fleetProtocol';

// The renderer's tsconfig has the DOM lib, not the webworker one; this is the part of the worker scope used here.
const scope = self as unknown as { onmessage: ((e: MessageEvent<FleetRequest>) => void) | null; postMessage(message: FleetMessage): void };

// One synchronous run: the client cancels it by terminating this worker.
scope.onmessage = (e) => runFleetJob(e.data, (m) => scope.postMessage(m));

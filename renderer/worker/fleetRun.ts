import { EngineInputError } from '../../app/engine/diagnostics';
import { runFleet } from '../../app/fleet/fleet';
import type { FleetMessage, FleetRequest } from './fleetProtocol';

/** The worker's whole job, also run on the UI thread where workers are not allowed. */
export function runFleetJob(req: FleetRequest, post: (m: FleetMessage) => void): void {
  const t0 = performance.now();
  try {
    const result = runFleet({ gearboxes: req.gearboxes, oils: req.oils, failed: req.failed, onProgress: (done, total) => post({ run: req.run, kind: 'progress', done, total }) });
    post({ run: req.run, kind: 'done', result, millis: performance.now() - t0 });
  } catch (e) {
    const message = e instanceof EngineInputError ? `Candidate oils: ${e.field}: ${e.message}` : `The fleet could not be computed: ${(e as Error).message ?? String(e)}`;
    post({ run: req.run, kind: 'failed', message });
  }
}

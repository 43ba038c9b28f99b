import type { FleetMessage, FleetRequest } from './fleetProtocol';
import { JobClient } from './jobClient';

/** The fleet's consolidation in its own worker (see JobClient), with progress per gearbox. */
export function createFleetClient(listener: (m: FleetMessage) => void): JobClient<FleetRequest, FleetMessage> {
  return new JobClient<FleetRequest, FleetMessage>(
    {
      createWorker: () => new Worker(new URL('./fleet.worker.ts', import.meta.url), { type: 'module', name: 'flankfilm-fleet' }),
      runInline: async (req, post) => (await import('./fleetRun')).runFleetJob(req, post),
      finalKinds: ['done', 'failed'],
    },
    listener,
  );
}

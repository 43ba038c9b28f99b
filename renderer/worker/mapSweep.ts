import { operatingMaps } from '../../app/review/operatingMaps';
import type { MapMessage, MapRequest } from './mapProtocol';

/** One sweep, reporting each finished map through `post`. Pure apart from `post`. */
export function sweep(req: MapRequest, post: (m: MapMessage) => void): void {
  const start = performance.now();
  try {
    const maps = operatingMaps(req.review, {
      temperatures: req.temperatures,
      loads: req.loads,
      progress: (done, total) => post({ run: req.run, kind: 'progress', done, total }),
    });
    // operatingMaps returns null only when progress() asks it to stop, which this one never does.
    post(maps ? { run: req.run, kind: 'done', maps, millis: performance.now() - start } : { run: req.run, kind: 'failed', message: 'the sweep stopped early' });
  } catch (e) {
    post({ run: req.run, kind: 'failed', message: (e as { message?: unknown })?.message ? String((e as { message: unknown }).message) : String(e) });
  }
}

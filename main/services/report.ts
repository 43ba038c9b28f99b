/**
 * app/report behind the ReportPort the services use. With a worker spec, the record is made in a
 * standing worker thread (main/recordWorker.ts through recordWorkerClient.ts), with progress and
 * cancel, so main's event loop stays free; without, in this thread (the CLI's way; tests that want
 * no worker).
 */
import { renderFleetRecord } from '../../app/report/fleet/fleetRecord';
import { resultsToCsv } from '../../app/report/csv';
import { summaryCsv } from '../../app/report/summaryCsv';
import { loadRecordFonts } from '../../app/report/fonts';
import { RecordTextError, renderRecord } from '../../app/report/record';
import { operatingMaps } from '../../app/review/operatingMaps';
import { run } from '../../app/review/run';
import type { RecordJob } from '../recordWorker';
import { UserError } from './errors';
import { RecordWorkerClient, type WorkerSpec } from './recordWorkerClient';
import type { ReportPort } from './types';

export { ExportCanceled, type WorkerSpec } from './recordWorkerClient';

/** `fontsDir`: the app's assets/fonts (inside app.asar when packaged); default: app/report's own search. */
export function createReportPort(fontsDir?: string, worker?: WorkerSpec): ReportPort {
  const client = worker ? new RecordWorkerClient(worker, fontsDir) : null;
  return {
    renderRecord: (review, { paper, onProgress, signal }) =>
      client ? client.render({ review, paper, ...(fontsDir ? { fontsDir } : {}) }, onProgress, signal) : inThread(review, paper, fontsDir),
    ...(client ? { warmRecord: () => client.warm(), stopRecordWorker: () => client.stop() } : {}),
    casesCsv: (results, units) => resultsToCsv(results, units),
    renderFleetRecord: async (result, inputs, { paper }) => renderFleetRecord(result, inputs, { paper, ...(fontsDir ? { fonts: loadRecordFonts(fontsDir) } : {}) }),
    summaryCsv: (results, units) => summaryCsv(results, units),
  };
}

async function inThread(review: RecordJob['review'], paper: RecordJob['paper'], fontsDir: string | undefined): Promise<Uint8Array> {
  try {
    return await renderRecord(review, run(review), { paper, maps: operatingMaps(review) ?? [], ...(fontsDir ? { fonts: loadRecordFonts(fontsDir) } : {}) });
  } catch (e) {
    if (e instanceof RecordTextError) throw new UserError(`no record made:\n${e.message}`);
    throw e;
  }
}

/** `flankfilm fleet --pdf OUT`: the fleet record, written atomically. */
import { atomicWrite } from '../files/atomicWrite';
import type { FleetInputs } from '../fleet/fingerprint';
import type { FleetResult } from '../fleet/types';
import { renderFleetRecord } from '../report/fleet/fleetRecord';
import type { Paper } from '../report/record';
import { EXIT, type CliIo } from './io';

export async function writeFleetRecord(result: FleetResult, inputs: FleetInputs, path: string, paper: Paper, io: CliIo): Promise<number> {
  const pdf = await renderFleetRecord(result, inputs, { paper });
  try {
    await atomicWrite(path, pdf);
  } catch (e) {
    io.err(`${path}: cannot write the record (${(e as NodeJS.ErrnoException).code ?? (e as Error).message})\n`);
    return EXIT.invalid;
  }
  io.err(`wrote ${path}\n`);
  return EXIT.ok;
}

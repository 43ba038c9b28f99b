import { runFleet, type FleetGearboxInput } from '../../app/fleet/fleet';
import { parseOilsText } from '../../app/fleet/oilsFile';
import type { FleetFailure } from '../../app/fleet/types';
import { EngineInputError } from '../../app/engine/diagnostics';
import { parseReviewText } from '../../app/review/parse';
import { UserError } from './errors';
import { writeExport } from './exports';
import { listIssues } from './reviewText';
import { basename } from 'node:path';
import type { Documents } from './documents';
import type { Dialogs, ReportPort, ServiceArgs, Services } from './types';

/**
 * The fleet record: main recomputes the consolidation from the texts (it never trusts a result
 * from the renderer), renders the PDF and asks where to put it. A review that does not parse is
 * named in the record and left out, as the CLI does; a bad candidate file refuses the export.
 */
export async function exportFleetRecord(deps: { dialogs: Dialogs; report: ReportPort; documents: Documents }, args: ServiceArgs<'exportFleetRecord'>): ReturnType<Services['exportFleetRecord']> {
  const oils = parseOilsText(args.oils);
  if (!oils.ok) throw new UserError(`no record made: the candidate-oil file is not valid:\n${listIssues(oils.issues)}`);
  const gearboxes: FleetGearboxInput[] = [];
  const failed: FleetFailure[] = [];
  for (const r of args.reviews) {
    const p = parseReviewText(r.text);
    if (p.ok) gearboxes.push({ source: r.name, review: p.review });
    else failed.push({ source: r.name, message: `${r.name}: not a valid review:\n${listIssues(p.issues)}` });
  }
  let result;
  try {
    result = runFleet({ gearboxes, oils: oils.oils, failed });
  } catch (e) {
    if (e instanceof EngineInputError) throw new UserError(`no record made: candidate oils: ${e.field}: ${e.message}`);
    throw e;
  }
  const inputs = { gearboxes, oilsFile: oils.file };
  const render = deps.report.renderFleetRecord ?? (async (res: typeof result, inp: typeof inputs, o: { paper: 'a4' | 'letter' }) => (await import('../../app/report/fleet/fleetRecord')).renderFleetRecord(res, inp, o));
  const pdf = await render(result, inputs, { paper: args.paper });
  const path = await writeExport(deps, null, 'record', 'fleet-record.pdf', pdf);
  return path === null ? { canceled: true } : { canceled: false, name: basename(path), bytes: pdf.byteLength };
}

import { atomicWrite } from '../../app/files/atomicWrite';
import { signReview as signOff } from '../../app/review/signoff';
import { explainFsError, UserError } from './errors';
import { idStem } from '../../app/report/record';
import { slugOf } from './paths';
import { resultsOf } from './compute';
import { listIssues, reviewJson, reviewOf } from './reviewText';
import type { Dialogs, ReportPort, SaveKind, ServiceArgs, Services } from './types';

/** Exported files are named by the review id, else by the title. */
const stemOf = (review: { id?: string | undefined; title: string }): string => idStem(review) ?? slugOf(review.title);

type ExportDeps = { dialogs: Dialogs; report: ReportPort };

async function writeExport(dialogs: Dialogs, kind: SaveKind, name: string, data: string | Uint8Array): Promise<string | null> {
  const path = await dialogs.savePath(kind, name);
  if (path === null) return null;
  try {
    await atomicWrite(path, data);
  } catch (e) {
    throw new UserError(`could not write ${path}: ${explainFsError(e)}`);
  }
  return path;
}

/** Render the record (PDF) in main, then ask where to put it. */
export async function exportRecord(deps: ExportDeps, args: ServiceArgs<'exportRecord'>): ReturnType<Services['exportRecord']> {
  const { review } = reviewOf(args.text, 'no record made');
  const results = resultsOf(review, 'no record made');
  const pdf = await deps.report.renderRecord(review, results, { paper: args.paper });
  const path = await writeExport(deps.dialogs, 'record', `${stemOf(review)}.pdf`, pdf);
  return path === null ? { canceled: true } : { canceled: false, path, bytes: pdf.byteLength };
}

/** The along-path CSV of every case, or the summary CSV (one row per case × oil). */
export async function exportCsv(deps: ExportDeps, args: ServiceArgs<'exportCsv'>): ReturnType<Services['exportCsv']> {
  const { review } = reviewOf(args.text, 'no CSV written');
  const results = resultsOf(review, 'no CSV written');
  const summary = args.table === 'summary';
  if (summary && !deps.report.summaryCsv) throw new UserError('no CSV written: the summary table is not available');
  const csv = summary && deps.report.summaryCsv ? deps.report.summaryCsv(results, review.displayUnits) : deps.report.casesCsv(results, review.displayUnits);
  const path = await writeExport(deps.dialogs, 'csv', `${stemOf(review)}-${summary ? 'summary' : 'cases'}.csv`, csv);
  return path === null ? { canceled: true } : { canceled: false, path };
}

/** Stamp a sign-off; the time comes from main's clock, never from the renderer. */
export async function signReview(deps: { clock: () => Date }, args: ServiceArgs<'signReview'>): ReturnType<Services['signReview']> {
  const { review } = reviewOf(args.text, 'not signed');
  const results = resultsOf(review, 'not signed');
  const signed = signOff(review, results, {
    reviewer: args.reviewer,
    role: args.role,
    decision: args.decision,
    ...(args.organisation !== undefined ? { organisation: args.organisation } : {}),
    ...(args.conditions !== undefined ? { conditions: args.conditions } : {}),
    signedAt: deps.clock().toISOString(),
  });
  if (!signed.ok) throw new UserError(`not signed:\n${listIssues(signed.issues)}`);
  return { text: reviewJson(signed.review) };
}

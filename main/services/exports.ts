import { basename } from 'node:path';
import { atomicWrite } from '../../app/files/atomicWrite';
import { pathClash } from '../../app/files/sameFile';
import type { Documents } from './documents';
import { signReview as signOff } from '../../app/review/signoff';
import { explainFsError, UserError } from './errors';
import { idStem } from '../../app/report/record';
import { slugOf } from './paths';
import { resultsOf } from './compute';
import { listIssues, reviewJson, reviewOf } from './reviewText';
import { ExportCanceled } from './report';
import type { Dialogs, RecordProgress, ReportPort, SaveKind, ServiceArgs, Services } from './types';

/** Exported files are named by the review id, else by the title. */
const stemOf = (review: { id?: string | undefined; title: string }): string => idStem(review) ?? slugOf(review.title);

type ExportDeps = { dialogs: Dialogs; report: ReportPort; documents: Documents; onExportProgress?: (p: RecordProgress) => void; exports: ExportControl };

/** The one record export that may run at a time, and its cancel. */
export function createExportControl() {
  let current: AbortController | null = null;
  return {
    begin(): AbortController {
      current?.abort();
      current = new AbortController();
      return current;
    },
    end(c: AbortController): void {
      if (current === c) current = null;
    },
    cancel(): boolean {
      if (!current) return false;
      current.abort();
      current = null;
      return true;
    },
  };
}
export type ExportControl = ReturnType<typeof createExportControl>;

/** Ask where to write an export; never over the document itself (through links, symbolic or hard). */
export async function writeExport(deps: Pick<ExportDeps, 'dialogs' | 'documents'>, handle: string | null | undefined, kind: SaveKind, name: string, data: string | Uint8Array): Promise<string | null> {
  const path = await deps.dialogs.savePath(kind, name);
  if (path === null) return null;
  const doc = deps.documents.pathOrNull(handle);
  if (doc && (await pathClash([['the review', doc]], [['the export', path]]))) {
    throw new UserError(`${basename(path)} is the review itself: an export never overwrites the review. Choose another file.`);
  }
  try {
    await atomicWrite(path, data);
  } catch (e) {
    throw new UserError(`could not write ${path}: ${explainFsError(e)}`);
  }
  return path;
}

/** Render the record (PDF) off main's event loop (the report port's worker), then ask where to put it. Cancel: { canceled: true }. */
export async function exportRecord(deps: ExportDeps, args: ServiceArgs<'exportRecord'>): ReturnType<Services['exportRecord']> {
  const { review } = reviewOf(args.text, 'no record made');
  const control = deps.exports.begin();
  let pdf: Uint8Array;
  try {
    pdf = await deps.report.renderRecord(review, { paper: args.paper, signal: control.signal, ...(deps.onExportProgress ? { onProgress: deps.onExportProgress } : {}) });
  } catch (e) {
    if (e instanceof ExportCanceled) return { canceled: true };
    throw e;
  } finally {
    deps.exports.end(control);
  }
  const path = await writeExport(deps, args.handle, 'record', `${stemOf(review)}.pdf`, pdf);
  return path === null ? { canceled: true } : { canceled: false, name: basename(path), bytes: pdf.byteLength };
}

/** The along-path CSV of every case, or the summary CSV (one row per case × oil). */
export async function exportCsv(deps: ExportDeps, args: ServiceArgs<'exportCsv'>): ReturnType<Services['exportCsv']> {
  const { review } = reviewOf(args.text, 'no CSV written');
  const results = resultsOf(review, 'no CSV written');
  const summary = args.table === 'summary';
  if (summary && !deps.report.summaryCsv) throw new UserError('no CSV written: the summary table is not available');
  const csv = summary && deps.report.summaryCsv ? deps.report.summaryCsv(results, review.displayUnits) : deps.report.casesCsv(results, review.displayUnits);
  const path = await writeExport(deps, args.handle, 'csv', `${stemOf(review)}-${summary ? 'summary' : 'cases'}.csv`, csv);
  return path === null ? { canceled: true } : { canceled: false, name: basename(path) };
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

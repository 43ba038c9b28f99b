import { readFile } from 'node:fs/promises';
import { basename } from 'node:path';
import { DEMO_REVIEWS } from '../../app/review/demo';
import { explainFsError, UserError } from './errors';
import { checkReviewPath, isInside } from './paths';
import type { RecentFiles } from './recent';
import { listIssues, reviewJson } from './reviewText';
import { parseReviewText } from '../../app/review/parse';
import type { Documents } from './documents';
import type { Dialogs, ServiceArgs, Services } from './types';

export const DEMO_FILE = 'harrow-creek-crusher-hs-pair.flankfilm.json';

type OpenDeps = { dialogs: Dialogs; recent: RecentFiles; readOnlyDirs: readonly string[]; documents: Documents };

/**
 * Open a review file. Never writes to it: a file from a newer Flankfilm, or one that fails the
 * schema, is refused with the reasons and left as it was. An older version is migrated in memory
 * and marked (migratedFrom); the file changes only when the user saves.
 */
export async function openReview(deps: OpenDeps, args: ServiceArgs<'openReview'>): ReturnType<Services['openReview']> {
  // Only a path main chose: a handle it gave out (recent list, command line, drop), else its dialog.
  const chosen = args.handle ? deps.documents.path(args.handle) : await deps.dialogs.openPath();
  if (chosen === null) return { canceled: true };
  const path = await checkReviewPath(chosen);
  const name = basename(path);
  let text: string;
  try {
    text = (await readFile(path, 'utf8')).replace(/^\uFEFF/, '');
  } catch (e) {
    throw new UserError(`cannot open ${name}: ${explainFsError(e)}`);
  }
  const parsed = parseReviewText(text);
  // The issues name fields and limits, never the file's own values (a foreign file's content stays out of the message).
  if (!parsed.ok) throw new UserError(`cannot open ${name}:\n${listIssues(parsed.issues)}`);
  await deps.recent.add(path);
  const untitled = isInside(path, deps.readOnlyDirs);
  const handle = untitled ? null : deps.documents.register(path);
  const shown = untitled ? null : name;
  if (parsed.migratedFrom !== null) {
    return { canceled: false, handle, name: shown, text: reviewJson(parsed.review), migratedFrom: parsed.migratedFrom };
  }
  return { canceled: false, handle, name: shown, text, migratedFrom: null };
}

/** The invented demo review, as an untitled document (Save asks where). */
export async function openDemo(): ReturnType<Services['openDemo']> {
  const demo = DEMO_REVIEWS[DEMO_FILE];
  if (!demo) throw new Error(`demo review ${DEMO_FILE} is missing from app/review/demo.ts`);
  return { canceled: false, handle: null, name: null, text: reviewJson(demo), migratedFrom: null };
}

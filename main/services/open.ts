import { readFile } from 'node:fs/promises';
import { basename } from 'node:path';
import { DEMO_REVIEWS } from '../../app/review/demo';
import { explainFsError, UserError } from './errors';
import { checkReviewPath, isInside } from './paths';
import type { RecentFiles } from './recent';
import { listIssues, reviewJson } from './reviewText';
import { parseReviewText } from '../../app/review/parse';
import type { Dialogs, ServiceArgs, Services } from './types';

export const DEMO_FILE = 'harrow-creek-crusher-hs-pair.flankfilm.json';

type OpenDeps = { dialogs: Dialogs; recent: RecentFiles; readOnlyDirs: readonly string[] };

/**
 * Open a review file. Never writes to it: a file from a newer Flankfilm, or one that fails the
 * schema, is refused with the reasons and left as it was. An older version is migrated in memory
 * and marked (migratedFrom); the file changes only when the user saves.
 */
export async function openReview(deps: OpenDeps, args: ServiceArgs<'openReview'>): ReturnType<Services['openReview']> {
  const chosen = args.path ?? (await deps.dialogs.openPath());
  if (chosen === null) return { canceled: true };
  const path = await checkReviewPath(chosen);
  let text: string;
  try {
    text = (await readFile(path, 'utf8')).replace(/^\uFEFF/, '');
  } catch (e) {
    throw new UserError(`cannot open ${path}: ${explainFsError(e)}`);
  }
  const parsed = parseReviewText(text);
  if (!parsed.ok) throw new UserError(`cannot open ${basename(path)}:\n${listIssues(parsed.issues)}`);
  await deps.recent.add(path);
  const untitled = isInside(path, deps.readOnlyDirs);
  if (parsed.migratedFrom !== null) {
    return { canceled: false, path: untitled ? null : path, text: reviewJson(parsed.review), migratedFrom: parsed.migratedFrom };
  }
  return { canceled: false, path: untitled ? null : path, text, migratedFrom: null };
}

/** The invented demo review, as an untitled document (Save asks where). */
export async function openDemo(): ReturnType<Services['openDemo']> {
  const demo = DEMO_REVIEWS[DEMO_FILE];
  if (!demo) throw new Error(`demo review ${DEMO_FILE} is missing from app/review/demo.ts`);
  return { canceled: false, path: null, text: reviewJson(demo), migratedFrom: null };
}

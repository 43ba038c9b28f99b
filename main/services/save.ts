import { atomicWrite } from '../../app/files/atomicWrite';
import type { Autosave } from './autosave';
import { explainFsError, UserError } from './errors';
import { suggestedReviewName, withReviewExtension } from './paths';
import type { RecentFiles } from './recent';
import { reviewOf } from './reviewText';
import type { Documents } from './documents';
import type { Dialogs, ServiceArgs, Services } from './types';
import { basename } from 'node:path';

type SaveDeps = { dialogs: Dialogs; recent: RecentFiles; autosave: Autosave; documents: Documents };

/**
 * Save a review atomically (temp file, fsync, rename; the previous file kept as .bak). A review
 * that would not open again is refused. On failure the target is untouched and the edits stay
 * in the window and in the autosave, and the message says so.
 */
export async function saveReview(deps: SaveDeps, args: ServiceArgs<'saveReview'>): ReturnType<Services['saveReview']> {
  const { review } = reviewOf(args.text, 'not saved');
  // The path comes from main: the handle's (a file main opened or saved before), else the dialog's.
  const current = args.handle ? deps.documents.path(args.handle) : null;
  const chosen = current && !args.saveAs ? current : await deps.dialogs.savePath('review', suggestedReviewName(current, review.title));
  if (chosen === null) return { canceled: true };
  const path = withReviewExtension(chosen);
  try {
    await atomicWrite(path, args.text, { keepBackup: true });
  } catch (e) {
    throw new UserError(`could not save to ${path}: ${explainFsError(e)}. The file was not changed and your edits are kept; use Save as… to choose another place.`);
  }
  await deps.recent.add(path);
  const pending = await deps.autosave.recover();
  if (pending?.text === args.text) await deps.autosave.discard();
  return { canceled: false, handle: deps.documents.register(path), name: basename(path) };
}

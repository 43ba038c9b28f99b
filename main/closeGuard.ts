import type { CloseChoice, DocumentState } from './services/types';

export interface CloseGuardDeps {
  confirmClose(title: string): Promise<CloseChoice>;
  /** Ask the renderer to save (it answers with setDocumentState dirty false when done). */
  requestSave(): void;
  /** Close the window for real. */
  close(): void;
  /** The user chose to throw the edits away: the autosave goes too. */
  discardAutosave(): Promise<void>;
}

/**
 * Unsaved changes on close: the window's 'close' handler calls onClose; with edits pending it
 * cancels the close and asks Save / Don't save / Cancel. "Save" closes once the renderer reports
 * the review clean, and gives up if that save is canceled or fails.
 */
export function createCloseGuard(deps: CloseGuardDeps) {
  let state: DocumentState = { title: 'Untitled review', dirty: false };
  let allowed = false;
  let asking = false;
  let closeAfterSave = false;

  const closeNow = () => {
    allowed = true;
    deps.close();
  };

  return {
    get state(): DocumentState {
      return state;
    },
    setState(next: DocumentState): void {
      state = next;
      if (!next.dirty && closeAfterSave) {
        closeAfterSave = false;
        closeNow();
      }
    },
    /** A save finished: if it did not save (canceled or failed), the pending close is dropped. */
    saveFinished(saved: boolean): void {
      if (!saved) closeAfterSave = false;
    },
    onClose(event: { preventDefault(): void }): void {
      if (allowed || !state.dirty) return;
      event.preventDefault();
      if (asking) return;
      asking = true;
      deps
        .confirmClose(state.title)
        .then(async (choice) => {
          if (choice === 'discard') {
            await deps.discardAutosave().catch(() => undefined);
            closeNow();
          } else if (choice === 'save') {
            closeAfterSave = true;
            deps.requestSave();
          }
        })
        .finally(() => {
          asking = false;
        });
    },
  };
}

export type CloseGuard = ReturnType<typeof createCloseGuard>;

import { useEffect } from 'react';
import type { Bridge } from '../../app/bridge/contract';
import { draftText, type DocState } from '../state/reviewState';

const AUTOSAVE_DELAY_MS = 1500;

/** Tell main the window's title and unsaved mark; keep unsaved edits in main's autosave (debounced). */
export function usePersistence(bridge: Bridge, doc: DocState): void {
  const title = typeof doc.draft?.title === 'string' ? doc.draft.title : 'Flankfilm';
  const open = doc.draft !== null;
  useEffect(() => {
    if (!open) return;
    bridge.setDocumentState({ title: title.slice(0, 300), dirty: doc.dirty }).catch(() => undefined);
  }, [bridge, title, doc.dirty, open]);

  useEffect(() => {
    if (!doc.draft || !doc.dirty) return;
    const draft = doc.draft;
    const timer = setTimeout(() => {
      bridge.autosave({ text: draftText(draft), handle: doc.handle }).catch(() => undefined);
    }, AUTOSAVE_DELAY_MS);
    return () => clearTimeout(timer);
  }, [bridge, doc.draft, doc.dirty, doc.handle]);
}

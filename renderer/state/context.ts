import { createContext, useCallback, useContext, useSyncExternalStore, type Dispatch } from 'react';
import type { UnitSystem } from '../units/units';
import type { DocStore } from './docStore';
import { pathKey, type FieldPath } from './paths';
import type { DocAction, Draft } from './reviewState';

/**
 * What every input needs: the document, the unit system, how to edit. It changes only with the
 * units, so an edit re-renders no input through it: each reads its own value and messages from
 * the store (useDraftValue, useFieldMessages) and re-renders when those change.
 */
export interface SheetContext {
  readonly store: DocStore;
  readonly units: UnitSystem;
  readonly dispatch: Dispatch<DocAction>;
  /** A field has typed text not yet taken into the draft (on), or has taken it (off). */
  readonly pending: (pathKey: string, on: boolean) => void;
}

export const Sheet = createContext<SheetContext | null>(null);

export function useSheet(): SheetContext {
  const ctx = useContext(Sheet);
  if (!ctx) throw new Error('useSheet outside <Sheet.Provider>');
  return ctx;
}

/** The draft's value at `path`; re-renders when it (or the field's messages) change, not on other edits. */
export function useDraftValue(path: FieldPath): unknown {
  const { store } = useSheet();
  const key = pathKey(path);
  // Keyed by the dotted path, so a new array with the same path (every render) keeps the subscription.
  const subscribe = useCallback((l: () => void) => store.subscribeField(path, l), [store, key]);
  return useSyncExternalStore(subscribe, useCallback(() => store.valueAt(path), [store, key]));
}

/** The messages of a field (schema issues, then an engine input error), by its dotted path. */
export function useFieldMessages(path: FieldPath): readonly string[] {
  const { store } = useSheet();
  const key = pathKey(path);
  const subscribe = useCallback((l: () => void) => store.subscribeField(path, l), [store, key]);
  return useSyncExternalStore(subscribe, useCallback(() => store.messagesAt(key), [store, key]));
}

/**
 * Something derived from the whole draft (a count, a kind, a note): told of every edit, it
 * re-renders only when what `select` returns changes (Object.is), so it should return a primitive
 * or a part of the draft, never a new object.
 */
export function useDraftSelect<T>(select: (draft: Draft | null) => T): T {
  const { store } = useSheet();
  return useSyncExternalStore(store.subscribe, () => select(store.getState().draft));
}

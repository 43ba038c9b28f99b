import { createContext, useContext, type Dispatch } from 'react';
import type { UnitSystem } from '../units/units';
import type { DocAction, Draft } from './reviewState';

/** What every input needs: the draft, the unit system, how to edit, and the messages per field. */
export interface SheetContext {
  readonly draft: Draft;
  readonly units: UnitSystem;
  readonly dispatch: Dispatch<DocAction>;
  /** Messages for a field by its dotted path (schema issues, then an engine input error). */
  readonly messagesAt: (pathKey: string) => readonly string[];
  /** A field has typed text not yet taken into the draft (on), or has taken it (off). */
  readonly pending: (pathKey: string, on: boolean) => void;
}

export const Sheet = createContext<SheetContext | null>(null);

export function useSheet(): SheetContext {
  const ctx = useContext(Sheet);
  if (!ctx) throw new Error('useSheet outside <Sheet.Provider>');
  return ctx;
}

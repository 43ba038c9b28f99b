import type { z } from 'zod';
import type { CallName, CallResult, Contract } from '../../app/bridge/contract';
import type { Results } from '../../app/review/results';
import type { Review } from '../../app/review/schema';
import type { FleetInputs } from '../../app/fleet/fingerprint';
import type { FleetResult } from '../../app/fleet/types';

/** A call's arguments after the contract's schema has parsed them (defaults filled in). */
export type ServiceArgs<K extends CallName> = z.output<Contract[K]['args']>;

/** Every contract call as a plain async function: what main's IPC and the test harness both serve. */
export type Services = { [K in CallName]: (args: ServiceArgs<K>) => Promise<CallResult<K>> };

export type SaveKind = 'review' | 'record' | 'csv';
export type CloseChoice = 'save' | 'discard' | 'cancel';

/** The questions main asks the user. Electron's dialogs in the app; fixed paths in the harness. */
export interface Dialogs {
  /** A review file to open, or null when the user cancels. */
  openPath(): Promise<string | null>;
  /** Where to write a review, record or CSV; `suggestedName` is a bare file name. Null: canceled. */
  savePath(kind: SaveKind, suggestedName: string): Promise<string | null>;
  /** The window is closing with unsaved edits to the review called `title`. */
  confirmClose(title: string): Promise<CloseChoice>;
}

export type Paper = 'a4' | 'letter';

export interface RecordProgress {
  readonly done: number;
  readonly total: number;
}

/** What main needs from app/report, injected so tests can count pages without PDF rendering. */
export interface ReportPort {
  /** The record; rejects with ExportCanceled when `signal` aborts, with UserError for a review it cannot draw or compute. */
  renderRecord(review: Review, options: { paper: Paper; onProgress?: (p: RecordProgress) => void; signal?: AbortSignal }): Promise<Uint8Array>;
  /** Where records are made in a standing worker: start it and make a record to throw away, so the first export is warm. */
  warmRecord?(): Promise<void>;
  /** Where records are made in a standing worker: stop it (at quit). */
  stopRecordWorker?(): void;
  /** The along-path CSV of every case, in the review's display units. */
  casesCsv(results: Results, units: Review['displayUnits']): string;
  /** The fleet record; app/report's own when not injected. */
  renderFleetRecord?(result: FleetResult, inputs: FleetInputs, options: { paper: Paper }): Promise<Uint8Array>;
  /** One row per case × oil: key figures, limits, pass or fail. */
  summaryCsv?(results: Results, units: Review['displayUnits']): string;
}

export interface DocumentState {
  readonly title: string;
  readonly dirty: boolean;
}

export interface ServiceDeps {
  readonly dialogs: Dialogs;
  /** Per-user folder for the autosave and the recent-files list (Electron's userData). */
  readonly userDataDir: string;
  /** Source of "now" for sign-off and autosave times. */
  readonly clock: () => Date;
  readonly appVersion: string;
  readonly platform: string;
  readonly report: ReportPort;
  /** Folders whose reviews open as untitled copies (the bundled demo), so Save never overwrites them. */
  readonly readOnlyDirs?: readonly string[];
  readonly onDocumentState?: (state: DocumentState) => void;
  readonly onRecentChanged?: (paths: readonly string[]) => void;
  /** Progress of a record export (made in a worker), for the window's progress bar. */
  readonly onExportProgress?: (p: RecordProgress) => void;
}

import { z } from 'zod';
import { DECISIONS } from '../review/schema';

/**
 * The one contract between the renderer and the main process. Every call has a zod schema for
 * its argument and its result; main validates arguments, the renderer validates results. The
 * same contract is served over HTTP by the test harness (tests/harness), with the same services.
 */
const canceled = z.object({ canceled: z.literal(true) });
const opened = z.object({ canceled: z.literal(false), path: z.string().nullable(), text: z.string(), migratedFrom: z.number().int().nullable().optional() });

export const contract = {
  /** Open a review: with a path (recent list, OS, drag and drop) or by the open dialog. */
  openReview: { args: z.object({ path: z.string().max(4096).optional() }), result: z.union([opened, canceled]) },
  /** The invented demo review that `npm start` opens. */
  openDemo: { args: z.object({}), result: opened },
  /** Save atomically (temp file, fsync, rename, previous kept as .bak); a dialog if no path or saveAs. */
  saveReview: {
    args: z.object({ path: z.string().max(4096).nullable(), text: z.string().max(2_000_000), saveAs: z.boolean() }),
    result: z.union([z.object({ canceled: z.literal(false), path: z.string() }), canceled]),
  },
  /** Render the record (PDF) of the review in main and save it by a dialog. */
  exportRecord: {
    args: z.object({ text: z.string().max(2_000_000), paper: z.enum(['a4', 'letter']) }),
    result: z.union([z.object({ canceled: z.literal(false), path: z.string(), bytes: z.number().int() }), canceled]),
  },
  /** Write a CSV: every point along the path of every case, or the summary (one row per case × oil). */
  exportCsv: {
    args: z.object({ text: z.string().max(2_000_000), table: z.enum(['points', 'summary']).optional() }),
    result: z.union([z.object({ canceled: z.literal(false), path: z.string() }), canceled]),
  },
  /** Stamp a sign-off (signedAt from main's clock, fingerprint of inputs + results + engine version). */
  signReview: {
    args: z.object({
      text: z.string().max(2_000_000),
      reviewer: z.string().min(1).max(200),
      role: z.string().min(1).max(200),
      organisation: z.string().max(200).optional(),
      decision: z.enum(DECISIONS),
      conditions: z.string().max(4000).optional(),
    }),
    result: z.object({ text: z.string() }),
  },
  /** Keep unsaved edits in userData; recover them after a crash. */
  autosave: { args: z.object({ text: z.string().max(2_000_000), path: z.string().nullable() }), result: z.object({ ok: z.literal(true) }) },
  recoverAutosave: { args: z.object({}), result: z.object({ text: z.string(), path: z.string().nullable(), savedAt: z.string() }).nullable() },
  discardAutosave: { args: z.object({}), result: z.object({ ok: z.literal(true) }) },
  recentFiles: { args: z.object({}), result: z.array(z.string()) },
  /** The window's title and "unsaved" mark, so close can prompt. */
  setDocumentState: { args: z.object({ title: z.string().max(300), dirty: z.boolean() }), result: z.object({ ok: z.literal(true) }) },
  appInfo: { args: z.object({}), result: z.object({ version: z.string(), engineVersion: z.string(), platform: z.string() }) },
} as const;

export type Contract = typeof contract;
export type CallName = keyof Contract;
export type CallArgs<K extends CallName> = z.input<Contract[K]['args']>;
export type CallResult<K extends CallName> = z.output<Contract[K]['result']>;

/** Menu commands main sends to the renderer (one-way events). */
export const MENU_COMMANDS = ['new', 'open', 'save', 'save-as', 'export-record', 'export-csv', 'sign', 'methods', 'about', 'units-si', 'units-us'] as const;
export type MenuCommand = (typeof MENU_COMMANDS)[number];
export const menuEvent = z.object({ command: z.enum(MENU_COMMANDS), path: z.string().optional() });

/** The bridge object the preload exposes as `window.flankfilm`: one function per call, plus the menu event. */
export type Bridge = { [K in CallName]: (args: CallArgs<K>) => Promise<CallResult<K>> } & {
  onMenu(listener: (e: z.output<typeof menuEvent>) => void): () => void;
  /**
   * The file-system path of a file dropped on the window, for openReview({ path }); '' if it has
   * none. Electron's preload only (webUtils.getPathForFile; File.path is gone since Electron 32);
   * other transports leave it out.
   */
  pathForFile?(file: unknown): string;
};

export const CALL_NAMES = Object.keys(contract) as CallName[];

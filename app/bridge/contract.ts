import { z } from 'zod';
import { DECISIONS } from '../review/schema';

/**
 * The one contract between the renderer and the main process. Every call has a zod schema for
 * its argument and its result; main validates arguments, the renderer validates results. The
 * same contract is served over HTTP by the test harness (tests/harness), with the same services.
 */
const canceled = z.object({ canceled: z.literal(true) });
/**
 * An opaque document handle. Main alone holds file paths: it chooses them (its dialogs, the
 * recent-files list, the command line, a drop through the preload) and gives the renderer a
 * handle for each; the renderer passes handles back and shows only the file's name.
 */
export const documentHandle = z.string().regex(/^doc-[0-9a-f-]{36}$/, 'not a document handle');
const fileName = z.string().max(255);
const opened = z.object({ canceled: z.literal(false), handle: documentHandle.nullable(), name: fileName.nullable(), text: z.string(), migratedFrom: z.number().int().nullable().optional() });

/** The calls that name files take strict objects: a `path` key from a renderer is refused, not ignored. */
export const contract = {
  /** Open a review: by a handle main gave (recent list, command line, drop) or by the open dialog. */
  openReview: { args: z.strictObject({ handle: documentHandle.optional() }), result: z.union([opened, canceled]) },
  /** The invented demo review that `npm start` opens. */
  openDemo: { args: z.object({}), result: opened },
  /** Save atomically (temp file, fsync, rename, previous kept as .bak); a dialog if no path or saveAs. */
  saveReview: {
    args: z.strictObject({ handle: documentHandle.nullable(), text: z.string().max(2_000_000), saveAs: z.boolean() }),
    result: z.union([z.object({ canceled: z.literal(false), handle: documentHandle, name: fileName }), canceled]),
  },
  /** Render the record (PDF) of the review in main and save it by a dialog (never over the document `handle` names). */
  exportRecord: {
    args: z.strictObject({ text: z.string().max(2_000_000), paper: z.enum(['a4', 'letter']), handle: documentHandle.nullable().optional() }),
    result: z.union([z.object({ canceled: z.literal(false), name: fileName, bytes: z.number().int() }), canceled]),
  },
  /** Stop the record export under way (its worker is ended; nothing is written); canceled: whether one was running. */
  cancelExport: { args: z.object({}), result: z.object({ canceled: z.boolean() }) },
  /** Write a CSV: every point along the path of every case, or the summary (one row per case × oil). */
  exportCsv: {
    args: z.strictObject({ text: z.string().max(2_000_000), handle: documentHandle.nullable().optional(), table: z.enum(['points', 'summary']).optional() }),
    result: z.union([z.object({ canceled: z.literal(false), name: fileName }), canceled]),
  },
  /** Render the fleet record (PDF) of reviews (by file name and text) against a candidate-oil file, and save it by a dialog. */
  exportFleetRecord: {
    args: z.strictObject({
      reviews: z.array(z.strictObject({ name: fileName.min(1), text: z.string().max(2_000_000) })).min(1).max(200),
      oils: z.string().max(2_000_000),
      paper: z.enum(['a4', 'letter']),
    }),
    result: z.union([z.object({ canceled: z.literal(false), name: fileName, bytes: z.number().int() }), canceled]),
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
  autosave: { args: z.strictObject({ text: z.string().max(2_000_000), handle: documentHandle.nullable() }), result: z.object({ ok: z.literal(true) }) },
  recoverAutosave: { args: z.object({}), result: z.object({ text: z.string(), handle: documentHandle.nullable(), name: fileName.nullable(), savedAt: z.string() }).nullable() },
  discardAutosave: { args: z.object({}), result: z.object({ ok: z.literal(true) }) },
  recentFiles: { args: z.object({}), result: z.array(z.object({ handle: documentHandle, name: fileName })) },
  /** The window's title and "unsaved" mark, so close can prompt. */
  setDocumentState: { args: z.object({ title: z.string().max(300), dirty: z.boolean() }), result: z.object({ ok: z.literal(true) }) },
  appInfo: { args: z.object({}), result: z.object({ version: z.string(), engineVersion: z.string(), platform: z.string() }) },
} as const;

export type Contract = typeof contract;
export type CallName = keyof Contract;
export type CallArgs<K extends CallName> = z.input<Contract[K]['args']>;
export type CallResult<K extends CallName> = z.output<Contract[K]['result']>;

/** Menu commands main sends to the renderer (one-way events). */
export const MENU_COMMANDS = ['new', 'open', 'save', 'save-as', 'export-record', 'export-csv', 'export-summary-csv', 'sign', 'compare', 'methods', 'about', 'units-si', 'units-us'] as const;
export type MenuCommand = (typeof MENU_COMMANDS)[number];
export const menuEvent = z.object({ command: z.enum(MENU_COMMANDS), handle: documentHandle.optional() });

/** Progress of a record export, pushed by main while its worker runs. */
export const progressEvent = z.object({ done: z.number().int().nonnegative(), total: z.number().int().positive() });
export type ProgressEvent = z.output<typeof progressEvent>;

/** The bridge object the preload exposes as `window.flankfilm`: one function per call, plus the menu event. */
export type Bridge = { [K in CallName]: (args: CallArgs<K>) => Promise<CallResult<K>> } & {
  onMenu(listener: (e: z.output<typeof menuEvent>) => void): () => void;
  /** Record-export progress (optional: a transport without it shows a busy bar only). */
  onProgress?(listener: (e: ProgressEvent) => void): () => void;
  /**
   * A handle for a file dropped on the window, for openReview({ handle }); null if it has no
   * path. Electron's preload only: it reads the path (webUtils.getPathForFile) and hands it to
   * main, which keeps it and answers with a handle; the page never sees the path. Other
   * transports leave it out.
   */
  handleForFile?(file: unknown): Promise<string | null>;
};

export const CALL_NAMES = Object.keys(contract) as CallName[];

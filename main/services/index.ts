import { ENGINE_VERSION } from '../../app/engine/version';
import { createAutosave } from './autosave';
import { exportCsv, exportRecord, signReview } from './exports';
import { exportFleetRecord } from './fleet';
import { openDemo, openReview } from './open';
import { createRecentFiles } from './recent';
import { saveReview } from './save';
import type { ServiceDeps, Services } from './types';

/**
 * Every contract call over injected dependencies (dialogs, userData folder, clock, report).
 * No Electron here: main wires Electron's dialogs in, the harness wires fixed paths.
 */
export function createServices(deps: ServiceDeps): Services & { readonly recent: ReturnType<typeof createRecentFiles>; readonly autosaveStore: ReturnType<typeof createAutosave> } {
  const recent = createRecentFiles(deps.userDataDir, deps.onRecentChanged);
  const autosaveStore = createAutosave(deps.userDataDir, deps.clock);
  const readOnlyDirs = deps.readOnlyDirs ?? [];
  return {
    recent,
    autosaveStore,
    openReview: (args) => openReview({ dialogs: deps.dialogs, recent, readOnlyDirs }, args),
    openDemo: () => openDemo(),
    saveReview: (args) => saveReview({ dialogs: deps.dialogs, recent, autosave: autosaveStore }, args),
    exportRecord: (args) => exportRecord(deps, args),
    exportCsv: (args) => exportCsv(deps, args),
    exportFleetRecord: (args) => exportFleetRecord(deps, args),
    signReview: (args) => signReview(deps, args),
    autosave: async (args) => {
      await autosaveStore.save(args.text, args.path);
      return { ok: true };
    },
    recoverAutosave: () => autosaveStore.recover(),
    discardAutosave: async () => {
      await autosaveStore.discard();
      return { ok: true };
    },
    recentFiles: () => recent.list(),
    setDocumentState: async (args) => {
      deps.onDocumentState?.(args);
      return { ok: true };
    },
    appInfo: async () => ({ version: deps.appVersion, engineVersion: ENGINE_VERSION, platform: deps.platform }),
  };
}

export type { Dialogs, ReportPort, ServiceDeps, Services } from './types';
export { UserError } from './errors';

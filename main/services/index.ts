import { basename } from 'node:path';
import { ENGINE_VERSION } from '../../app/engine/version';
import { createDocuments, type Documents } from './documents';
import { createAutosave } from './autosave';
import { createExportControl, exportCsv, exportRecord, signReview } from './exports';
import { exportFleetRecord } from './fleet';
import { openDemo, openReview } from './open';
import { createRecentFiles } from './recent';
import { saveReview } from './save';
import type { ServiceDeps, Services } from './types';

/**
 * Every contract call over injected dependencies (dialogs, userData folder, clock, report).
 * No Electron here: main wires Electron's dialogs in, the harness wires fixed paths.
 */
export function createServices(
  deps: ServiceDeps,
): Services & { readonly recent: ReturnType<typeof createRecentFiles>; readonly autosaveStore: ReturnType<typeof createAutosave>; readonly documents: Documents } {
  const recent = createRecentFiles(deps.userDataDir, deps.onRecentChanged);
  const autosaveStore = createAutosave(deps.userDataDir, deps.clock);
  const readOnlyDirs = deps.readOnlyDirs ?? [];
  const documents = createDocuments();
  const exportControl = createExportControl();
  return {
    recent,
    autosaveStore,
    documents,
    openReview: (args) => openReview({ dialogs: deps.dialogs, recent, readOnlyDirs, documents }, args),
    openDemo: () => openDemo(),
    saveReview: (args) => saveReview({ dialogs: deps.dialogs, recent, autosave: autosaveStore, documents }, args),
    exportRecord: (args) => exportRecord({ ...deps, documents, exports: exportControl }, args),
    cancelExport: async () => ({ canceled: exportControl.cancel() }),
    exportCsv: (args) => exportCsv({ ...deps, documents, exports: exportControl }, args),
    exportFleetRecord: (args) => exportFleetRecord({ ...deps, documents }, args),
    signReview: (args) => signReview(deps, args),
    autosave: async (args) => {
      await autosaveStore.save(args.text, args.handle === null ? null : documents.path(args.handle));
      return { ok: true };
    },
    recoverAutosave: async () => {
      const kept = await autosaveStore.recover();
      if (!kept) return null;
      const handle = kept.path === null ? null : documents.register(kept.path);
      return { text: kept.text, handle, name: handle === null ? null : documents.name(handle), savedAt: kept.savedAt };
    },
    discardAutosave: async () => {
      await autosaveStore.discard();
      return { ok: true };
    },
    recentFiles: async () => (await recent.list()).map((p) => ({ handle: documents.register(p), name: basename(p) })),
    setDocumentState: async (args) => {
      deps.onDocumentState?.(args);
      return { ok: true };
    },
    appInfo: async () => ({ version: deps.appVersion, engineVersion: ENGINE_VERSION, platform: deps.platform }),
  };
}

export type { Dialogs, ReportPort, ServiceDeps, Services } from './types';
export { UserError } from './errors';

/**
 * Flankfilm's Electron main process: one hardened window on app://flankfilm/, the contract's
 * calls registered through `handle` (ipc.ts), the native menu, single instance, files opened by
 * the OS, and the unsaved-changes prompt. The work itself is in ./services (no Electron there).
 */
import { app, BrowserWindow, Menu, session } from 'electron';
import { join } from 'node:path';
import { CALL_NAMES, type CallName } from '../app/bridge/contract';
import { reviewPathFromArgv } from './argv';
import { MENU_CHANNEL, PROGRESS_CHANNEL } from './channels';
import { createCloseGuard } from './closeGuard';
import { electronDialogs } from './dialogs';
import { handle, handleDrop } from './ipc';
import { menuTemplate, type MenuEvent } from './menu';
import { APP_URL } from './origin';
import { registerAppScheme, serveAppScheme } from './protocol';
import { createServices } from './services';
import type { CallImpl } from './services/dispatch';
import { createReportPort } from './services/report';
import type { Services } from './services/types';
import { hardenSession, hardenWebContents, windowOptions } from './window';

const appRoot = app.getAppPath();
const paths = {
  renderer: join(appRoot, 'dist', 'renderer'),
  preload: join(__dirname, 'preload.cjs'),
  icon: join(appRoot, 'assets', 'icon.png'),
  demo: join(appRoot, 'assets', 'demo'),
  fonts: join(appRoot, 'assets', 'fonts'),
};

let win: BrowserWindow | null = null;
let pendingOpen: string | null = reviewPathFromArgv(process.argv, process.cwd());

app.enableSandbox();
registerAppScheme();

if (!app.requestSingleInstanceLock()) {
  app.quit();
} else {
  app.on('second-instance', (_event, argv, cwd) => {
    const path = reviewPathFromArgv(argv, cwd);
    if (!win) {
      pendingOpen = path;
      return;
    }
    if (win.isMinimized()) win.restore();
    win.focus();
    if (path) send({ command: 'open', path });
  });
  // macOS hands files over by event, possibly before 'ready'.
  app.on('open-file', (event, path) => {
    event.preventDefault();
    if (win) send({ command: 'open', path });
    else pendingOpen = path;
  });
  app.on('web-contents-created', (_event, contents) => hardenWebContents(contents));
  app.whenReady().then(start, (e: unknown) => {
    console.error('flankfilm: could not start:', e);
    app.exit(1);
  });
}

/** A menu command to the page; a path (recent list, command line, OS) goes as a document handle. */
function send(event: MenuEvent): void {
  const { path, ...rest } = event;
  win?.webContents.send(MENU_CHANNEL, path === undefined ? rest : { ...rest, handle: services.documents.register(path) });
}

const dialogs = electronDialogs(
  () => win,
  () => app.getPath('documents'),
);

const guard = createCloseGuard({
  confirmClose: (title) => dialogs.confirmClose(title),
  requestSave: () => send({ command: 'save' }),
  close: () => win?.close(),
  discardAutosave: () => services.autosaveStore.discard(),
});

let services: ReturnType<typeof createServices>;
// The record is made in a standing worker thread: main's event loop (and so the window) stays free.
const report = createReportPort(paths.fonts, { file: join(__dirname, 'recordWorker.cjs') });
/** After the window shows, the record worker warms up (a record thrown away), so the first export is as quick as later ones. */
const RECORD_WARM_UP_DELAY_MS = 4000;

function rebuildMenu(recent: readonly string[]): void {
  const template = menuTemplate({
    platform: process.platform,
    recent,
    development: !app.isPackaged,
    send,
    clearRecent: () => void services.recent.clear(),
    quit: () => app.quit(),
  });
  Menu.setApplicationMenu(Menu.buildFromTemplate(template));
}

/** The services as main serves them: saves report back to the close prompt; the title follows the document. */
function mainImpls(s: Services & { readonly documents: ReturnType<typeof createServices>['documents'] }): Services {
  return {
    ...s,
    async saveReview(args) {
      try {
        const r = await s.saveReview(args);
        guard.saveFinished(!r.canceled);
        if (!r.canceled) app.addRecentDocument(s.documents.path(r.handle));
        return r;
      } catch (e) {
        guard.saveFinished(false);
        throw e;
      }
    },
  };
}

function register<K extends CallName>(impls: Services, name: K): void {
  handle(name, impls[name] as CallImpl<K>);
}

async function start(): Promise<void> {
  hardenSession(session.defaultSession);
  serveAppScheme(paths.renderer);
  services = createServices({
    dialogs,
    userDataDir: app.getPath('userData'),
    clock: () => new Date(),
    appVersion: app.getVersion(),
    platform: process.platform,
    report,
    readOnlyDirs: [paths.demo],
    onDocumentState: (state) => {
      guard.setState(state);
      win?.setTitle(`${state.dirty ? '• ' : ''}${state.title} — Flankfilm`);
      win?.setDocumentEdited(state.dirty);
    },
    onRecentChanged: rebuildMenu,
    onExportProgress: (p) => win?.webContents.send(PROGRESS_CHANNEL, p),
  });
  const impls = mainImpls(services);
  for (const name of CALL_NAMES) register(impls, name);
  // A dropped file: the preload sends its path (webUtils), main keeps it and answers with a handle.
  handleDrop((path) => services.documents.register(path));
  rebuildMenu(await services.recent.list());
  createWindow();
  app.on('activate', () => {
    if (BrowserWindow.getAllWindows().length === 0) createWindow();
  });
}

function createWindow(): void {
  const w = new BrowserWindow(windowOptions(paths.preload, process.platform === 'linux' ? paths.icon : undefined));
  win = w;
  w.on('close', (event) => guard.onClose(event));
  w.on('closed', () => {
    if (win === w) win = null;
  });
  w.once('ready-to-show', () => {
    w.show();
    setTimeout(() => void report.warmRecord?.(), RECORD_WARM_UP_DELAY_MS).unref();
  });
  w.webContents.on('did-finish-load', () => {
    if (pendingOpen) send({ command: 'open', path: pendingOpen });
    pendingOpen = null;
  });
  // A renderer crash loses nothing that was autosaved: reload (a few times at most), and the page offers recovery.
  let reloads = 0;
  w.webContents.on('render-process-gone', (_event, details) => {
    console.error(`flankfilm: the window's renderer stopped (${details.reason})`);
    if (details.reason !== 'clean-exit' && !w.isDestroyed() && reloads++ < 3) w.webContents.reload();
  });
  void w.loadURL(APP_URL);
}

app.on('will-quit', () => report.stopRecordWorker?.());

app.on('window-all-closed', () => {
  if (process.platform !== 'darwin') app.quit();
});

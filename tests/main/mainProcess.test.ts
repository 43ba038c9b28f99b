/**
 * main/main.ts wired to a fake Electron (vi.mock): the calls registered, the window it opens,
 * the protocol it serves, files handed over by the command line and a second instance, and the
 * unsaved-changes prompt on close.
 */
import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it, vi } from 'vitest';
import { CALL_NAMES } from '../../app/bridge/contract';
import { CSP } from '../../main/csp';

const fake = vi.hoisted(() => {
  const root = `${process.env.TMPDIR ?? '/tmp'}/flankfilm-main-${process.pid}-${Date.now()}`;
  return {
    root,
    handlers: new Map<string, (event: unknown, args: unknown) => Promise<unknown>>(),
    windows: [] as Array<Record<string, unknown> & { options: Record<string, unknown> }>,
    protocolHandler: null as null | ((r: { url: string; method: string }) => Promise<Response>),
    privileged: [] as unknown[],
    menu: null as unknown,
    messageBoxResponse: 1,
    messageBoxes: [] as unknown[],
    sandboxEnabled: false,
  };
});

vi.mock('electron', async () => {
  const { EventEmitter } = await import('node:events');
  const { join: j } = await import('node:path');
  const app = Object.assign(new EventEmitter(), {
    getAppPath: () => fake.root,
    getPath: (name: string) => j(fake.root, 'user', name),
    getVersion: () => '0.1.0',
    isPackaged: false,
    enableSandbox: () => {
      fake.sandboxEnabled = true;
    },
    requestSingleInstanceLock: () => true,
    quit: vi.fn(),
    exit: vi.fn(),
    whenReady: () => Promise.resolve(),
    addRecentDocument: vi.fn(),
  });
  class WebContents extends EventEmitter {
    send = vi.fn();
    reload = vi.fn();
    openHandler: unknown = null;
    setWindowOpenHandler(fn: unknown) {
      this.openHandler = fn;
    }
  }
  class BrowserWindow extends EventEmitter {
    static getAllWindows = () => fake.windows;
    options: unknown;
    webContents = new WebContents();
    destroyed = false;
    loadURL = vi.fn(async () => undefined);
    setTitle = vi.fn();
    setDocumentEdited = vi.fn();
    show = vi.fn();
    focus = vi.fn();
    restore = vi.fn();
    isMinimized = () => false;
    isDestroyed = () => this.destroyed;
    constructor(options: unknown) {
      super();
      this.options = options;
      fake.windows.push(this as never);
      app.emit('web-contents-created', {}, this.webContents);
    }
    close() {
      let prevented = false;
      this.emit('close', { preventDefault: () => (prevented = true) });
      if (!prevented) {
        this.destroyed = true;
        this.emit('closed');
      }
    }
  }
  return {
    app,
    BrowserWindow,
    Menu: { buildFromTemplate: (t: unknown) => t, setApplicationMenu: (m: unknown) => (fake.menu = m) },
    ipcMain: { handle: (channel: string, fn: (e: unknown, a: unknown) => Promise<unknown>) => fake.handlers.set(channel, fn) },
    protocol: {
      registerSchemesAsPrivileged: (s: unknown[]) => fake.privileged.push(...s),
      handle: (_scheme: string, fn: (r: { url: string; method: string }) => Promise<Response>) => (fake.protocolHandler = fn),
    },
    session: {
      defaultSession: { setPermissionRequestHandler: vi.fn(), setPermissionCheckHandler: vi.fn(), setDevicePermissionHandler: vi.fn(), webRequest: { onBeforeRequest: vi.fn() } },
    },
    dialog: {
      showMessageBox: vi.fn(async (...args: unknown[]) => {
        fake.messageBoxes.push(args);
        return { response: fake.messageBoxResponse };
      }),
      showOpenDialog: vi.fn(async () => ({ canceled: true, filePaths: [] })),
      showSaveDialog: vi.fn(async () => ({ canceled: true })),
    },
  };
});

// An app folder with a built page, and a review named on the command line (as npm start passes it).
mkdirSync(join(fake.root, 'dist', 'renderer'), { recursive: true });
writeFileSync(join(fake.root, 'dist', 'renderer', 'index.html'), '<!doctype html><title>Flankfilm</title>');
const openedDir = mkdtempSync(join(tmpdir(), 'flankfilm-argv-'));
const opened = join(openedDir, 'a.flankfilm.json');
afterAll(() => {
  rmSync(fake.root, { recursive: true, force: true });
  rmSync(openedDir, { recursive: true, force: true });
});
const argv = process.argv;
process.argv = [argv[0] as string, '.', '--open', opened];
await import('../../main/main');
process.argv = argv;
await new Promise((ok) => setTimeout(ok, 50)); // start() runs after whenReady

const win = fake.windows[0] as unknown as {
  options: { webPreferences: Record<string, unknown> };
  webContents: { send: ReturnType<typeof vi.fn>; emit(name: string, ...a: unknown[]): boolean; openHandler: (d: unknown) => unknown };
  loadURL: ReturnType<typeof vi.fn>;
  setTitle: ReturnType<typeof vi.fn>;
  close(): void;
  destroyed: boolean;
};
const appEvent = { senderFrame: { url: 'app://flankfilm/index.html', parent: null } };
const settle = () => new Promise((ok) => setTimeout(ok, 20));

describe('the main process', () => {
  it('registers app:// as privileged before ready and turns the sandbox on for every renderer', () => {
    expect(fake.privileged).toEqual([{ scheme: 'app', privileges: expect.objectContaining({ standard: true, secure: true }) as unknown }]);
    expect(fake.sandboxEnabled).toBe(true);
  });

  it('registers every contract call, through the checked wrapper', async () => {
    expect([...fake.handlers.keys()].sort()).toEqual([...CALL_NAMES.map((n) => `flankfilm:${n}`), 'flankfilm:drop'].sort());
    const appInfo = fake.handlers.get('flankfilm:appInfo');
    await expect(appInfo?.(appEvent, {})).resolves.toMatchObject({ version: '0.1.0' });
    await expect(appInfo?.({ senderFrame: { url: 'https://example.com/', parent: null } }, {})).rejects.toThrow(/call refused/);
  });

  it('opens one hardened window on app://flankfilm/ and sets a menu', () => {
    expect(fake.windows).toHaveLength(1);
    expect(win.options.webPreferences).toMatchObject({ contextIsolation: true, sandbox: true, nodeIntegration: false, webSecurity: true });
    expect(String(win.options.webPreferences.preload)).toMatch(/preload\.cjs$/);
    expect(win.loadURL).toHaveBeenCalledWith('app://flankfilm/index.html');
    expect(win.webContents.openHandler({ url: 'https://example.com' })).toEqual({ action: 'deny' });
    expect(Array.isArray(fake.menu)).toBe(true);
  });

  it('serves the built page over app:// with the CSP, and nothing from other hosts', async () => {
    const page = await fake.protocolHandler?.({ url: 'app://flankfilm/index.html', method: 'GET' });
    expect(page?.status).toBe(200);
    expect(page?.headers.get('content-security-policy')).toBe(CSP);
    expect((await fake.protocolHandler?.({ url: 'app://elsewhere/index.html', method: 'GET' }))?.status).toBe(404);
    expect((await fake.protocolHandler?.({ url: 'app://flankfilm/../../etc/passwd', method: 'GET' }))?.status).toBe(404);
  });

  it("hands the --open file to the page once it has loaded, and a second instance's file too", async () => {
    // The page gets a handle for each path, never the path; openReview with that handle opens it.
    const handleLike = expect.stringMatching(/^doc-[0-9a-f-]{36}$/) as unknown as string;
    win.webContents.emit('did-finish-load');
    expect(win.webContents.send).toHaveBeenLastCalledWith('flankfilm:menu', { command: 'open', handle: handleLike });
    const first = (win.webContents.send.mock.calls.at(-1)?.[1] as { handle: string }).handle;
    const { app } = await import('electron');
    app.emit('second-instance', {}, ['Flankfilm', 'b.flankfilm.json'], '/home/u');
    expect(win.webContents.send).toHaveBeenLastCalledWith('flankfilm:menu', { command: 'open', handle: handleLike });
    const second = (win.webContents.send.mock.calls.at(-1)?.[1] as { handle: string }).handle;
    expect(second).not.toBe(first);
    expect(JSON.stringify(win.webContents.send.mock.calls)).not.toContain(opened);
    const drop = fake.handlers.get('flankfilm:drop');
    await expect(drop?.(appEvent, '/home/u/b.flankfilm.json')).resolves.toBe(second); // one handle per path
    await expect(drop?.({ senderFrame: { url: 'https://example.com/', parent: null } }, '/etc/passwd')).rejects.toThrow(/call refused/);
    await expect(drop?.(appEvent, 42)).resolves.toBeNull();
  });

  it("shows the document's title and dirty mark, and asks before closing unsaved edits", async () => {
    await fake.handlers.get('flankfilm:setDocumentState')?.(appEvent, { title: 'HS pair', dirty: true });
    expect(win.setTitle).toHaveBeenLastCalledWith('• HS pair — Flankfilm');
    fake.messageBoxResponse = 2; // Cancel
    win.close();
    await settle();
    expect(fake.messageBoxes).toHaveLength(1);
    expect(win.destroyed).toBe(false);
    fake.messageBoxResponse = 1; // Don't save
    win.close();
    await settle();
    expect(fake.messageBoxes).toHaveLength(2);
    expect(win.destroyed).toBe(true);
  });
});

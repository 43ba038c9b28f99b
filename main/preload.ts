/**
 * The sandboxed preload: `window.flankfilm` with one function per contract call, onMenu, and
 * handleForFile for drag and drop (the dropped file's path goes to main, a handle comes back). Never ipcRenderer itself, never an IPC event object (its
 * `sender` is ipcRenderer). Bundled into one file by scripts/build.mjs: a sandboxed preload
 * cannot require anything but 'electron'.
 */
import { contextBridge, ipcRenderer, webUtils } from 'electron';
import { CALL_NAMES, menuEvent, progressEvent, type Bridge, type MenuCommand, type ProgressEvent } from '../app/bridge/contract';
import { channelOf, DROP_CHANNEL, MENU_CHANNEL, PROGRESS_CHANNEL } from './channels';


type MenuListener = (e: { command: MenuCommand; handle?: string }) => void;

/** "Error invoking remote method 'flankfilm:x': UserError: the file …" → "the file …". */
export function cleanIpcError(e: unknown): Error {
  const message = (e as Error | null)?.message ?? String(e);
  return new Error(message.replace(/^Error invoking remote method '[^']*': /, '').replace(/^(?:[A-Za-z]*Error): /, ''));
}

export function buildBridge(ipc: Pick<typeof ipcRenderer, 'invoke' | 'on'>, pathForFile: (file: unknown) => string): Bridge {
  const listeners = new Set<MenuListener>();
  // Menu events that arrive before the renderer subscribes (the file named by --open at start)
  // wait here and go to the first listener.
  const early: Array<Parameters<MenuListener>[0]> = [];
  ipc.on(MENU_CHANNEL, (_event, payload: unknown) => {
    const parsed = menuEvent.safeParse(payload);
    if (!parsed.success) return;
    const e = { command: parsed.data.command, ...(parsed.data.handle !== undefined ? { handle: parsed.data.handle } : {}) };
    if (listeners.size === 0) early.push(e);
    else listeners.forEach((l) => l(e));
  });
  const progress = new Set<(e: ProgressEvent) => void>();
  ipc.on(PROGRESS_CHANNEL, (_event, payload: unknown) => {
    const parsed = progressEvent.safeParse(payload);
    if (parsed.success) progress.forEach((l) => l({ done: parsed.data.done, total: parsed.data.total }));
  });
  const calls = Object.fromEntries(
    CALL_NAMES.map((name) => [name, (args: unknown) => ipc.invoke(channelOf(name), args ?? {}).catch((e: unknown) => Promise.reject(cleanIpcError(e)))]),
  );
  return {
    ...(calls as unknown as Omit<Bridge, 'onMenu' | 'onProgress' | 'handleForFile'>),
    onProgress(listener: (e: ProgressEvent) => void) {
      progress.add(listener);
      return () => {
        progress.delete(listener);
      };
    },
    onMenu(listener: MenuListener) {
      listeners.add(listener);
      early.splice(0).forEach((e) => listener(e));
      return () => {
        listeners.delete(listener);
      };
    },
    async handleForFile(file: unknown) {
      const path = pathForFile(file);
      if (!path) return null;
      const handle: unknown = await ipc.invoke(DROP_CHANNEL, path);
      return typeof handle === 'string' ? handle : null;
    },
  };
}

contextBridge.exposeInMainWorld(
  'flankfilm',
  buildBridge(ipcRenderer, (file) => {
    try {
      return webUtils.getPathForFile(file as Parameters<typeof webUtils.getPathForFile>[0]);
    } catch {
      return '';
    }
  }),
);

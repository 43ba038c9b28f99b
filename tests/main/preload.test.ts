import { describe, expect, it, vi } from 'vitest';
import { CALL_NAMES } from '../../app/bridge/contract';

const exposed: Record<string, unknown> = {};
const menuListeners: Array<(event: unknown, payload: unknown) => void> = [];
const progressListeners: Array<(event: unknown, payload: unknown) => void> = [];
const ipcRenderer = {
  invoke: vi.fn(async (channel: string, args: unknown) => {
    if (channel === 'flankfilm:drop') return args === '/home/u/review.flankfilm.json' ? 'doc-00000000-0000-4000-8000-00000000d0d0' : null;
    if (channel === 'flankfilm:openReview') throw new Error("Error invoking remote method 'flankfilm:openReview': UserError: cannot open x.json: the file does not exist");
    return { channel, args };
  }),
  on: vi.fn((channel: string, fn: (event: unknown, payload: unknown) => void) => {
    if (channel === 'flankfilm:menu') menuListeners.push(fn);
    if (channel === 'flankfilm:progress') progressListeners.push(fn);
  }),
  send: vi.fn(),
};
vi.mock('electron', () => ({
  contextBridge: { exposeInMainWorld: vi.fn((key: string, api: unknown) => (exposed[key] = api)) },
  ipcRenderer,
  webUtils: { getPathForFile: vi.fn(() => '/home/u/review.flankfilm.json') },
}));

await import('../../main/preload');
const { contextBridge } = await import('electron');
const bridge = exposed.flankfilm as Record<string, (...a: unknown[]) => unknown>;

describe('the preload bridge', () => {
  it('exposes window.flankfilm once, with the contract calls, onMenu, onProgress and handleForFile only', () => {
    expect(contextBridge.exposeInMainWorld).toHaveBeenCalledTimes(1);
    expect(Object.keys(exposed)).toEqual(['flankfilm']);
    expect(Object.keys(bridge).sort()).toEqual([...CALL_NAMES, 'onMenu', 'onProgress', 'handleForFile'].sort());
    for (const value of Object.values(bridge)) expect(typeof value).toBe('function');
  });

  it('never hands out ipcRenderer or its methods', () => {
    for (const value of Object.values(bridge)) {
      expect(value).not.toBe(ipcRenderer);
      expect(value).not.toBe(ipcRenderer.invoke);
      expect(value).not.toBe(ipcRenderer.send);
      expect(value).not.toBe(ipcRenderer.on);
    }
  });

  it('each call invokes its own channel with the arguments', async () => {
    await expect(bridge.appInfo?.({})).resolves.toEqual({ channel: 'flankfilm:appInfo', args: {} });
    await expect(bridge.saveReview?.({ handle: null, text: '{}', saveAs: true })).resolves.toEqual({ channel: 'flankfilm:saveReview', args: { handle: null, text: '{}', saveAs: true } });
  });

  it("passes main's refusal on as a plain message", async () => {
    await expect(bridge.openReview?.({})).rejects.toThrow(/^cannot open x\.json: the file does not exist$/);
  });

  it('onMenu gives the listener the command only (never the IPC event), early ones included', () => {
    const event = { sender: ipcRenderer };
    menuListeners[0]?.(event, { command: 'open', handle: 'doc-00000000-0000-4000-8000-000000000001' });
    const got: unknown[] = [];
    const off = bridge.onMenu?.((e: unknown) => got.push(e)) as () => void;
    menuListeners[0]?.(event, { command: 'save', extra: 'dropped' });
    menuListeners[0]?.(event, { command: 'format-disk' });
    menuListeners[0]?.(event, null);
    expect(got).toEqual([{ command: 'open', handle: 'doc-00000000-0000-4000-8000-000000000001' }, { command: 'save' }]);
    off();
    menuListeners[0]?.(event, { command: 'new' });
    expect(got).toHaveLength(2);
  });

  it('a path in a menu event never reaches the page', () => {
    const got: unknown[] = [];
    const off = bridge.onMenu?.((e: unknown) => got.push(e)) as () => void;
    menuListeners[0]?.({}, { command: 'open', path: '/etc/passwd' });
    expect(got.at(-1)).toEqual({ command: 'open' });
    expect(JSON.stringify(got)).not.toContain('passwd');
    off();
  });

  it('handleForFile: the path from webUtils goes to main, only the handle comes back', async () => {
    await expect(bridge.handleForFile?.({})).resolves.toBe('doc-00000000-0000-4000-8000-00000000d0d0');
    expect(ipcRenderer.invoke).toHaveBeenCalledWith('flankfilm:drop', '/home/u/review.flankfilm.json');
  });

  it('onProgress passes record-export progress on, checked (never the IPC event)', () => {
    const got: unknown[] = [];
    const off = (bridge.onProgress as unknown as (l: (e: unknown) => void) => () => void)((e) => got.push(e));
    progressListeners[0]?.({ sender: ipcRenderer }, { done: 2, total: 7 });
    progressListeners[0]?.({ sender: ipcRenderer }, { done: 'x', total: 7 });
    off();
    progressListeners[0]?.({}, { done: 3, total: 7 });
    expect(got).toEqual([{ done: 2, total: 7 }]);
  });
});

import { beforeEach, describe, expect, it, vi } from 'vitest';
import { CALL_NAMES } from '../../app/bridge/contract';

const handlers = new Map<string, (event: unknown, args: unknown) => Promise<unknown>>();
vi.mock('electron', () => ({
  ipcMain: { handle: vi.fn((channel: string, fn: (event: unknown, args: unknown) => Promise<unknown>) => handlers.set(channel, fn)) },
}));

const { channelOf, checkSender, handle, SenderRejected } = await import('../../main/ipc');
const { ArgsRejected } = await import('../../main/services/dispatch');

const top = (url: string) => ({ senderFrame: { url, parent: null } });
const GOOD = top('app://flankfilm/index.html');

const setDocumentState = vi.fn(async () => ({ ok: true as const }));
beforeEach(() => {
  handlers.clear();
  setDocumentState.mockClear();
  handle('setDocumentState', setDocumentState);
});
const invoke = (event: unknown, args: unknown) => (handlers.get(channelOf('setDocumentState')) as (e: unknown, a: unknown) => Promise<unknown>)(event, args);

describe('handle(name, impl): the one IPC wrapper', () => {
  it('registers on the flankfilm:<call> channel and serves the app page', async () => {
    expect([...handlers.keys()]).toEqual(['flankfilm:setDocumentState']);
    await expect(invoke(GOOD, { title: 'HS pair', dirty: true })).resolves.toEqual({ ok: true });
    expect(setDocumentState).toHaveBeenCalledWith({ title: 'HS pair', dirty: true });
  });

  it.each([
    ['a remote page', 'https://flankfilm.example/index.html'],
    ['a local file', 'file:///tmp/index.html'],
    ['another app:// host', 'app://evil/index.html'],
    ['a look-alike host', 'app://flankfilm.evil/index.html'],
    ['the dev-server origin', 'http://localhost:5173/'],
    ['an unparsable URL', 'not a url'],
    ['about:blank', 'about:blank'],
  ])('rejects %s', async (_what, url) => {
    await expect(invoke(top(url), { title: 'x', dirty: false })).rejects.toBeInstanceOf(SenderRejected);
    await expect(invoke(top(url), { title: 'x', dirty: false })).rejects.toThrow(/is not app:\/\/flankfilm/);
    expect(setDocumentState).not.toHaveBeenCalled();
  });

  it('rejects a subframe, even of the app origin', async () => {
    const sub = { senderFrame: { url: 'app://flankfilm/index.html', parent: GOOD.senderFrame } };
    await expect(invoke(sub, { title: 'x', dirty: false })).rejects.toThrow(/subframe, not the main frame/);
    expect(setDocumentState).not.toHaveBeenCalled();
  });

  it('rejects a frame that is gone', async () => {
    await expect(invoke({ senderFrame: null }, { title: 'x', dirty: false })).rejects.toThrow(/frame is gone/);
  });

  it.each([
    ['a missing field', { title: 'x' }],
    ['a wrong type', { title: 'x', dirty: 'yes' }],
    ['an over-long title', { title: 'x'.repeat(301), dirty: true }],
    ['no object at all', 'setDocumentState'],
  ])('rejects a bad payload: %s', async (_what, args) => {
    await expect(invoke(GOOD, args)).rejects.toBeInstanceOf(ArgsRejected);
    expect(setDocumentState).not.toHaveBeenCalled();
  });

  it('refuses to pass on a result the contract does not allow', async () => {
    const logged = vi.spyOn(console, 'error').mockImplementation(() => undefined);
    handle('recentFiles', async () => [42] as unknown as Array<{ handle: string; name: string }>);
    const recent = handlers.get(channelOf('recentFiles')) as (e: unknown, a: unknown) => Promise<unknown>;
    await expect(recent(GOOD, {})).rejects.toThrow(/recentFiles: main produced a result the contract refuses/);
    expect(logged).toHaveBeenCalledOnce(); // a bug, so main logs it
    logged.mockRestore();
  });

  it('checkSender is usable without Electron', () => {
    expect(() => checkSender(GOOD)).not.toThrow();
    expect(() => checkSender(top('app://flankfilm/'), 'app://other')).toThrow(SenderRejected);
  });

  it('every contract call has a channel of its own', () => {
    expect(new Set(CALL_NAMES.map(channelOf)).size).toBe(CALL_NAMES.length);
  });
});

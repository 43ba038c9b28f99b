import { describe, expect, it, vi } from 'vitest';

vi.mock('electron', () => ({}));
const { hardenSession, hardenWebContents, isAllowedRequest, windowOptions } = await import('../../main/window');

describe('the window options (Electron security checklist)', () => {
  const options = windowOptions('/app/dist/main/preload.cjs', '/app/assets/icon.png');
  const web = options.webPreferences ?? {};

  it('isolates and sandboxes the page, with no Node in it', () => {
    expect(web.contextIsolation).toBe(true); // checklist §3
    expect(web.sandbox).toBe(true); // checklist §4
    expect(web.nodeIntegration).toBe(false); // checklist §2
    expect(web.nodeIntegrationInWorker).toBe(false);
    expect(web.nodeIntegrationInSubFrames).toBe(false);
  });

  it('keeps web security and refuses insecure and experimental content', () => {
    expect(web.webSecurity).toBe(true); // checklist §6
    expect(web.allowRunningInsecureContent).toBe(false); // checklist §8
    expect(web.experimentalFeatures).toBe(false); // checklist §9
    expect(web.webviewTag).toBe(false); // checklist §12
    expect(web.navigateOnDragDrop).toBe(false);
  });

  it('loads the bundled preload and nothing else', () => {
    expect(web.preload).toBe('/app/dist/main/preload.cjs');
    expect(Object.keys(web)).not.toContain('additionalArguments');
    expect(options.show).toBe(false); // shown on ready-to-show, no white flash
  });
});

describe('web contents and session hardening', () => {
  it('refuses navigation, redirects, webviews and new windows', () => {
    const listeners = new Map<string, (e: { preventDefault(): void; url?: string }) => void>();
    let openHandler: ((d: { url: string }) => { action: string }) | null = null;
    const contents = {
      on: (name: string, fn: (e: { preventDefault(): void }) => void) => listeners.set(name, fn),
      setWindowOpenHandler: (fn: (d: { url: string }) => { action: string }) => (openHandler = fn),
    };
    hardenWebContents(contents as never);
    for (const name of ['will-navigate', 'will-redirect', 'will-attach-webview']) {
      const event = { preventDefault: vi.fn(), url: 'https://example.com/' };
      listeners.get(name)?.(event);
      expect(event.preventDefault, name).toHaveBeenCalled();
    }
    expect(openHandler).not.toBeNull();
    expect(openHandler!({ url: 'https://example.com/' })).toEqual({ action: 'deny' });
  });

  it('denies every permission request and check, and cancels remote requests', () => {
    const s = {
      setPermissionRequestHandler: vi.fn(),
      setPermissionCheckHandler: vi.fn(),
      setDevicePermissionHandler: vi.fn(),
      webRequest: { onBeforeRequest: vi.fn() },
    };
    hardenSession(s as never);
    const request = s.setPermissionRequestHandler.mock.calls[0]?.[0] as (c: unknown, p: string, cb: (ok: boolean) => void) => void;
    for (const permission of ['media', 'geolocation', 'notifications', 'openExternal', 'clipboard-read']) {
      const cb = vi.fn();
      request({}, permission, cb);
      expect(cb).toHaveBeenCalledWith(false);
    }
    const check = s.setPermissionCheckHandler.mock.calls[0]?.[0] as (...a: unknown[]) => boolean;
    expect(check({}, 'media', 'app://flankfilm')).toBe(false);
    const before = s.webRequest.onBeforeRequest.mock.calls[0]?.[0] as (d: { url: string }, cb: (r: { cancel: boolean }) => void) => void;
    const cb = vi.fn();
    before({ url: 'https://cdn.example.com/x.js' }, cb);
    expect(cb).toHaveBeenCalledWith({ cancel: true });
  });

  it.each([
    ['app://flankfilm/assets/index.js', true],
    ['devtools://devtools/bundled/inspector.html', true],
    ['data:image/png;base64,AAAA', true],
    ['https://example.com/', false],
    ['http://127.0.0.1:5173/', false],
    ['ws://127.0.0.1:1234/', false],
    ['file:///etc/passwd', false],
    ['not a url', false],
  ])('request %s allowed: %s', (url, allowed) => {
    expect(isAllowedRequest(url)).toBe(allowed);
  });
});

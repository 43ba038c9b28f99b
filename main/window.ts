import type { BrowserWindowConstructorOptions, Session, WebContents } from 'electron';

/**
 * The options of the one Flankfilm window: the Electron security checklist, spelled out even
 * where it is Electron's default, so a test can read them and a future default change cannot
 * loosen them.
 */
export function windowOptions(preloadPath: string, iconPath?: string): BrowserWindowConstructorOptions {
  return {
    width: 1320,
    height: 880,
    minWidth: 960,
    minHeight: 640,
    show: false,
    title: 'Flankfilm',
    backgroundColor: '#ffffff',
    ...(iconPath ? { icon: iconPath } : {}),
    webPreferences: {
      preload: preloadPath,
      contextIsolation: true,
      sandbox: true,
      nodeIntegration: false,
      nodeIntegrationInWorker: false,
      nodeIntegrationInSubFrames: false,
      webSecurity: true,
      allowRunningInsecureContent: false,
      experimentalFeatures: false,
      webviewTag: false,
      navigateOnDragDrop: false,
      safeDialogs: true,
      spellcheck: false,
      enableWebSQL: false,
    },
  };
}

/**
 * The page never navigates (one page, in-app state), so every navigation and redirect is refused,
 * a dropped file included; so are new windows and <webview> (checklist §13–15).
 */
export function hardenWebContents(contents: WebContents): void {
  contents.on('will-navigate', (event) => event.preventDefault());
  contents.on('will-redirect', (event) => event.preventDefault());
  contents.on('will-attach-webview', (event) => event.preventDefault());
  contents.setWindowOpenHandler(() => ({ action: 'deny' }));
}

/** Schemes a page may load from; anything else (http, https, ws, file …) is cancelled. */
const ALLOWED_SCHEMES = new Set(['app:', 'devtools:', 'data:', 'blob:']);

export function isAllowedRequest(url: string): boolean {
  try {
    return ALLOWED_SCHEMES.has(new URL(url).protocol);
  } catch {
    return false;
  }
}

/** No permission (camera, notifications, geolocation …) is ever granted; nothing remote loads. */
export function hardenSession(session: Session): void {
  session.setPermissionRequestHandler((_contents, _permission, callback) => callback(false));
  session.setPermissionCheckHandler(() => false);
  session.setDevicePermissionHandler(() => false);
  session.webRequest.onBeforeRequest((details, callback) => callback({ cancel: !isAllowedRequest(details.url) }));
}

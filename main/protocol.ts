import { protocol } from 'electron';
import { APP_HOST, APP_SCHEME } from './origin';
import { serveStatic } from './staticFiles';

/** Before app 'ready': app:// is a standard, secure origin (checklist §18: prefer a custom protocol over file://). */
export function registerAppScheme(): void {
  protocol.registerSchemesAsPrivileged([{ scheme: APP_SCHEME, privileges: { standard: true, secure: true, supportFetchAPI: true, codeCache: true } }]);
}

/** After 'ready': serve dist/renderer at app://flankfilm/ with the CSP header; nothing else. */
export function serveAppScheme(rendererDir: string): void {
  protocol.handle(APP_SCHEME, async (request) => {
    const url = new URL(request.url);
    if (url.host !== APP_HOST || request.method !== 'GET') return new Response('not found', { status: 404 });
    const r = await serveStatic(rendererDir, url.pathname);
    return new Response(new Uint8Array(r.body), { status: r.status, headers: r.headers });
  });
}

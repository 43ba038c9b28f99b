/** Where the app's pages live: the privileged app:// scheme (protocol.ts), never file:// or http. */
export const APP_SCHEME = 'app';
export const APP_HOST = 'flankfilm';
export const APP_ORIGIN = `${APP_SCHEME}://${APP_HOST}`;
export const APP_URL = `${APP_ORIGIN}/index.html`;

/**
 * The origin of a URL as scheme://host[:port], parsed with `new URL`. (URL.origin is "null" for
 * schemes the URL standard does not know, app: among them, so it is built from the parts.)
 * Null when the URL does not parse.
 */
export function originOf(url: string): string | null {
  try {
    const u = new URL(url);
    return `${u.protocol}//${u.host}`;
  } catch {
    return null;
  }
}

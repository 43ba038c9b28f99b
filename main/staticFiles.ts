import { readFile, stat } from 'node:fs/promises';
import { extname, join, normalize, resolve, sep } from 'node:path';
import { SECURITY_HEADERS } from './csp';

const MIME: Readonly<Record<string, string>> = {
  '.html': 'text/html; charset=utf-8',
  '.js': 'text/javascript; charset=utf-8',
  '.mjs': 'text/javascript; charset=utf-8',
  '.css': 'text/css; charset=utf-8',
  '.json': 'application/json; charset=utf-8',
  '.svg': 'image/svg+xml',
  '.png': 'image/png',
  '.ico': 'image/x-icon',
  '.woff2': 'font/woff2',
  '.woff': 'font/woff',
  '.ttf': 'font/ttf',
  '.map': 'application/json; charset=utf-8',
  '.txt': 'text/plain; charset=utf-8',
};

export interface StaticResponse {
  readonly status: number;
  readonly headers: Record<string, string>;
  readonly body: Buffer;
}

/**
 * The file under `root` that a URL path names ('/' is index.html), or null when the path is
 * malformed or leaves `root` (`..`, encoded slashes, NUL).
 */
export function resolveStaticPath(root: string, pathname: string): string | null {
  let decoded: string;
  try {
    decoded = decodeURIComponent(pathname);
  } catch {
    return null;
  }
  if (decoded.includes('\0') || decoded.includes('\\') || !decoded.startsWith('/')) return null;
  const rel = decoded === '/' ? 'index.html' : decoded.slice(1);
  const base = resolve(root);
  const file = normalize(join(base, rel));
  return file.startsWith(base + sep) ? file : null;
}

/** Serve one built renderer file with the security headers; 404 for anything else. */
export async function serveStatic(root: string, pathname: string): Promise<StaticResponse> {
  const notFound = (): StaticResponse => ({ status: 404, headers: { ...SECURITY_HEADERS, 'Content-Type': 'text/plain; charset=utf-8' }, body: Buffer.from('not found\n') });
  const file = resolveStaticPath(root, pathname);
  if (!file) return notFound();
  const info = await stat(file).catch(() => null);
  if (!info?.isFile()) return notFound();
  const body = await readFile(file);
  const type = MIME[extname(file).toLowerCase()] ?? 'application/octet-stream';
  return { status: 200, headers: { ...SECURITY_HEADERS, 'Content-Type': type, 'Cache-Control': 'no-cache' }, body };
}

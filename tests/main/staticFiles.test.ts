import { mkdir, mkdtemp, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { CSP } from '../../main/csp';
import { resolveStaticPath, serveStatic } from '../../main/staticFiles';

let root: string;
beforeAll(async () => {
  root = await mkdtemp(join(tmpdir(), 'flankfilm-static-'));
  await mkdir(join(root, 'assets'));
  await writeFile(join(root, 'index.html'), '<!doctype html><title>Flankfilm</title>');
  await writeFile(join(root, 'assets', 'index.js'), 'export {};');
});
afterAll(async () => {
  await rm(root, { recursive: true, force: true });
});

describe('serving the built renderer', () => {
  it('serves index.html at / and assets by type, with the CSP', async () => {
    const index = await serveStatic(root, '/');
    expect(index.status).toBe(200);
    expect(index.headers['Content-Type']).toMatch(/^text\/html/);
    expect(index.headers['Content-Security-Policy']).toBe(CSP);
    const js = await serveStatic(root, '/assets/index.js');
    expect(js.headers['Content-Type']).toMatch(/^text\/javascript/);
  });

  it.each(['/../package.json', '/assets/../../x', '/%2e%2e/x', '/assets%2f..%2f..%2fx', '/a\\..\\b', '/%00', '/%E0%A4%A'])('refuses %s', async (p) => {
    expect(resolveStaticPath('/srv/r', p)).toBeNull();
    expect((await serveStatic(root, p)).status).toBe(404);
  });

  it('never resolves outside the root', () => {
    expect(resolveStaticPath('/srv/r', '/../etc/passwd')).toBeNull();
    expect(resolveStaticPath('/srv/r', '/%2e%2e/etc/passwd')).toBeNull();
    expect(resolveStaticPath('/srv/r', '/a/b.js')).toBe('/srv/r/a/b.js');
  });
});

import { mkdir, mkdtemp, readFile, rm, writeFile } from 'node:fs/promises';
import { request } from 'node:http';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { CSP } from '../../main/csp';
import type { ReportPort } from '../../main/services/types';
import { startHarness, type Harness } from '../harness/server';
import { DEMO_TEXT, NEWER_TEXT } from './fixtures/texts';

let harness: Harness;
let staticDir: string;
const fakeReport: ReportPort = { renderRecord: async () => new Uint8Array(Buffer.from('%PDF-1.7\n')), casesCsv: () => 'a,b\n' };

beforeAll(async () => {
  staticDir = await mkdtemp(join(tmpdir(), 'flankfilm-static-'));
  await writeFile(join(staticDir, 'index.html'), '<!doctype html><title>Flankfilm</title>');
  harness = await startHarness({ staticDir, clock: () => new Date('2026-12-01T09:30:00Z'), report: fakeReport });
});
afterAll(async () => {
  await harness.close();
  await rm(staticDir, { recursive: true, force: true });
});

async function post(name: string, body: unknown, headers: Record<string, string> = {}) {
  const res = await fetch(`${harness.origin}api/${name}`, { method: 'POST', headers: { 'Content-Type': 'application/json', 'x-flankfilm-token': harness.token, ...headers }, body: typeof body === 'string' ? body : JSON.stringify(body) });
  return { status: res.status, body: (await res.json()) as Record<string, unknown> };
}

describe('the HTTP harness', () => {
  it('listens on loopback and serves the renderer with the CSP', async () => {
    expect(harness.origin).toMatch(/^http:\/\/127\.0\.0\.1:\d+\/$/);
    expect(harness.url).toBe(`${harness.origin}?token=${harness.token}`);
    expect(harness.token).toMatch(/^[0-9a-f]{64}$/);
    const res = await fetch(harness.url);
    expect(res.status).toBe(200);
    expect(res.headers.get('content-security-policy')).toBe(CSP);
    expect(await res.text()).toContain('<title>Flankfilm</title>');
  });

  it('serves the contract: appInfo, openDemo, saveReview into workDir, autosave', async () => {
    expect(await post('appInfo', {})).toMatchObject({ status: 200, body: { version: 'harness' } });
    const demo = await post('openDemo', {});
    expect(demo.status).toBe(200);
    expect(demo.body).toMatchObject({ canceled: false, handle: null });
    const saved = await post('saveReview', { handle: null, text: demo.body.text, saveAs: false });
    expect(saved.status).toBe(200);
    expect(saved.body.name).toBe('harrow-creek-aggregate-plant-primary-crusher-drive-reducer.flankfilm.json');
    expect(JSON.stringify(saved.body)).not.toContain(harness.workDir); // the page gets a handle and a name, never a path
    expect(await readFile(join(harness.workDir, saved.body.name as string), 'utf8')).toBe(demo.body.text);
    expect(await post('autosave', { text: DEMO_TEXT, handle: saved.body.handle })).toEqual({ status: 200, body: { ok: true } });
    expect((await post('recoverAutosave', {})).body).toEqual({ text: DEMO_TEXT, handle: saved.body.handle, name: saved.body.name, savedAt: '2026-12-01T09:30:00.000Z' });
    const record = await post('exportRecord', { text: DEMO_TEXT, paper: 'a4' });
    expect(record.body).toEqual({ canceled: false, name: 'record.pdf', bytes: 9 });
  });

  it('answers 400 with the issues when the zod schema refuses the arguments', async () => {
    const r = await post('saveReview', { handle: null, text: 42, saveAs: 'no' });
    expect(r.status).toBe(400);
    expect(r.body.error).toMatch(/^saveReview: arguments refused by the contract/);
    expect(r.body.issues).toEqual(expect.arrayContaining([expect.objectContaining({ path: 'text' }), expect.objectContaining({ path: 'saveAs' })]));
    expect((await post('appInfo', '{not json')).status).toBe(400);
  });

  it('answers 422 with the message for a refusal meant for the user', async () => {
    const dir = join(harness.workDir, 'in');
    await mkdir(dir, { recursive: true });
    const file = join(harness.workDir, 'open.flankfilm.json'); // what the harness's open dialog chooses
    await writeFile(file, NEWER_TEXT);
    const r = await post('openReview', {});
    expect(r.status).toBe(422);
    expect(r.body.error).toMatch(/made by a newer Flankfilm/);
    expect(await readFile(file, 'utf8')).toBe(NEWER_TEXT);
  });

  it('answers 404 for an unknown call, 405 for GET on a call, 403 for another origin', async () => {
    expect((await post('deleteEverything', {})).status).toBe(404);
    expect((await post('toString', {})).status).toBe(404);
    expect((await fetch(`${harness.origin}api/appInfo`, { headers: { 'x-flankfilm-token': harness.token } })).status).toBe(405);
    expect((await post('appInfo', {}, { Origin: 'http://evil.example' })).status).toBe(403);
  });

  it('refuses a request whose Host is not its own (DNS rebinding)', async () => {
    const { port } = new URL(harness.origin);
    const status = await new Promise<number>((ok, fail) => {
      const req = request({ host: '127.0.0.1', port, path: '/', headers: { Host: 'evil.example' } }, (res) => {
        res.resume();
        ok(res.statusCode ?? 0);
      });
      req.on('error', fail);
      req.end();
    });
    expect(status).toBe(403);
  });

  it('removes the work folder it made itself on close', async () => {
    const h = await startHarness({ staticDir, report: fakeReport });
    await writeFile(join(h.workDir, 'x.txt'), 'x');
    await h.close();
    await expect(readFile(join(h.workDir, 'x.txt'))).rejects.toThrow(/ENOENT/);
  });

  it('records setDocumentState and pushes menu commands as server-sent events', async () => {
    await post('setDocumentState', { title: 'HS pair', dirty: true });
    expect(harness.documentState()).toEqual({ title: 'HS pair', dirty: true });
    const controller = new AbortController();
    const res = await fetch(`${harness.origin}api/events?token=${harness.token}`, { signal: controller.signal });
    const reader = (res.body as ReadableStream<Uint8Array>).getReader();
    await reader.read(); // the opening comment
    harness.sendMenu({ command: 'open', path: '/x/a.flankfilm.json' });
    const chunk = new TextDecoder().decode((await reader.read()).value);
    expect(chunk).toMatch(/^data: \{"command":"open","handle":"doc-[0-9a-f-]{36}"\}\n\n$/); // a handle, not the path
    controller.abort();
  });

  it('refuses every /api/ request without this run\'s token (401), and with another token', async () => {
    const plain = await fetch(`${harness.origin}api/appInfo`, { method: 'POST', headers: { 'Content-Type': 'application/json' }, body: '{}' });
    expect(plain.status).toBe(401);
    expect((await post('appInfo', {}, { 'x-flankfilm-token': 'f'.repeat(64) })).status).toBe(401);
    expect((await fetch(`${harness.origin}api/events`)).status).toBe(401);
    const other = await startHarness({ staticDir, report: fakeReport });
    expect(other.token).not.toBe(harness.token); // per run
    await other.close();
  });

  it('cannot be made to read or write a file outside what its dialogs choose (the renderer sends no paths)', async () => {
    const outside = join(await mkdtemp(join(tmpdir(), 'flankfilm-outside-')), 'unrelated.json');
    await writeFile(outside, '{"format":"not-ours","secret":1}');
    expect((await post('openReview', { path: outside })).status).toBe(400);
    expect((await post('saveReview', { path: outside, text: DEMO_TEXT, saveAs: false })).status).toBe(400);
    expect(await readFile(outside, 'utf8')).toBe('{"format":"not-ours","secret":1}');
    await expect(readFile(`${outside}.bak`)).rejects.toThrow(/ENOENT/);
  });
});

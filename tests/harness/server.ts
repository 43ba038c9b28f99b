/**
 * The contract over HTTP, for driving the built renderer in a plain browser (tests/e2e) without
 * Electron. Same services as main (main/services), same CSP; dialogs answer with paths inside
 * workDir. Loopback only, random port.
 *
 *   POST /api/<callName>  body: JSON args → 200 JSON result
 *                                         | 400 {error, issues}  arguments refused by the zod schema, or not JSON
 *                                         | 404 {error}          no such call
 *                                         | 422 {error}          a refusal meant for the user (newer file, read-only …)
 *                                         | 500 {error}          a bug
 *   GET  /api/events      server-sent events: one `data: {"command": …, "path"?: …}` per menu command
 *   GET  /…               the built renderer (staticDir), with the app's security headers
 *
 * Every /api/ request must carry this run's token (a random 32-byte hex string made at start):
 * the header `x-flankfilm-token`, or `?token=` for the event stream (EventSource sends no
 * headers). Without it: 401. The page learns the token from its own URL (`url` has it).
 */
import { existsSync } from 'node:fs';
import { randomBytes, timingSafeEqual } from 'node:crypto';
import { mkdtemp, rm } from 'node:fs/promises';
import { createServer, type IncomingMessage, type ServerResponse } from 'node:http';
import type { AddressInfo } from 'node:net';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { SECURITY_HEADERS } from '../../main/csp';
import type { MenuEvent } from '../../main/menu';
import { createServices } from '../../main/services';
import { ArgsRejected, invokeService, isCallName } from '../../main/services/dispatch';
import { UserError } from '../../main/services/errors';
import type { Dialogs, DocumentState, ReportPort, SaveKind } from '../../main/services/types';
import { serveStatic } from '../../main/staticFiles';

export interface HarnessOptions {
  /** The built renderer (vite build output). Default dist/renderer. */
  readonly staticDir?: string;
  /** Where dialogs point and userData lives. Default: a fresh temp folder, removed by close(). */
  readonly workDir?: string;
  /** Replace some dialog answers (e.g. openPath → null to simulate Cancel). */
  readonly dialogs?: Partial<Dialogs>;
  readonly clock?: () => Date;
  /** Default: app/report, as in the app. */
  readonly report?: ReportPort;
}

export interface Harness {
  /** The page: http://127.0.0.1:PORT/?token=… */
  readonly url: string;
  /** http://127.0.0.1:PORT/ */
  readonly origin: string;
  /** This run's token; every /api/ request needs it. */
  readonly token: string;
  readonly workDir: string;
  close(): Promise<void>;
  /** Push a menu command to the page (as the native menu would); a path goes as a document handle. */
  sendMenu(event: MenuEvent): void;
  /** The last setDocumentState the page sent, or null. */
  documentState(): DocumentState | null;
  /** Change dialog answers while running. */
  setDialogs(dialogs: Partial<Dialogs>): void;
}

const MAX_BODY_BYTES = 5_000_000;
export const SAVE_NAMES: Readonly<Record<Exclude<SaveKind, 'review'>, string>> = { record: 'record.pdf', csv: 'cases.csv' };
/** The file the open dialog "chooses", when present in workDir. */
export const OPEN_NAME = 'open.flankfilm.json';

/** Dialogs that answer with paths inside workDir: save → workDir/<suggested name>, export → workDir/record.pdf or cases.csv. */
export function workDirDialogs(workDir: string): Dialogs {
  return {
    openPath: async () => (existsSync(join(workDir, OPEN_NAME)) ? join(workDir, OPEN_NAME) : null),
    savePath: async (kind, suggestedName) => join(workDir, kind === 'review' ? suggestedName : SAVE_NAMES[kind]),
    confirmClose: async () => 'discard',
  };
}

/** As in the app: the record is made in a worker thread (the .ts entry, through tsx). */
async function defaultReport(): Promise<ReportPort> {
  return (await import('../../main/services/report')).createReportPort(resolve('assets/fonts'), { file: resolve('tests/harness/recordWorker.cjs') });
}

export async function startHarness(options: HarnessOptions = {}): Promise<Harness> {
  const staticDir = resolve(options.staticDir ?? 'dist/renderer');
  const ownWorkDir = options.workDir === undefined;
  const workDir = resolve(options.workDir ?? (await mkdtemp(join(tmpdir(), 'flankfilm-harness-'))));
  let dialogs: Dialogs = { ...workDirDialogs(workDir), ...options.dialogs };
  let docState: DocumentState | null = null;
  const services = createServices({
    dialogs: {
      openPath: () => dialogs.openPath(),
      savePath: (kind, name) => dialogs.savePath(kind, name),
      confirmClose: (title) => dialogs.confirmClose(title),
    },
    userDataDir: join(workDir, 'userData'),
    clock: options.clock ?? (() => new Date()),
    appVersion: 'harness',
    platform: process.platform,
    report: options.report ?? (await defaultReport()),
    readOnlyDirs: [resolve('assets/demo')],
    onDocumentState: (s) => {
      docState = s;
    },
    onExportProgress: (p) => {
      const data = `event: progress\ndata: ${JSON.stringify(p)}\n\n`;
      listeners.forEach((r) => r.write(data));
    },
  });
  const listeners = new Set<ServerResponse>();
  let origin = '';
  const token = randomBytes(32).toString('hex');
  const tokenOk = (given: string | null | undefined): boolean => typeof given === 'string' && given.length === token.length && timingSafeEqual(Buffer.from(given), Buffer.from(token));

  const server = createServer((req, res) => {
    route(req, res).catch((e: unknown) => json(res, 500, { error: (e as Error)?.message ?? String(e) }));
  });

  async function route(req: IncomingMessage, res: ServerResponse): Promise<void> {
    // Loopback only, and only pages of this origin may call (no DNS rebinding, no cross-site POST).
    if (`http://${req.headers.host ?? ''}` !== origin) return json(res, 403, { error: 'wrong Host' });
    if (req.headers.origin !== undefined && req.headers.origin !== origin) return json(res, 403, { error: `origin ${req.headers.origin} may not call the harness` });
    const url = new URL(req.url ?? '/', origin);
    if (url.pathname.startsWith('/api/')) {
      const header = req.headers['x-flankfilm-token'];
      if (!tokenOk(typeof header === 'string' ? header : url.searchParams.get('token'))) return json(res, 401, { error: 'this harness needs its run token' });
    }
    if (url.pathname === '/api/events' && req.method === 'GET') return events(res);
    if (url.pathname.startsWith('/api/')) {
      if (req.method !== 'POST') return json(res, 405, { error: 'POST only' });
      return call(url.pathname.slice('/api/'.length), req, res);
    }
    if (req.method !== 'GET' && req.method !== 'HEAD') return json(res, 405, { error: 'GET only' });
    const r = await serveStatic(staticDir, url.pathname);
    res.writeHead(r.status, r.headers);
    res.end(req.method === 'HEAD' ? undefined : r.body);
  }

  async function call(name: string, req: IncomingMessage, res: ServerResponse): Promise<void> {
    if (!isCallName(name)) return json(res, 404, { error: `no call named ${name}` });
    const body = await readBody(req);
    if (body === null) return json(res, 413, { error: `body over ${MAX_BODY_BYTES} bytes` });
    let args: unknown;
    try {
      args = body.length ? JSON.parse(body) : {};
    } catch (e) {
      return json(res, 400, { error: `body is not JSON: ${(e as Error).message}` });
    }
    try {
      json(res, 200, await invokeService(services, name, args));
    } catch (e) {
      if (e instanceof ArgsRejected) return json(res, 400, { error: e.message, issues: e.issues });
      if (e instanceof UserError) return json(res, 422, { error: e.message });
      throw e;
    }
  }

  function events(res: ServerResponse): void {
    res.writeHead(200, { ...SECURITY_HEADERS, 'Content-Type': 'text/event-stream', 'Cache-Control': 'no-cache', Connection: 'keep-alive' });
    res.write(': flankfilm harness\n\n');
    listeners.add(res);
    res.on('close', () => listeners.delete(res));
  }

  await new Promise<void>((ok, fail) => {
    server.once('error', fail);
    server.listen(0, '127.0.0.1', () => ok());
  });
  origin = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;

  return {
    url: `${origin}/?token=${token}`,
    origin: `${origin}/`,
    token,
    workDir,
    async close() {
      listeners.forEach((r) => r.end());
      server.closeAllConnections();
      await new Promise<void>((ok) => server.close(() => ok()));
      if (ownWorkDir) await rm(workDir, { recursive: true, force: true });
    },
    sendMenu(event) {
      const { path, ...rest } = event;
      const data = `data: ${JSON.stringify(path === undefined ? rest : { ...rest, handle: services.documents.register(path) })}\n\n`;
      listeners.forEach((r) => r.write(data));
    },
    documentState: () => docState,
    setDialogs(next) {
      dialogs = { ...dialogs, ...next };
    },
  };
}

function json(res: ServerResponse, status: number, value: unknown): void {
  res.writeHead(status, { ...SECURITY_HEADERS, 'Content-Type': 'application/json; charset=utf-8', 'Cache-Control': 'no-store' });
  res.end(JSON.stringify(value));
}

function readBody(req: IncomingMessage): Promise<string | null> {
  return new Promise((ok, fail) => {
    const chunks: Buffer[] = [];
    let size = 0;
    req.on('data', (c: Buffer) => {
      size += c.length;
      if (size <= MAX_BODY_BYTES) chunks.push(c);
    });
    req.on('end', () => ok(size > MAX_BODY_BYTES ? null : Buffer.concat(chunks).toString('utf8')));
    req.on('error', fail);
  });
}

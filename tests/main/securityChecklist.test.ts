import { describe, expect, it } from 'vitest';
import { readFileSync, readdirSync } from 'node:fs';
import { join } from 'node:path';
import { z } from 'zod';
import { contract, menuEvent } from '../../app/bridge/contract';

/**
 * Electron's security checklist (electronjs.org, "Security", the numbered recommendations), item by
 * item: where each is proven, or why it does not apply. The item-level assertions live in
 * window.test.ts, csp.test.ts, ipc.test.ts, preload.test.ts and protocol/staticFiles tests; the
 * ones no other file covers are asserted here.
 */
const CHECKLIST: ReadonlyArray<{ item: number; title: string; covered: string }> = [
  { item: 1, title: 'Only load secure content', covered: 'applies: no remote content at all; window.test.ts cancels every non-app request (isAllowedRequest)' },
  { item: 2, title: 'Do not enable Node.js integration for remote content', covered: 'window.test.ts: nodeIntegration, nodeIntegrationInWorker, nodeIntegrationInSubFrames false' },
  { item: 3, title: 'Enable context isolation', covered: 'window.test.ts: contextIsolation true' },
  { item: 4, title: 'Enable process sandboxing', covered: 'window.test.ts: sandbox true' },
  { item: 5, title: 'Handle session permission requests from remote content', covered: 'window.test.ts: every permission request and check denied' },
  { item: 6, title: 'Do not disable webSecurity', covered: 'window.test.ts: webSecurity true' },
  { item: 7, title: 'Define a Content Security Policy', covered: 'csp.test.ts: no unsafe-eval, no inline script, no remote source; header on every app:// response' },
  { item: 8, title: 'Do not enable allowRunningInsecureContent', covered: 'window.test.ts: false' },
  { item: 9, title: 'Do not enable experimental features', covered: 'window.test.ts: experimentalFeatures false' },
  { item: 10, title: 'Do not use enableBlinkFeatures', covered: 'here: no enableBlinkFeatures in main/' },
  { item: 11, title: '<webview>: do not use allowpopups', covered: 'not applicable: webviewTag is false and will-attach-webview is refused (window.test.ts)' },
  { item: 12, title: '<webview>: verify options and params', covered: 'not applicable: no webview can attach (window.test.ts)' },
  { item: 13, title: 'Disable or limit navigation', covered: 'window.test.ts: will-navigate and will-redirect refused' },
  { item: 14, title: 'Disable or limit creation of new windows', covered: 'window.test.ts: setWindowOpenHandler denies' },
  { item: 15, title: 'Do not use shell.openExternal with untrusted content', covered: 'here: main/ never calls shell.openExternal' },
  { item: 16, title: 'Use a current version of Electron', covered: 'here: electron pinned exactly (45.5.0)' },
  { item: 17, title: 'Validate the sender of all IPC messages', covered: 'ipc.test.ts: foreign origin, subframe and bad payload rejected; mainProcess.test.ts: the drop channel checks its sender too; here: no call takes a file path, only main\'s opaque document handles' },
  { item: 18, title: 'Avoid the file:// protocol, prefer custom protocols', covered: 'here and staticFiles.test.ts: pages come from app://flankfilm/' },
  { item: 19, title: 'Check which fuses you can change', covered: 'here: electron-builder.yml sets the fuses' },
  { item: 20, title: 'Do not expose Electron APIs to untrusted web content', covered: 'preload.test.ts: only the contract calls, onMenu, onProgress and handleForFile are exposed; a dropped file\'s path goes to main, only a handle comes back' },
];

const mainSources = readdirSync('main', { recursive: true, withFileTypes: true })
  .filter((d) => d.isFile() && d.name.endsWith('.ts'))
  .map((d) => readFileSync(join(d.parentPath, d.name), 'utf8'))
  .join('\n');

describe('Electron security checklist', () => {
  it('every item is either proven somewhere or marked not applicable with its reason', () => {
    expect(CHECKLIST.map((c) => c.item)).toEqual(Array.from({ length: 20 }, (_, i) => i + 1));
    for (const c of CHECKLIST) expect(c.covered.length, c.title).toBeGreaterThan(10);
  });
  it('17/20: main alone holds file paths — no call, result or menu event carries one; the calls that name files refuse extra keys', () => {
    const keysOf = (schema: unknown): string[] => {
      const s = schema as z.ZodType & { shape?: Record<string, unknown>; options?: unknown[]; unwrap?: () => unknown; element?: unknown };
      if (s instanceof z.ZodObject) return Object.entries(s.shape).flatMap(([k, v]) => [k, ...keysOf(v)]);
      if (s instanceof z.ZodUnion) return (s.options as unknown[]).flatMap(keysOf);
      if (s instanceof z.ZodNullable || s instanceof z.ZodOptional) return keysOf(s.unwrap?.());
      if (s instanceof z.ZodArray) return keysOf(s.element);
      return [];
    };
    for (const [name, spec] of Object.entries(contract)) {
      for (const k of [...keysOf(spec.args), ...keysOf(spec.result)]) expect(k, name).not.toMatch(/path|^dir$|folder|file/i);
    }
    expect(keysOf(menuEvent)).toEqual(['command', 'handle']);
    for (const name of ['openReview', 'saveReview', 'exportRecord', 'exportCsv', 'autosave'] as const) {
      expect(contract[name].args.safeParse({ ...contract[name].args.safeParse({}).data, path: '/etc/passwd' }).success, name).toBe(false);
    }
  });
  it('the HTTP harness refuses calls without its per-run token (harness.test.ts asserts the 401s)', () => {
    const harness = readFileSync('tests/harness/server.ts', 'utf8');
    expect(harness).toMatch(/randomBytes\(32\)/);
    expect(harness).toMatch(/401/);
  });
  it('10: no enableBlinkFeatures; 15: no shell.openExternal', () => {
    expect(mainSources).not.toMatch(/enableBlinkFeatures/);
    expect(mainSources).not.toMatch(/openExternal\s*\(/);
  });
  it('16: electron is pinned to an exact, current major (45)', () => {
    const pkg = JSON.parse(readFileSync('package.json', 'utf8'));
    expect(pkg.devDependencies.electron).toMatch(/^45\.\d+\.\d+$/);
  });
  it('18: the app is served from a custom privileged scheme, not file://', () => {
    expect(mainSources).toMatch(/registerSchemesAsPrivileged/);
    expect(mainSources).toMatch(/app:\/\/flankfilm/);
    expect(mainSources).not.toMatch(/loadFile\(/); // file:// appears only in comments that forbid it
  });
  it('19: the packaged app turns off run-as-node, NODE_OPTIONS and inspect, and checks the asar', () => {
    const yml = readFileSync('electron-builder.yml', 'utf8');
    for (const fuse of ['runAsNode: false', 'enableNodeOptionsEnvironmentVariable: false', 'enableNodeCliInspectArguments: false', 'enableEmbeddedAsarIntegrityValidation: true', 'onlyLoadAppFromAsar: true']) expect(yml).toContain(fuse);
  });
});

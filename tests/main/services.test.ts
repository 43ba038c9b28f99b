import { mkdir, mkdtemp, readFile, rm, stat, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import type { CallName } from '../../app/bridge/contract';
import { MAX_REVIEW_BYTES, parseReviewText } from '../../app/review/parse';
import { createServices } from '../../main/services';
import { createReportPort } from '../../main/services/report';
import { ArgsRejected, invokeService } from '../../main/services/dispatch';
import type { Dialogs, ReportPort, ServiceDeps } from '../../main/services/types';
import { DEMO_TEXT, EDITED_TEXT, NEWER_TEXT } from './fixtures/texts';

let dir: string;
beforeEach(async () => {
  dir = await mkdtemp(join(tmpdir(), 'flankfilm-services-'));
});
afterEach(async () => {
  await rm(dir, { recursive: true, force: true });
});

const FAKE_PDF = new Uint8Array(Buffer.from('%PDF-1.7\n% not a real record\n'));
const fakeReport: ReportPort = { renderRecord: async () => FAKE_PDF, casesCsv: () => 'loadCase,oil\n' };

function setup(overrides: Partial<ServiceDeps> = {}, dialogs: Partial<Dialogs> = {}) {
  const calls = { open: 0, save: [] as string[] };
  const deps: ServiceDeps = {
    dialogs: {
      openPath: async () => {
        calls.open++;
        return null;
      },
      savePath: async (kind, name) => {
        calls.save.push(`${kind}:${name}`);
        return join(dir, name);
      },
      confirmClose: async () => 'cancel',
      ...dialogs,
    },
    userDataDir: join(dir, 'userData'),
    clock: () => new Date('2026-12-01T09:30:00Z'),
    appVersion: '0.1.0-test',
    platform: 'linux',
    report: fakeReport,
    readOnlyDirs: [resolve('assets/demo')],
    ...overrides,
  };
  const services = createServices(deps);
  const call = <K extends CallName>(name: K, args: unknown) => invokeService(services, name, args);
  /** A handle for a path main chose (its recent list, the command line, a drop): what the renderer holds. */
  const handleOf = (path: string) => services.documents.register(path);
  return { services, call, calls, handleOf };
}

describe('openReview', () => {
  it('refuses a file from a newer version and leaves it untouched', async () => {
    const { call, services, handleOf } = setup();
    const file = join(dir, 'future.flankfilm.json');
    await writeFile(file, NEWER_TEXT);
    const before = await stat(file);
    await expect(call('openReview', { handle: handleOf(file) })).rejects.toThrow(/version 99, made by a newer Flankfilm.*the file was not changed/s);
    const after = await stat(file);
    expect(await readFile(file, 'utf8')).toBe(NEWER_TEXT);
    expect(after.mtimeMs).toBe(before.mtimeMs);
    expect(await services.recentFiles({})).toEqual([]);
  });

  it('returns the text as stored, with a handle and the file name (never the path), and remembers it', async () => {
    const { call, handleOf } = setup();
    const file = join(dir, 'crusher.flankfilm.json');
    await writeFile(file, `\uFEFF${DEMO_TEXT}`);
    const handle = handleOf(file);
    const r = await call('openReview', { handle });
    expect(r).toEqual({ canceled: false, handle, name: 'crusher.flankfilm.json', text: DEMO_TEXT, migratedFrom: null });
    expect(JSON.stringify(r)).not.toContain(dir);
    expect(await call('recentFiles', {})).toEqual([{ handle, name: 'crusher.flankfilm.json' }]);
  });

  it('refuses a path from the renderer, and a handle main never gave', async () => {
    const { call } = setup();
    const file = join(dir, 'unrelated.json');
    await writeFile(file, '{"format":"someone-elses-secret","version":1}');
    await expect(call('openReview', { path: file })).rejects.toBeInstanceOf(ArgsRejected);
    await expect(call('openReview', { handle: file })).rejects.toBeInstanceOf(ArgsRejected);
    await expect(call('openReview', { handle: 'doc-00000000-0000-4000-8000-000000000000' })).rejects.toThrow(/not known to this window/);
    await expect(call('saveReview', { path: file, text: DEMO_TEXT, saveAs: false })).rejects.toBeInstanceOf(ArgsRejected);
    await expect(call('saveReview', { handle: 'doc-00000000-0000-4000-8000-000000000000', text: DEMO_TEXT, saveAs: false })).rejects.toThrow(/not known/);
    await expect(call('autosave', { text: DEMO_TEXT, handle: 'doc-00000000-0000-4000-8000-000000000000' })).rejects.toThrow(/not known/);
    expect(await readFile(file, 'utf8')).toBe('{"format":"someone-elses-secret","version":1}');
  });

  it('a foreign JSON file opened by the user: the message names the field, never the file\'s content', async () => {
    const { call, handleOf } = setup();
    const file = join(dir, 'foreign.json');
    await writeFile(file, '{"format":"payroll-2026-secret","version":1}');
    const e = (await call('openReview', { handle: handleOf(file) }).catch((x: Error) => x)) as Error;
    expect(e.message).toMatch(/format/);
    expect(e.message).not.toContain('payroll');
  });

  it('opens the bundled demo file as an untitled copy, so Save cannot overwrite it', async () => {
    const { call, handleOf } = setup();
    const r = await call('openReview', { handle: handleOf(resolve('assets/demo/harrow-creek-crusher-hs-pair.flankfilm.json')) });
    expect(r).toMatchObject({ canceled: false, handle: null, name: null });
  });

  it('names the field when the file fails the schema', async () => {
    const { call, handleOf } = setup();
    const file = join(dir, 'bad.flankfilm.json');
    const bad = JSON.parse(DEMO_TEXT) as { gearPair: { pinion: { teeth: number } } };
    bad.gearPair.pinion.teeth = 2;
    await writeFile(file, JSON.stringify(bad));
    await expect(call('openReview', { handle: handleOf(file) })).rejects.toThrow(/gearPair\.pinion\.teeth: must be at least 5 teeth/);
  });

  it.each([
    ['another kind of file', '/etc/hostname', /a review is a \.flankfilm\.json file/],
    ['a missing file', '/nonexistent/x.flankfilm.json', /the file does not exist/],
  ])('refuses %s (named on the command line, say)', async (_what, path, message) => {
    const { call, handleOf } = setup();
    await expect(call('openReview', { handle: handleOf(path) })).rejects.toThrow(message);
  });

  it('refuses a folder and an oversized file before reading them', async () => {
    const { call, handleOf } = setup();
    await mkdir(join(dir, 'folder.json'));
    await expect(call('openReview', { handle: handleOf(join(dir, 'folder.json')) })).rejects.toThrow(/not a file/);
    await writeFile(join(dir, 'huge.flankfilm.json'), Buffer.alloc(MAX_REVIEW_BYTES + 1, 0x20));
    await expect(call('openReview', { handle: handleOf(join(dir, 'huge.flankfilm.json')) })).rejects.toThrow(/a review is at most 1 MB/);
  });

  it('asks the dialog without a path; Cancel is not an error', async () => {
    const { call, calls } = setup();
    expect(await call('openReview', {})).toEqual({ canceled: true });
    expect(calls.open).toBe(1);
  });
});

describe('openDemo', () => {
  it('gives the invented demo as an untitled, valid review', async () => {
    const { call } = setup();
    const r = await call('openDemo', {});
    expect(r.handle).toBeNull();
    const parsed = parseReviewText(r.text);
    expect(parsed.ok && parsed.review.title).toMatch(/^Harrow Creek/);
  });
});

describe('saveReview', () => {
  it('asks for a path named after the title, then saves in place keeping a .bak', async () => {
    const { call, calls, services } = setup();
    const first = await call('saveReview', { handle: null, text: DEMO_TEXT, saveAs: false });
    expect(calls.save).toEqual(['review:harrow-creek-aggregate-plant-primary-crusher-drive-reducer.flankfilm.json']);
    expect(first.canceled).toBe(false);
    const { handle, name } = first as { handle: string; name: string };
    expect(name).toBe('harrow-creek-aggregate-plant-primary-crusher-drive-reducer.flankfilm.json');
    const path = services.documents.path(handle);
    expect(path).toBe(join(dir, name));
    expect(await readFile(path, 'utf8')).toBe(DEMO_TEXT);
    expect(await call('saveReview', { handle, text: EDITED_TEXT, saveAs: false })).toEqual({ canceled: false, handle, name });
    expect(calls.save).toHaveLength(1);
    expect(await readFile(path, 'utf8')).toBe(EDITED_TEXT);
    expect(await readFile(`${path}.bak`, 'utf8')).toBe(DEMO_TEXT);
  });

  it('Save as asks even with a path, and adds the extension to a bare name', async () => {
    const { call, handleOf } = setup({}, { savePath: async () => join(dir, 'renamed') });
    expect(await call('saveReview', { handle: handleOf(join(dir, 'old.flankfilm.json')), text: DEMO_TEXT, saveAs: true })).toEqual({
      canceled: false,
      handle: handleOf(join(dir, 'renamed.flankfilm.json')),
      name: 'renamed.flankfilm.json',
    });
  });

  it('refuses a review that would not open again, and writes nothing', async () => {
    const { call, handleOf } = setup();
    const path = join(dir, 'x.flankfilm.json');
    await expect(call('saveReview', { handle: handleOf(path), text: '{"format":"flankfilm.review","version":1}', saveAs: false })).rejects.toThrow(/^not saved: the review is not valid:\ntitle:/);
    await expect(stat(path)).rejects.toThrow();
  });

  it('clears the autosave once the same text is saved', async () => {
    const { call, handleOf } = setup();
    await call('autosave', { text: EDITED_TEXT, handle: null });
    expect(await call('recoverAutosave', {})).toEqual({ text: EDITED_TEXT, handle: null, name: null, savedAt: '2026-12-01T09:30:00.000Z' });
    await call('saveReview', { handle: handleOf(join(dir, 'a.flankfilm.json')), text: EDITED_TEXT, saveAs: false });
    expect(await call('recoverAutosave', {})).toBeNull();
  });

  it('Cancel in the dialog writes nothing', async () => {
    const { call } = setup({}, { savePath: async () => null });
    expect(await call('saveReview', { handle: null, text: DEMO_TEXT, saveAs: false })).toEqual({ canceled: true });
  });
});

describe('exports', () => {
  it('exportRecord renders first, then writes the bytes where the dialog says', async () => {
    const { call, calls } = setup();
    const r = await call('exportRecord', { text: DEMO_TEXT, paper: 'a4' });
    expect(calls.save[0]).toBe('record:HC-DEMO-001.pdf'); // named by the review id (the demo's id is HC-DEMO-001)
    expect(r).toEqual({ canceled: false, name: expect.stringMatching(/\.pdf$/) as unknown as string, bytes: FAKE_PDF.byteLength });
    expect(await readFile(join(dir, (r as { name: string }).name))).toEqual(Buffer.from(FAKE_PDF));
  });

  it('exportCsv writes the CSV', async () => {
    const { call } = setup();
    const r = await call('exportCsv', { text: DEMO_TEXT });
    expect(await readFile(join(dir, (r as { name: string }).name), 'utf8')).toBe('loadCase,oil\n');
  });

  it('an export never overwrites the open review (also through a link)', async () => {
    const review = join(dir, 'open.flankfilm.json');
    await writeFile(review, DEMO_TEXT);
    const { call, handleOf } = setup({}, { savePath: async () => review });
    await expect(call('exportRecord', { text: DEMO_TEXT, paper: 'a4', handle: handleOf(review) })).rejects.toThrow(/is the review itself/);
    await expect(call('exportCsv', { text: DEMO_TEXT, handle: handleOf(review) })).rejects.toThrow(/is the review itself/);
    expect(await readFile(review, 'utf8')).toBe(DEMO_TEXT);
  });

  it('with the real app/report: a PDF record and a CSV with a header row', async () => {
    const { call } = setup({ report: createReportPort(resolve('assets/fonts')) });
    const record = (await call('exportRecord', { text: DEMO_TEXT, paper: 'letter' })) as { name: string; bytes: number };
    const pdf = await readFile(join(dir, record.name));
    expect(pdf.subarray(0, 5).toString('latin1')).toBe('%PDF-');
    expect(pdf.byteLength).toBe(record.bytes);
    const csv = (await call('exportCsv', { text: DEMO_TEXT })) as { name: string };
    const firstLine = (await readFile(join(dir, csv.name), 'utf8')).split('\r\n')[0];
    expect(firstLine).toMatch(/^\uFEFF?load case,oil,point,/);
  });

  it('an invalid review gives no record and no dialog', async () => {
    const { call, calls } = setup();
    await expect(call('exportRecord', { text: '{}', paper: 'letter' })).rejects.toThrow(/^no record made: the review is not valid/);
    expect(calls.save).toEqual([]);
  });
});

describe('signReview', () => {
  it('stamps the sign-off with main\'s clock and a fingerprint', async () => {
    const { call } = setup();
    const r = await call('signReview', { text: DEMO_TEXT, reviewer: 'A. Reviewer', role: 'Lubrication engineer', decision: 'approved' });
    const parsed = parseReviewText(r.text);
    expect(parsed.ok).toBe(true);
    const signoff = parsed.ok ? parsed.review.signoff : undefined;
    expect(signoff).toMatchObject({ reviewer: 'A. Reviewer', decision: 'approved', signedAt: '2026-12-01T09:30:00.000Z' });
    expect(signoff?.fingerprint).toMatch(/^[0-9a-f]{64}$/);
  });
});

describe('the rest of the contract', () => {
  it('appInfo, setDocumentState and recentFiles', async () => {
    const onDocumentState = vi.fn();
    const { call, handleOf } = setup({ onDocumentState });
    expect(await call('appInfo', {})).toEqual({ version: '0.1.0-test', engineVersion: expect.any(String) as unknown as string, platform: 'linux' });
    expect(await call('setDocumentState', { title: 'HS pair', dirty: true })).toEqual({ ok: true });
    expect(onDocumentState).toHaveBeenCalledWith({ title: 'HS pair', dirty: true });
    const file = join(dir, 'gone.flankfilm.json');
    await writeFile(file, DEMO_TEXT);
    await call('openReview', { handle: handleOf(file) });
    await rm(file);
    expect(await call('recentFiles', {})).toEqual([]);
  });

  it('the contract refuses bad arguments before any service runs', async () => {
    const { call, calls } = setup();
    await expect(call('saveReview', { handle: null, text: 42, saveAs: false })).rejects.toBeInstanceOf(ArgsRejected);
    await expect(call('exportRecord', { text: DEMO_TEXT, paper: 'a3' })).rejects.toThrow(/paper/);
    expect(calls.save).toEqual([]);
  });
});

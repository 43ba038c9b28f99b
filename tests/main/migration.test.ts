/**
 * Opening a file from an older version: migrated in memory, marked with migratedFrom, the file
 * itself untouched. Version 1 is the first, so the migration step is simulated here by making
 * parseReviewText report one (app/review/migrate.ts adds real steps with later versions).
 */
import { mkdtemp, readFile, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it, vi } from 'vitest';
import { DEMO_TEXT } from './fixtures/texts';

vi.mock('../../app/review/parse', async (importOriginal) => {
  const real = await importOriginal<typeof import('../../app/review/parse')>();
  return {
    ...real,
    parseReviewText: (text: string) => {
      const r = real.parseReviewText(text.replace('"version": 0', '"version": 1'));
      return r.ok && text.includes('"version": 0') ? { ...r, migratedFrom: 0 } : r;
    },
  };
});
const { createServices } = await import('../../main/services');

describe('an older review file', () => {
  it('opens migrated and marked, and the file stays as it was', async () => {
    const dir = await mkdtemp(join(tmpdir(), 'flankfilm-migrate-'));
    const file = join(dir, 'old.flankfilm.json');
    const oldText = DEMO_TEXT.replace('"version": 1', '"version": 0');
    await writeFile(file, oldText);
    const s = createServices({
      dialogs: { openPath: async () => null, savePath: async () => null, confirmClose: async () => 'cancel' },
      userDataDir: join(dir, 'userData'),
      clock: () => new Date(0),
      appVersion: 't',
      platform: 'linux',
      report: { renderRecord: async () => new Uint8Array(), casesCsv: () => '' },
    });
    const handle = s.documents.register(file);
    const r = await s.openReview({ handle });
    expect(r).toMatchObject({ canceled: false, handle, name: 'old.flankfilm.json', migratedFrom: 0 });
    const text = (r as { text: string }).text;
    expect(JSON.parse(text)).toMatchObject({ format: 'flankfilm.review', version: 1 });
    expect(await readFile(file, 'utf8')).toBe(oldText);
    await rm(dir, { recursive: true, force: true });
  });
});

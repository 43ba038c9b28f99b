import { mkdtemp, readFile, rm } from 'node:fs/promises';
import { readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { createServices } from '../../main/services';
import { invokeService } from '../../main/services/dispatch';
import type { ServiceDeps } from '../../main/services/types';
import type { FleetResult } from '../../app/fleet/types';

let dir: string;
beforeEach(async () => {
  dir = await mkdtemp(join(tmpdir(), 'flankfilm-fleet-export-'));
});
afterEach(async () => {
  await rm(dir, { recursive: true, force: true });
});

const OILS = readFileSync('assets/demo/fleet/harrow-creek-candidates.flankfilm-oils.json', 'utf8');
const REVIEW = readFileSync('assets/demo/fleet/harrow-creek-screen-drive-spur-pair.flankfilm.json', 'utf8');

function setup() {
  const seen: FleetResult[] = [];
  const saved: string[] = [];
  const deps: ServiceDeps = {
    dialogs: { openPath: async () => null, savePath: async (kind, name) => (saved.push(`${kind}:${name}`), join(dir, name)), confirmClose: async () => 'cancel' },
    userDataDir: join(dir, 'userData'),
    clock: () => new Date('2026-12-01T09:30:00Z'),
    appVersion: '0.1.0-test',
    platform: 'linux',
    report: {
      renderRecord: async () => new Uint8Array(),
      casesCsv: () => '',
      renderFleetRecord: async (result) => (seen.push(result), new Uint8Array(Buffer.from('%PDF-1.7\n% fleet\n'))),
    },
  };
  const services = createServices(deps);
  return { call: (args: unknown) => invokeService(services, 'exportFleetRecord', args), seen, saved };
}

describe('exportFleetRecord', () => {
  it('recomputes the fleet in main from the texts, names a broken review and saves the record', async () => {
    const { call, seen, saved } = setup();
    const r = await call({ reviews: [{ name: 'screen.flankfilm.json', text: REVIEW }, { name: 'broken.flankfilm.json', text: '{' }], oils: OILS, paper: 'a4' });
    expect(r).toMatchObject({ canceled: false, name: 'fleet-record.pdf' }); // main keeps the path; the window gets the name only
    expect(saved).toEqual(['record:fleet-record.pdf']);
    expect(seen[0]?.gearboxes.map((g) => g.source)).toEqual(['screen.flankfilm.json']);
    expect(seen[0]?.failed.map((f) => f.source)).toEqual(['broken.flankfilm.json']);
    expect(await readFile(join(dir, 'fleet-record.pdf'), 'utf8')).toContain('% fleet');
  });

  it('refuses a bad candidate file with its field named, and writes nothing', async () => {
    const { call, saved } = setup();
    const bad = JSON.parse(OILS);
    bad.oils[2].chemistry = 'snake-oil';
    await expect(call({ reviews: [{ name: 'screen.flankfilm.json', text: REVIEW }], oils: JSON.stringify(bad), paper: 'a4' })).rejects.toThrow(/oils\[2\]\.chemistry/);
    expect(saved).toEqual([]);
  });
});

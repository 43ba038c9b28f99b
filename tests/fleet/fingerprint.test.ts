import { describe, expect, it } from 'vitest';
import { fleetFingerprintParts } from '../../app/fleet/fingerprint';
import { runFleet } from '../../app/fleet/fleet';
import { parseOilsValue } from '../../app/fleet/oilsFile';
import { AW, EP, HAND_FLEET, RO, gearbox, parsed } from './fixtures';

function fleetOf(oils: unknown[], load = 1) {
  const file = parseOilsValue({ format: 'flankfilm.oils', version: 1, oils });
  if (!file.ok) throw new Error(JSON.stringify(file.issues));
  const gearboxes = HAND_FLEET.slice(1, 3).map((v, i) => ({ source: `g${i}`, review: parsed(gearbox({ ...v, load: v.load * (i === 0 ? load : 1) })) }));
  const inputs = { gearboxes, oilsFile: file.file };
  return fleetFingerprintParts(inputs, runFleet({ gearboxes, oils: file.oils }));
}

describe('the fleet fingerprint', () => {
  const base = fleetOf([RO, AW, EP]);
  it('is the same for the same inputs', () => {
    expect(fleetOf([RO, AW, EP])).toEqual(base);
    expect(base.combined).toMatch(/^[0-9a-f]{64}$/);
  });
  it('changes with a candidate oil value and with a gearbox duty, and says which part', () => {
    const oil = fleetOf([RO, { ...AW, kv100_mm2s: 38 }, EP]);
    expect(oil.combined).not.toBe(base.combined);
    expect(oil.inputs).not.toBe(base.inputs);
    const duty = fleetOf([RO, AW, EP], 1.01);
    expect(duty.combined).not.toBe(base.combined);
    expect(duty.inputs).not.toBe(base.inputs);
    expect(duty.engine).toBe(base.engine);
  });
});

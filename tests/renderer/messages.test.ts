import { describe, it, expect } from 'vitest';
import { DEMO_REVIEWS } from '../../app/review/demo';
import { parseReviewValue } from '../../app/review/parse';
import { friendlyMessage, lookupMessages, messagesByPath } from '../../renderer/state/messages';
import { pathKey } from '../../renderer/state/paths';

interface Loose {
  gearPair: { pinion: { teeth: unknown } };
  loadCases: { oilTemperature_C: unknown }[];
  policy: { temperatureRange_C: unknown };
}
const demo = () => structuredClone(DEMO_REVIEWS['harrow-creek-crusher-hs-pair.flankfilm.json']) as Loose;

describe('field messages', () => {
  it('schema issues land at the path a field computes for itself', () => {
    const r = demo();
    r.gearPair.pinion.teeth = 4;
    r.loadCases[1]!.oilTemperature_C = 'hot';
    const parsed = parseReviewValue(r);
    expect(parsed.ok).toBe(false);
    const map = messagesByPath(parsed.ok ? [] : parsed.issues, null);
    expect(lookupMessages(map, pathKey(['gearPair', 'pinion', 'teeth']))).toEqual(['must be at least 5 teeth']); // app/review/schema.ts
    expect(lookupMessages(map, pathKey(['loadCases', 1, 'oilTemperature_C']))).toEqual(['enter a number']);
    expect(lookupMessages(map, pathKey(['loadCases', 0, 'oilTemperature_C']))).toEqual([]);
  });
  it('a range refused as a whole shows at its first end', () => {
    const r = demo();
    r.policy.temperatureRange_C = [90, 20];
    const parsed = parseReviewValue(r);
    const map = messagesByPath(parsed.ok ? [] : parsed.issues, null);
    expect(lookupMessages(map, 'policy.temperatureRange_C[0]')).toEqual(['the lower end must be below the upper end']);
    expect(lookupMessages(map, 'policy.temperatureRange_C[1]')).toEqual([]);
  });
  it('an engine input error shows at its field', () => {
    const map = messagesByPath([], { field: 'gearPair.centerDistance_mm', code: 'geometry', message: 'too small' });
    expect(lookupMessages(map, 'gearPair.centerDistance_mm')).toEqual(['too small']);
  });
  it('rewords zod’s type messages and keeps the schema’s own', () => {
    expect(friendlyMessage('Invalid input: expected number, received string')).toBe('enter a number');
    expect(friendlyMessage('must be greater than 0 N·m')).toBe('must be greater than 0 N·m');
  });
  it('a union no form of which matches: "choose one" on a choice, otherwise a plain sentence, never zod’s "Invalid input"', () => {
    expect(friendlyMessage('Invalid input', 'oils[0].fzgFailureStage')).toBe('choose one');
    expect(friendlyMessage('Invalid input', 'gearPair.pinion.material')).not.toMatch(/Invalid input/);
  });
  it('a field path inside a message (an engine error names its field) is given by its label', () => {
    expect(friendlyMessage('policy.pathPoints = 5 must be a whole number from 11 to 5001.')).toBe('Points along the path = 5 must be a whole number from 11 to 5001.');
    const map = messagesByPath([], { field: 'loadCases[0].oilTemperature_C', code: 'oil.temperature-range', message: 'loadCases[0].oilTemperature_C = 250 °C is outside the oil model' });
    expect(lookupMessages(map, 'loadCases[0].oilTemperature_C')).toEqual(['Oil temperature θoil = 250 °C is outside the oil model']);
  });
});

import { describe, expect, it } from 'vitest';
import { formatPath } from '../../app/review/fieldPath';
import { isReviewPath, messageInWords, parsePath, pathsInWords, pathWords } from '../../app/review/pathWords';
import { undrawableMessage } from '../../app/report/glyphCoverage';

const draft = { oils: [{ name: 'In-service oil' }, { name: '  ' }], loadCases: [{ name: 'Hard-rock peak' }] };

describe('field paths in words', () => {
  it('parsePath is formatPath read back', () => {
    for (const p of [['gearPair', 'pinion', 'teeth'], ['loadCases', 1, 'oilTemperature_C'], ['policy', 'temperatureRange_C', 0], ['oils', 12, 'kv40_mm2s']]) expect(parsePath(formatPath(p))).toEqual(p);
  });

  it('names the panel, the entry by its name (or its place), pinion or wheel, and the label', () => {
    expect(pathWords('oils[0].baseOil', draft)).toBe('Oils · In-service oil: Base oil');
    expect(pathWords('oils[1].kv40_mm2s', draft)).toBe('Oils · oil 2: Viscosity at 40 °C');
    expect(pathWords('loadCases[0].pinionTorque_Nm', draft)).toMatch(/^Duty · Hard-rock peak: Pinion torque/);
    expect(pathWords('gearPair.wheel.teeth', draft)).toBe('Gear set · Wheel: Teeth z2');
    expect(pathWords('oils[3]', draft)).toBe('Oils · oil 4');
    // A planetary stage's members, and the ring of an internal pair, as the sheet names them.
    expect(pathWords('planetary.sun.roughnessRa_um', null)).toMatch(/^Gear set · Sun: Flank roughness Ra/);
    expect(pathWords('planetary.ring.teeth', null)).toMatch(/^Gear set · Ring: Teeth/);
    expect(pathWords('planetary.planet.teeth', null)).toMatch(/^Gear set · Planet: Teeth/);
    expect(pathWords('gearPair.wheel.teeth', { gearPair: { kind: 'internal' } })).toBe('Gear set · Ring: Teeth z2');
    expect(pathWords('(file)', draft)).toBe('The file');
    expect(isReviewPath('gearPair.centerDistance_mm')).toBe(true);
    expect(isReviewPath('faceWidth')).toBe(false); // an engine quantity, not a review path
    expect(pathWords('gearPair.pinion.roughnessRa_um', null, 'us')).toMatch(/^Gear set · Pinion: Flank roughness/);
  });

  it('never shows a path: every label of the file has words, and an unknown path falls back to its panel', () => {
    expect(pathWords('gearPair.somethingNew', draft)).toBe('Gear set');
    for (const p of ['oils[0].baseOil', 'loadCases[0].oilTemperature_C', 'policy.lambdaTarget', 'gearPair.normalModule_mm']) expect(pathWords(p, draft)).not.toMatch(/[[\]_]|\.\w/);
  });

  it('replaces a path inside a message by the field label', () => {
    expect(pathsInWords('loadCases[0].oilTemperature_C = 250 °C is outside 20…180 °C, the range of the oil model for oils[1].')).toBe('Oil temperature θoil = 250 °C is outside 20…180 °C, the range of the oil model for oil 2.');
    expect(pathsInWords('policy.pathPoints = 5 must be a whole number')).toMatch(/^Points along the path = 5/);
    expect(pathsInWords('gearPair.faceWidthX_mm must be positive')).toBe('face width x must be positive');
    expect(pathsInWords('no path here, 3.5 mm')).toBe('no path here, 3.5 mm');
  });

  it('a message for the screen: a path leading a line is named with its entry, other paths by their labels', () => {
    // The record's refusal as the services give it (paths, as --json keeps them), then as the screen shows it.
    const refusal = `no record made:\n${undrawableMessage([{ path: 'loadCases[0].name', char: '齿' }, { path: 'oils[1].name', char: '🔥' }])}`;
    const shown = messageInWords(refusal, draft);
    expect(shown).toContain('\nDuty · Hard-rock peak: Name: the record\'s font (DejaVu Sans) cannot draw "齿" (U+9F7F)');
    expect(shown).toContain('\nOils · oil 2: Name: the record\'s font (DejaVu Sans) cannot draw "🔥" (U+1F525)');
    expect(messageInWords('gearPair.pinion.teeth: 5 is below 6 (with gearPair.wheel.teeth)', draft)).toBe('Gear set · Pinion: Teeth z1: 5 is below 6 (with Teeth z2)');
    expect(messageInWords('  - (file): not JSON', draft)).toBe('  - The file: not JSON');
    expect(messageInWords('no paths here: λ = 0.8', draft)).toBe('no paths here: λ = 0.8');
    for (const m of [refusal, 'loadCases[0]: the speed (loadCases[0].pinionSpeed_rpm, gearPair.faceWidth_mm)']) expect(messageInWords(m, draft)).not.toMatch(/\w\[\d+\]|\.[a-z]\w*_|gearPair\./);
  });
});

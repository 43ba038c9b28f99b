import { describe, expect, it } from 'vitest';
import { run } from '../../app/review/run';
import { inDisplayUnits, reasonInDisplayUnits } from '../../renderer/units/inText';
import { DEMO_REVIEWS } from '../../app/review/demo';
import { parseReviewValue } from '../../app/review/parse';

describe('generated sentences in the display units', () => {
  it('SI: unchanged', () => {
    expect(inDisplayUnits('θB,max = 117 °C at 60 °C oil', 'si')).toBe('θB,max = 117 °C at 60 °C oil');
  });
  it('US customary: each number with its unit converted where it stands, to 4 significant figures', () => {
    // °F = 1.8 °C + 32: 117 °C = 242.6 °F, 60 °C = 140.0 °F (NIST SP 811)
    expect(inDisplayUnits('θB,max = 117 °C at 60 °C oil', 'us')).toBe('θB,max = 242.6 °F at 140.0 °F oil');
    // a rise: 1 K = 1.8 °F; 1 ksi = 6.894757 MPa; 1 in = 25.4 mm
    expect(inDisplayUnits('θfl = 48 K, σH = 1318 MPa, b = 60 mm', 'us')).toBe('θfl = 86.40 Δ°F, σH = 191.2 ksi, b = 2.362 in');
  });
  it('leaves words, ratios and viscosities alone', () => {
    expect(inDisplayUnits('KV40 220 mm²/s, SB 1.5, FZG stage 12, λmin ≥ 1', 'us')).toBe('KV40 220 mm²/s, SB 1.5, FZG stage 12, λmin ≥ 1');
  });
});

describe('a verdict reason in the display units: its sentence, its threshold and its source', () => {
  const parsed = parseReviewValue(DEMO_REVIEWS['harrow-creek-crusher-hs-pair.flankfilm.json']);
  if (!parsed.ok) throw new Error('the demo does not parse');
  const reasons = run(parsed.review).cases.flatMap((c) => c.verdict?.reasons ?? []);
  const micropitting = reasons.find((r) => r.rule === 'micropitting.safety');

  it('the micropitting reason names its test conditions in the source, and US customary converts them', () => {
    expect(micropitting?.source).toContain('at 90 °C and 8.3 m/s');
    const us = reasonInDisplayUnits(micropitting!, 'us');
    // °F = 1.8 · 90 + 32 = 194.0 °F; 8.3 m/s / 0.3048 m/ft = 27.23 ft/s (NIST SP 811)
    expect(us.source).toContain('at 194.0 °F and 27.23 ft/s');
    expect(us.source).not.toMatch(/\d °C/);
    expect(us.text).toBe(inDisplayUnits(micropitting!.text, 'us'));
    expect(us.threshold).toBe(inDisplayUnits(micropitting!.threshold, 'us'));
  });
  it('no reason of the demo keeps a number in °C in US customary, and SI gives the reason back unchanged', () => {
    expect(reasons.length).toBeGreaterThan(3);
    for (const r of reasons) {
      const us = reasonInDisplayUnits(r, 'us');
      expect(`${us.text} ${us.threshold} ${us.source}`, r.rule).not.toMatch(/\d ?°C/);
      expect(reasonInDisplayUnits(r, 'si')).toEqual(r);
    }
  });
  it('a formula in a source stays as written: its °C is a unit of the formula, not a number to convert', () => {
    // ISO/TS 6336-20: θS = 80 + (0.85 + 1.4 XW) XL S² °C
    const scuffing = reasons.find((r) => r.source.includes('θS = 80'));
    expect(scuffing).toBeDefined();
    expect(reasonInDisplayUnits(scuffing!, 'us').source).toBe(scuffing!.source);
  });
});

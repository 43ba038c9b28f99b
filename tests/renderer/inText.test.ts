import { describe, expect, it } from 'vitest';
import { inDisplayUnits } from '../../renderer/units/inText';

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

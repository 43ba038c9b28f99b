/**
 * The grade finder's λ-only cell is the operating map's cell without its scuffing part: the same λmin,
 * bit for bit, at any temperature and load (the finder and the map see one film).
 */
import { describe, expect, it } from 'vitest';
import { cellLambdaMin, evaluateCell, prepareSweep, prepareSweepOil, type CellResult } from '../../../app/engine/sweep/operatingMap';
import { demoCaseInput, demoOils, demoPair } from './demoCase';

describe('cellLambdaMin', () => {
  it('equals evaluateCell’s λmin for every demo case and oil, over temperature and load', () => {
    const cell: CellResult = { lambdaMin: 0, scuffingSafety: 0, integralSafety: 0, verdict: 0, lambdaGFMin: 0, micropittingSafety: 0 };
    demoPair.loadCases.forEach((_, li) => {
      const sc = prepareSweep(demoCaseInput(li, -1));
      for (const oil of demoOils) {
        const so = prepareSweepOil(sc, oil);
        for (const t of [20, 55, 90]) for (const f of [0.3, 1, 1.6]) {
          const full = evaluateCell(sc, so, t, f, cell).lambdaMin;
          expect(Number.isFinite(full)).toBe(true);
          expect(cellLambdaMin(sc, oil.model, t, f)).toBe(full);
        }
      }
    });
  });
});

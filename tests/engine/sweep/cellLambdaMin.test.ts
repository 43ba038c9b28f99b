/**
 * The grade finder's λ-only cell is the operating map's cell without its scuffing part: the same λmin,
 * bit for bit, at any temperature and load (the finder and the map see one film).
 */
import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { gearPairGeometry } from '../../../app/engine/geometry/gearPair';
import { cellLambdaMin, evaluateCell, prepareSweep, prepareSweepOil, type CellResult } from '../../../app/engine/sweep/operatingMap';
import { micrometres } from '../../../app/engine/units';
import { parseReviewValue } from '../../../app/review/parse';
import { gearPairInput, materialOf } from '../../../app/review/toEngine';
import { engineDutyOf, enginePolicyOf } from '../../../app/review/engineInputs';
import { oilModelsOf } from '../../../app/review/oils';
import { asPairReview, type PairReview } from '../../../app/review/schema';

const p = parseReviewValue(JSON.parse(readFileSync('assets/demo/harrow-creek-crusher-hs-pair.flankfilm.json', 'utf8')));
if (!p.ok) throw new Error('demo invalid');
const r = asPairReview(p.review) as PairReview;

describe('cellLambdaMin', () => {
  it('equals evaluateCell’s λmin for every demo case and oil, over temperature and load', () => {
    const oils = oilModelsOf(r.oils);
    const cell: CellResult = { lambdaMin: 0, scuffingSafety: 0, integralSafety: 0, verdict: 0, lambdaGFMin: 0, micropittingSafety: 0 };
    r.loadCases.forEach((_, li) => {
      const sc = prepareSweep({
        geometry: gearPairGeometry(gearPairInput(r.gearPair)),
        pinion: materialOf(r.gearPair.pinion.material),
        wheel: materialOf(r.gearPair.wheel.material),
        roughnessRa1: micrometres(r.gearPair.pinion.roughnessRa_um),
        roughnessRa2: micrometres(r.gearPair.wheel.roughnessRa_um),
        duty: engineDutyOf(r, li),
        policy: enginePolicyOf(r.policy),
        caseField: `loadCases[${li}]`,
      });
      for (const oil of oils) {
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

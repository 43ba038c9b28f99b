/** The pair demo's load case `li` with oil `oi` (null: no oil) as the engine's case input, for the sweep checks. */
import { readFileSync } from 'node:fs';
import { gearPairGeometry } from '../../../app/engine/geometry/gearPair';
import { micrometres } from '../../../app/engine/units';
import { parseReviewValue } from '../../../app/review/parse';
import { gearPairInput, materialOf } from '../../../app/review/toEngine';
import { engineDutyOf, enginePolicyOf } from '../../../app/review/engineInputs';
import { oilModelsOf } from '../../../app/review/oils';
import { asPairReview, type PairReview } from '../../../app/review/schema';

const p = parseReviewValue(JSON.parse(readFileSync('assets/demo/harrow-creek-crusher-hs-pair.flankfilm.json', 'utf8')));
if (!p.ok) throw new Error('demo invalid');
export const demoPair = asPairReview(p.review) as PairReview;
export const demoOils = oilModelsOf(demoPair.oils);

export const demoCaseInput = (li: number, oi: number) => ({
  geometry: gearPairGeometry(gearPairInput(demoPair.gearPair)),
  pinion: materialOf(demoPair.gearPair.pinion.material),
  wheel: materialOf(demoPair.gearPair.wheel.material),
  roughnessRa1: micrometres(demoPair.gearPair.pinion.roughnessRa_um),
  roughnessRa2: micrometres(demoPair.gearPair.wheel.roughnessRa_um),
  duty: engineDutyOf(demoPair, li),
  oil: demoOils[oi] ?? null,
  policy: enginePolicyOf(demoPair.policy),
  caseField: `loadCases[${li}]`,
});

import { WarningSink, type EngineWarning } from '../engine/diagnostics';
import type { LineContactEhlInput } from '../engine/ehl/lineContactEhl';
import { dowsonHigginsonMinFilm } from '../engine/film/dowsonHigginson';
import { panHamrockFilm } from '../engine/film/panHamrock';
import { RQ_PER_RA_GAUSSIAN } from '../engine/film/specificFilm';
import { murchWilsonThermalFactor } from '../engine/film/thermalCorrection';
import { gearPairGeometry } from '../engine/geometry/gearPair';
import { emptyFlankVelocities, flankVelocities } from '../engine/kinematics/flankVelocities';
import { loadShare } from '../engine/load/loadSharing';
import { analyseCase } from '../engine/mesh/analyseCase';
import { hertzLinePressure, reducedRadius } from '../engine/stress/hertz';
import { kelvinToCelsius, micrometres, millimetres, toMegapascals, toMicrometres, toMillimetres, type Metres, type MetresPerSecond, type NewtonsPerMetre, type Pascals } from '../engine/units';
import { engineDutyOf, enginePolicyOf } from './engineInputs';
import { oilModelsOf } from './oils';
import { asPairReview, type Review } from './schema';
import { gearPairInput, materialOf } from './toEngine';

/** Where on the path: a characteristic point, the point of least λ, or a position from T1 in mm. */
export type EhlPointSpec = 'A' | 'B' | 'C' | 'D' | 'E' | 'lambda-min' | { readonly position_mm: number };

export interface EhlPointRequest {
  /** The load case's name. */
  readonly caseName: string;
  /** The oil's name; default the first oil of the review. */
  readonly oilName?: string;
  readonly at: EhlPointSpec;
}

/** Why a request cannot be met; `what` says which part of the request is wrong. */
export class EhlPointError extends Error {
  readonly what: 'case' | 'oil' | 'point';
  constructor(what: 'case' | 'oil' | 'point', message: string) {
    super(message);
    this.name = 'EhlPointError';
    this.what = what;
  }
}

/** The solver inputs at one point, with what the review's own film formula says there. */
export interface EhlPointSetup {
  readonly caseName: string;
  readonly oilName: string;
  /** The point in words, e.g. "C (pitch point)", "least λ", "12.40 mm from T1". */
  readonly pointLabel: string;
  readonly position_mm: number;
  /** The solver's input, SI: the oil at the bulk temperature θM, as run() takes the film. */
  readonly input: LineContactEhlInput;
  readonly filmTemperature_C: number;
  readonly hertzStress_MPa: number;
  readonly compositeRoughness_um: number;
  /** The review's formula (policy) at this point, with its thermal factor when the policy applies one. */
  readonly formulaName: string;
  readonly formulaHMin_um: number;
  readonly formulaHCentral_um: number;
  /** Murch–Wilson φT used by the review's film (1 when the policy does not correct). */
  readonly thermalFactor: number;
  readonly warnings: EngineWarning[];
}

const POINT_WORDS = { A: 'A (start of contact)', B: 'B (single-pair contact begins)', C: 'C (pitch point)', D: 'D (single-pair contact ends)', E: 'E (end of contact)' } as const;

/**
 * The inputs of the numerical EHL solver at one point of one load case with one oil, built the way
 * run() builds the path: the same geometry, materials, duty and policy conversions, the same case
 * analysis (which gives the bulk temperature θM and the oil at θM), and at the point the same engine
 * functions for load sharing, curvature and flank velocities. Throws EhlPointError for an unknown
 * case or oil or a point outside A–E, EngineInputError for a review the physics cannot take.
 */
export function ehlPointSetup(full: Review, req: EhlPointRequest): EhlPointSetup {
  const review = asPairReview(full);
  if (!review) throw new EhlPointError('case', 'Film detail solves a point of a gear pair; for a planetary stage it is not offered yet');
  const li = review.loadCases.findIndex((c) => c.name === req.caseName);
  if (li < 0) throw new EhlPointError('case', `no load case named "${req.caseName}"; the review has: ${review.loadCases.map((c) => `"${c.name}"`).join(', ')}`);
  const oils = oilModelsOf(review.oils);
  if (oils.length === 0) throw new EhlPointError('oil', 'the review has no oils: a film needs an oil');
  const oil = req.oilName === undefined ? oils[0] : oils.find((o) => o.name === req.oilName);
  if (!oil) throw new EhlPointError('oil', `no oil named "${req.oilName ?? ''}"; the review has: ${oils.map((o) => `"${o.name}"`).join(', ')}`);
  const geometry = gearPairGeometry(gearPairInput(review.gearPair));
  const pinion = materialOf(review.gearPair.pinion.material);
  const wheel = materialOf(review.gearPair.wheel.material);
  const roughnessRa1 = micrometres(review.gearPair.pinion.roughnessRa_um);
  const roughnessRa2 = micrometres(review.gearPair.wheel.roughnessRa_um);
  const policy = enginePolicyOf(review.policy);
  const duty = engineDutyOf(review, li);
  const a = analyseCase({ geometry, pinion, wheel, roughnessRa1, roughnessRa2, duty, oil, policy, caseField: `loadCases[${li}]` });
  const state = a.oilAtFilmTemperature as NonNullable<typeof a.oilAtFilmTemperature>;
  const film = a.film as NonNullable<typeof a.film>;
  const m = a.mechanics;
  const pts = geometry.points;

  let s: number;
  let label: string;
  const at = req.at;
  if (typeof at === 'object') {
    const lo = toMillimetres(pts.A), hi = toMillimetres(pts.E);
    if (!Number.isFinite(at.position_mm) || at.position_mm < lo || at.position_mm > hi) {
      throw new EhlPointError('point', `position ${String(at.position_mm)} mm is outside the path of contact A–E (${lo.toFixed(2)}…${hi.toFixed(2)} mm from T1)`);
    }
    s = millimetres(at.position_mm);
    label = `${at.position_mm.toFixed(2)} mm from T1`;
  } else if (at === 'lambda-min') {
    s = m.position[film.lambdaMinIndex] as number;
    label = `least λ (${toMillimetres(s as Metres).toFixed(2)} mm from T1)`;
  } else {
    s = pts[at];
    if (s < pts.A || s > pts.E) throw new EhlPointError('point', `point ${at} lies outside the path of contact A–E on this gear pair`);
    label = POINT_WORDS[at];
  }

  // The load, curvature and speed at s, as meshMechanics() composes them along the path.
  const cosBb = Math.cos(geometry.baseHelixAngle);
  const w = (loadShare(s as Metres, pts, geometry.transverseContactRatio, geometry.overlapRatio) * m.unitLoad) as NewtonsPerMetre;
  const R = reducedRadius((s / cosBb) as Metres, ((geometry.lineOfAction - s) / cosBb) as Metres);
  const fv = flankVelocities(s as Metres, geometry.lineOfAction, m.pinionAngularSpeed, m.wheelAngularSpeed, emptyFlankVelocities());
  const uMean = (fv.sum / 2) as MetresPerSecond;
  const ePrime = (2 * m.contactModulus) as Pascals; // Hamrock convention, as mesh/film.ts uses
  const input: LineContactEhlInput = { eta0: state.dynamicViscosity, alpha: state.pressureViscosity, uMean, radius: R, loadPerLength: w, eReduced: ePrime };

  const sink = new WarningSink();
  const phi = policy.thermalFilmCorrection ? murchWilsonThermalFactor(state.temperatureViscosity, state.dynamicViscosity, uMean, undefined, sink) : 1;
  const ph = panHamrockFilm(input.eta0, input.alpha, uMean, R, w, ePrime, sink);
  const hMin = policy.filmFormula === 'dowson-higginson' ? dowsonHigginsonMinFilm(input.eta0, input.alpha, uMean, R, w, ePrime, sink) : ph.hMin;
  const sigma = RQ_PER_RA_GAUSSIAN * Math.sqrt(roughnessRa1 * roughnessRa1 + roughnessRa2 * roughnessRa2);
  return {
    caseName: review.loadCases[li]?.name ?? req.caseName,
    oilName: oil.name,
    pointLabel: label,
    position_mm: toMillimetres(s as Metres),
    input,
    filmTemperature_C: kelvinToCelsius(state.temperature),
    hertzStress_MPa: toMegapascals(hertzLinePressure(w, R, m.contactModulus)),
    compositeRoughness_um: toMicrometres(sigma as Metres),
    formulaName: film.formula,
    formulaHMin_um: toMicrometres((hMin * phi) as Metres),
    formulaHCentral_um: toMicrometres((ph.hCentral * phi) as Metres),
    thermalFactor: phi,
    warnings: sink.items,
  };
}

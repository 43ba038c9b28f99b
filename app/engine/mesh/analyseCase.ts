import { WarningSink, type EngineWarning } from '../diagnostics';
import { meshMechanics, type MeshMechanics } from './mechanics';
import { HEAT_COLUMNS, temperaturesAlongPath, type TemperaturesAlongPath } from './temperatures';
import { FILM_COLUMNS, filmAlongPath, type FilmAlongPath } from './film';
import { ColumnBlock } from '../columnBlock';
import { scuffingAssessment, type ScuffingAssessment } from './scuffing';
import { micropittingAssessment, type MicropittingAssessment } from './micropitting';
import { oilState, type OilState } from './oilState';
import type { CaseInput } from './types';
import type { KelvinDifference } from '../units';

export { oilState, type OilState };

export interface CaseAnalysis {
  readonly input: CaseInput;
  readonly mechanics: MeshMechanics;
  /** Null when the review has no oil. */
  readonly heat: TemperaturesAlongPath | null;
  readonly film: FilmAlongPath | null;
  /** The oil at the temperature the film is computed at (the bulk temperature θM). */
  readonly oilAtFilmTemperature: OilState | null;
  readonly scuffing: ScuffingAssessment | null;
  /** Micropitting by ISO/TS 6336-22 (null without an oil). */
  readonly micropitting: MicropittingAssessment | null;
  readonly warnings: EngineWarning[];
}

/**
 * One load case with one oil, along the whole path of contact:
 * mechanics (geometry, kinematics, XΓ, Hertz) → friction and Blok flash temperature → bulk
 * temperature θM → oil at θM → EHL film, λ and regime → scuffing safety (flash and integral
 * temperature methods) and the FZG stage the duty needs → micropitting (ISO/TS 6336-22).
 * The film is computed at θM, the flank temperature at the contact inlet (as ISO/TR 15144-1 and
 * AGMA 925 do), so it sees the heat of the mesh; friction uses the oil temperature (ISO/TS 6336-20).
 * `shared`: the case's mechanics (caseMechanics) when several oils run on the same load case.
 */
export function analyseCase(input: CaseInput, shared?: MeshMechanics): CaseAnalysis {
  const sink = new WarningSink();
  const mechanics = shared ?? caseMechanics(input);
  const oil = input.oil;
  if (!oil) return { input, mechanics, heat: null, film: null, oilAtFilmTemperature: null, scuffing: null, micropitting: null, warnings: sink.items };
  const tField = `${input.caseField}.oilTemperature_C`;
  // The heat's and the film's columns from one buffer (heat first: the film's Uint8 column goes last).
  const block = new ColumnBlock(mechanics.n, HEAT_COLUMNS + FILM_COLUMNS.float64, FILM_COLUMNS.uint8);
  const heat = temperaturesAlongPath(input, mechanics, sink, block);
  // A bulk temperature past the oil model's range means the duty is far beyond scuffing anyway; the
  // film is then taken at the top of the range (thicker than it would be) and the reason is said.
  const tMax = oil.model.temperatureRange.max;
  const tFilm = heat.bulkTemperature > tMax ? tMax : heat.bulkTemperature;
  if (tFilm !== heat.bulkTemperature) {
    sink.add({
      code: 'film.bulk-temperature-above-oil-range',
      severity: 'warning',
      field: tField,
      message: `The bulk temperature θM = ${(heat.bulkTemperature - 273.15).toFixed(0)} °C is above the ${(tMax - 273.15).toFixed(0)} °C the oil model covers: the film is computed at ${(tMax - 273.15).toFixed(0)} °C, so λ is overstated; the duty is far beyond the oil's scuffing limit.`,
    });
  }
  const state = oilState(input, tFilm, tField);
  const film = filmAlongPath(input, mechanics, state, sink, block);
  const scuffing = scuffingAssessment(input, mechanics, heat, sink);
  const micropitting = micropittingAssessment(input, mechanics, film, sink);
  for (const w of oil.model.warnings) sink.add(w);
  return { input, mechanics, heat, film, oilAtFilmTemperature: state, scuffing, micropitting, warnings: sink.items };
}


/**
 * The mechanics of a case: they depend on the geometry, the materials, the duty and the path points,
 * not on the oil, so a review computes them once per load case and passes them to analyseCase for
 * each oil (they are read, never written).
 */
export function caseMechanics(input: Omit<CaseInput, 'oil'>): MeshMechanics {
  return meshMechanics(input.geometry, input.pinion, input.wheel, input.duty, input.policy.pathPoints);
}

export type { KelvinDifference };

/**
 * The results of a fleet consolidation, as `runFleet()` returns them and `flankfilm fleet --json`
 * prints them. Gearboxes and oils are referred to by name; codes stay codes (the words are in
 * words.ts).
 */
import type { BaseOil, Chemistry } from '../engine/oil/types';
import type { Shortfall, VerdictCode } from '../review/results';

/** What an oil falls short on for a gearbox: the verdict's shortfalls, or a verdict no oil can meet. */
export type FleetShortfall = Shortfall | 'beyond-oil' | 'not-computed';

export interface FleetGearbox {
  /** The review's title (made unique within the fleet with its id, then a number). */
  name: string;
  title: string;
  id: string | null;
  /** Where the review came from, as the caller named it (the CLI: the path given). */
  source: string;
  /** The review's in-service oil, if it has one. */
  currentOil: string | null;
  /** The candidate that is that oil (same name, or the same data sheet), if any. */
  currentCandidate: string | null;
  /** Parts that change the cautions: yellow metals, backstops … (the review's components). */
  components: string[];
}

export interface FleetOil {
  name: string;
  chemistry: Chemistry;
  baseOil: BaseOil;
  isoVG: number | null;
  fzgFailureStage: number | '>12';
  ep: boolean;
}

export interface FitCell {
  gearbox: string;
  oil: string;
  /** The oil's overall verdict, run under the gearbox's own policy, meets the gearbox's need. */
  meets: boolean;
  shortfalls: FleetShortfall[];
  /** The load case that governs the verdict (null when it could not be computed). */
  governingCase: string | null;
  code: VerdictCode | null;
  /** Time-share-weighted fraction of the duty the oil meets. */
  dutyShareMet: number;
  /** The least ratio of a figure to its policy limit (SB/SB,min, SintS/SintS,min, λmin/target). */
  worstRatio: number | null;
  /** One sentence in words. */
  summary: string;
}

export interface FleetAssignment {
  gearbox: string;
  oil: string;
  keepsCurrent: boolean;
}

export interface FleetUnserved {
  gearbox: string;
  /** The candidate that comes closest (fewest shortfalls, most duty met, best worst ratio). */
  closest: string | null;
  shortfalls: FleetShortfall[];
  summary: string;
}

export interface FleetFailure {
  source: string;
  message: string;
}

export interface FleetCaution {
  id: 'mixing' | 'flushing' | 'yellow-metals' | 'backstops' | 'defer';
  text: string;
  applies: boolean;
  gearboxes: string[];
}

export interface FleetResult {
  flankfilm: string;
  gearboxes: FleetGearbox[];
  oils: FleetOil[];
  fit: FitCell[];
  /** Names of the smallest set of candidate oils that serves every gearbox that any candidate serves. */
  cover: string[];
  /** True when the search finished, so the set is proven smallest; false for a budget-limited search. */
  coverExact: boolean;
  coverCost: { oils: number; epOils: number; grades: number };
  assignment: FleetAssignment[];
  unserved: FleetUnserved[];
  /** Reviews that could not be read or computed; they are left out, the others go on. */
  failed: FleetFailure[];
  cautions: FleetCaution[];
}

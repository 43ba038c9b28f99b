import { REVIEW_FORMAT, REVIEW_VERSION } from '../../app/review/schema';
import type { Draft } from './reviewState';

/** A new load case: copies the last one so the user changes only what differs. */
export function newLoadCase(previous: unknown, count: number): Record<string, unknown> {
  // Copying the last case keeps the gear set's keys (pinion or sun speed and torque).
  const base = previous && typeof previous === 'object' ? { ...(previous as Record<string, unknown>) } : { pinionSpeed_rpm: 1500, pinionTorque_Nm: 500, applicationFactor: 1, oilTemperature_C: 60, lubrication: 'dip', timeShare: 1 };
  return { ...base, name: `Load case ${count + 1}` };
}

/** A new candidate oil: copies the last one, renamed, as a candidate. */
export function newOil(previous: unknown, count: number): Record<string, unknown> {
  const base = previous && typeof previous === 'object'
    ? { ...(previous as Record<string, unknown>) }
    : { kv40_mm2s: 220, kv100_mm2s: 19, density15_kgm3: 885, baseOil: 'mineral', chemistry: 'anti-wear', fzgFailureStage: 10 };
  return { ...base, name: `Candidate oil ${count + 1}`, role: 'candidate' };
}

/** The "new" command: a blank-but-valid review the user fills in (all values to be replaced). */
export function newReviewDraft(): Draft {
  return {
    format: REVIEW_FORMAT,
    version: REVIEW_VERSION,
    title: 'New review',
    revision: 0,
    displayUnits: 'si',
    gearPair: {
      normalModule_mm: 4,
      normalPressureAngle_deg: 20,
      helixAngle_deg: 0,
      faceWidth_mm: 50,
      pinion: { teeth: 20, roughnessRa_um: 0.8, material: 'steel-carburized' },
      wheel: { teeth: 60, roughnessRa_um: 0.8, material: 'steel-carburized' },
      components: [],
    },
    loadCases: [newLoadCase(null, 0)],
    oils: [newOil(null, 0)],
  };
}

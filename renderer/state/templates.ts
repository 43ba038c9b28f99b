import { newCase, newReview, type TemplateKind } from '../../app/review/templates';
import type { Draft } from './reviewState';

/**
 * A new load case. It keeps what belongs to the machine (the last case's speed, oil temperature and
 * lubrication) and leaves the load to be entered, so it never computes as a silent copy. Its share
 * of time is what the other cases leave over, or left to be entered if they already fill it.
 */
export function newLoadCase(previous: unknown, cases: readonly unknown[]): Record<string, unknown> {
  const base = newCase(cases.length + 1);
  const last = previous && typeof previous === 'object' ? (previous as Record<string, unknown>) : {};
  const kept: Record<string, unknown> = {};
  // The gear set's speed key comes along: the pinion's on a pair, the sun's or carrier's on a planetary stage.
  for (const key of ['pinionSpeed_rpm', 'sunSpeed_rpm', 'carrierSpeed_rpm', 'oilTemperature_C', 'lubrication', 'applicationFactor']) if (last[key] !== undefined) kept[key] = last[key];
  const used = cases.reduce<number>((sum, c) => sum + (c && typeof c === 'object' && typeof (c as { timeShare?: unknown }).timeShare === 'number' ? (c as { timeShare: number }).timeShare : 0), 0);
  const left = Math.round((1 - used) * 1000) / 1000;
  const { timeShare: _unused, ...rest } = base;
  void _unused;
  return { ...rest, ...kept, ...(left > 0 && left <= 1 ? { timeShare: left } : {}) };
}

/** A new candidate oil: copies the last one, renamed, as a candidate. */
export function newOil(previous: unknown, count: number): Record<string, unknown> {
  const base = previous && typeof previous === 'object'
    ? { ...(previous as Record<string, unknown>) }
    : { baseOil: 'mineral' };
  return { ...base, name: `Candidate oil ${count + 1}`, role: 'candidate' };
}

/** The "New review" command: an unfilled review from a template (app/review/templates.ts). */
export function newReviewDraft(kind: TemplateKind = 'spur'): Draft {
  return newReview(kind);
}

import { CAUTION_TITLES } from '../engine/verdict/cautions';
import type { CaseResult, CautionSummary } from './results';

/**
 * Every caution once, with the cases and oils it applies to: those the inputs trigger first (in
 * the engine's order), then the standing ones that do not apply here. A caution whose text names
 * a case figure (the sump temperature) takes the text of the first case it applies to.
 */
export function cautionSummary(cases: readonly CaseResult[]): CautionSummary[] {
  const byId = new Map<string, CautionSummary>();
  for (const c of cases) {
    for (const k of c.verdict?.cautions ?? []) {
      const applies = k.kind === 'triggered';
      const entry = byId.get(k.id) ?? { id: k.id, title: CAUTION_TITLES[k.id] ?? k.id, text: k.text, applies: false, appliesTo: [] };
      if (applies) {
        if (!entry.applies) entry.text = k.text;
        entry.applies = true;
        entry.appliesTo.push({ loadCase: c.loadCase, oil: c.oil ?? '' });
      }
      byId.set(k.id, entry);
    }
  }
  const all = [...byId.values()];
  return [...all.filter((k) => k.applies), ...all.filter((k) => !k.applies)];
}

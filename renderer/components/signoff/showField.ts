import type { InputChange } from '../../../app/review/audit/diff';
import type { InputPanel } from '../../../app/review/inputLabels';

const PANEL_IDS: Readonly<Record<InputPanel, string | null>> = { 'Gear set': 'gear-pair', Duty: 'duty', Oils: 'oils', Policy: 'policy', 'Record details': null };
const ITEM_IDS: Readonly<Record<string, string>> = { loadCases: 'load-case', oils: 'oil' };

/** The element that shows a change on the sheet: its field, else its load case or oil, else its panel. */
export function elementOf(change: InputChange): HTMLElement | null {
  if (change.kind === 'changed') {
    const el = document.querySelector<HTMLElement>(`[data-path="${CSS.escape(change.path)}"]`) ?? document.querySelector<HTMLElement>(`[data-path^="${CSS.escape(`${change.path}.`)}"]`);
    if (el) return el;
  }
  const [list, index] = change.segments;
  if (change.kind !== 'removed' && typeof index === 'number' && typeof list === 'string' && ITEM_IDS[list]) {
    const item = document.querySelector<HTMLElement>(`[data-testid="${ITEM_IDS[list]}-${index}"]`);
    if (item) return item;
  }
  const panel = PANEL_IDS[change.panel];
  return panel ? document.getElementById(panel) : null;
}

/** Whether the sheet has somewhere to show a change (the review's id, date and notes have no field). */
export const canShow = (change: InputChange): boolean => PANEL_IDS[change.panel] !== null;

/** Scroll to the change's field, focus it and highlight it for a moment. */
export function showField(change: InputChange): void {
  const el = elementOf(change);
  if (!el) return;
  el.scrollIntoView({ block: 'center' });
  const target = el.closest<HTMLElement>('.field, fieldset, .check, section') ?? el;
  target.classList.add('is-shown');
  window.setTimeout(() => target.classList.remove('is-shown'), 2500);
  if (el instanceof HTMLInputElement || el instanceof HTMLSelectElement || el instanceof HTMLTextAreaElement) el.focus({ preventScroll: true });
}

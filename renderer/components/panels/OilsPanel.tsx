import type { OilSummary } from '../../../app/review/results';
import { useDraftSelect, useSheet } from '../../state/context';
import { getIn } from '../../state/paths';
import { newOil } from '../../state/templates';
import { OilEditor } from './OilEditor';
import { Panel } from './Panel';

/** Candidate oils with their data-sheet values and what Flankfilm derives from them. */
export function OilsPanel({ summaries }: { readonly summaries: readonly OilSummary[] }) {
  const { store, dispatch } = useSheet();
  const count = useDraftSelect((d) => ((getIn(d, ['oils']) as unknown[] | undefined) ?? []).length);
  const add = () => {
    const oils = (store.valueAt(['oils']) as unknown[] | undefined) ?? [];
    dispatch({ type: 'addItem', list: 'oils', item: newOil(oils[oils.length - 1], oils.length) });
  };
  return (
    <Panel
      id="oils"
      title="Oils"
      actions={
        <button type="button" disabled={count >= 10} onClick={add}>
          Add oil
        </button>
      }
    >
      {count === 0 ? <p className="note">No oil yet: the mesh is computed without film or scuffing figures.</p> : null}
      {Array.from({ length: count }, (_, i) => (
        <OilEditor key={i} index={i} summary={summaries[i] ?? null} />
      ))}
    </Panel>
  );
}

import type { OilSummary } from '../../../app/review/results';
import { useSheet } from '../../state/context';
import { getIn } from '../../state/paths';
import { newOil } from '../../state/templates';
import { OilEditor } from './OilEditor';
import { Panel } from './Panel';

/** Candidate oils with their data-sheet values and what Flankfilm derives from them. */
export function OilsPanel({ summaries }: { readonly summaries: readonly OilSummary[] }) {
  const { draft, dispatch } = useSheet();
  const oils = (getIn(draft, ['oils']) as unknown[] | undefined) ?? [];
  return (
    <Panel
      id="oils"
      title="Oils"
      actions={
        <button type="button" disabled={oils.length >= 10} onClick={() => dispatch({ type: 'addItem', list: 'oils', item: newOil(oils[oils.length - 1], oils.length) })}>
          Add oil
        </button>
      }
    >
      {oils.length === 0 ? <p className="note">No oil yet: the mesh is computed without film or scuffing figures.</p> : null}
      {oils.map((_, i) => (
        <OilEditor key={i} index={i} summary={summaries[i] ?? null} />
      ))}
    </Panel>
  );
}

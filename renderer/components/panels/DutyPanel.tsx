import { useSheet } from '../../state/context';
import { getIn } from '../../state/paths';
import { newLoadCase } from '../../state/templates';
import { LoadCaseEditor } from './LoadCaseEditor';
import { Panel } from './Panel';

/** The load cases of the duty. */
export function DutyPanel() {
  const { draft, dispatch } = useSheet();
  const cases = (getIn(draft, ['loadCases']) as unknown[] | undefined) ?? [];
  return (
    <Panel
      id="duty"
      title="Duty"
      actions={
        <button type="button" disabled={cases.length >= 20} onClick={() => dispatch({ type: 'addItem', list: 'loadCases', item: newLoadCase(cases[cases.length - 1], cases.length) })}>
          Add load case
        </button>
      }
    >
      {cases.map((_, i) => (
        <LoadCaseEditor key={i} index={i} canRemove={cases.length > 1} />
      ))}
    </Panel>
  );
}

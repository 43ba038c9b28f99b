import { memo } from 'react';
import { useSheet } from '../../state/context';
import { NumberField } from '../fields/NumberField';
import { TextField } from '../fields/TextField';
import { Panel } from './Panel';

/** Today's date as ISO 8601 (yyyy-mm-dd), on the local calendar. */
export function todayIso(now = new Date()): string {
  const two = (n: number) => String(n).padStart(2, '0');
  return `${now.getFullYear()}-${two(now.getMonth() + 1)}-${two(now.getDate())}`;
}

/** The record's own identity: title, review id, revision, date and notes (the record's cover and file name use them). */
function RecordPanelView() {
  const { dispatch } = useSheet();
  return (
    <Panel
      id="record-details"
      title="Record details"
      actions={
        <button type="button" onClick={() => dispatch({ type: 'set', path: ['date'], value: todayIso() })}>
          Date: today
        </button>
      }
    >
      <div className="grid-fields">
        <TextField path={['title']} label="Review title" wide />
        <TextField path={['id']} label="Review id" optional placeholder="e.g. your plant's job number" note="Names the exported record and CSV files" />
        <NumberField path={['revision']} label="Revision" />
        <TextField path={['date']} label="Date" optional placeholder="yyyy-mm-dd" note="ISO 8601, e.g. 2026-12-02" />
        <TextField path={['notes']} label="Notes" optional wide multiline />
      </div>
    </Panel>
  );
}

/** Inputs only: re-renders with the units (the sheet's context), not on edits (each input follows its own value) or when results arrive. */
export const RecordPanel = memo(RecordPanelView);

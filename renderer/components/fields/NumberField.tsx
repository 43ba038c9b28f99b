import { memo, useEffect, useRef, useState, type KeyboardEvent } from 'react';
import { useDraftValue, useFieldMessages, useSheet } from '../../state/context';
import { pathKey, type FieldPath } from '../../state/paths';
import { formatInput, parseInput } from '../../units/format';
import { fromDisplay, toDisplay, unitLabel, type QuantityKind } from '../../units/units';
import { FieldShell, fieldId } from './FieldShell';
import { sameFieldProps } from './sameProps';

interface Props {
  readonly path: FieldPath;
  readonly label: string;
  readonly kind?: QuantityKind;
  /** A unit outside the switchable kinds (rpm, °, GPa …). */
  readonly unit?: string;
  /** Empty removes the key (an optional input). */
  readonly optional?: boolean;
  readonly hint?: string;
  /** The value shown when the draft has none at `path` (a derived value, say). */
  readonly value?: number | undefined;
  /** Instead of setting `path`: what to do with the typed value (file units), e.g. torque-or-power. */
  readonly onValue?: (value: unknown) => void;
  /** Shown from another input (power from torque): empty is not "required" here. */
  readonly derived?: boolean;
  /** A short remark under the control. */
  readonly note?: string;
}

/** The pause after the last keystroke at which a typed value is taken (Enter and leaving the field take it at once). */
export const ENTRY_PAUSE_MS = 600;

const close = (a: number, b: number) => Math.abs(a - b) <= 1e-12 * Math.max(Math.abs(a), Math.abs(b), 1e-300);

/**
 * A number input in the chosen unit system. The text typed is kept while the user types and goes
 * into the draft (in file units) only on a pause, Enter or leaving the field, so the results never
 * belong to a keystroke on the way ("16" on the way to "160"); meanwhile the sheet shows
 * "computing". Text that is not a number goes into the draft as text, so the schema marks the
 * field and the last valid results stay on screen. It re-renders when its props, its value or its
 * messages change (or the units), not on every edit of the sheet.
 */
export const NumberField = memo(function NumberField({ path, label, kind = 'none', unit, optional, hint, value, onValue, derived, note }: Props) {
  const { units, dispatch, pending } = useSheet();
  const key = pathKey(path);
  const id = fieldId(key);
  const stored = useDraftValue(path);
  const fromStore = useFieldMessages(path);
  const current = typeof stored === 'number' ? stored : value;
  // A derived value (power from torque) is a readout until typed over: six digits are plenty.
  const display = (v: number) => (typeof stored === 'number' || !derived ? formatInput(v) : formatInput(Number(v.toPrecision(6))));
  const shown = current === undefined ? '' : display(toDisplay(kind, current, units));
  const [text, setText] = useState(typeof stored === 'string' ? stored : shown);
  const last = useRef({ units, current });
  const timer = useRef<ReturnType<typeof setTimeout> | null>(null);
  const waiting = useRef<string | null>(null);

  // Follow the draft when it changes from elsewhere (open, undo of a unit switch), not while typing it.
  useEffect(() => {
    if (waiting.current !== null) return;
    const typed = parseInput(text);
    const typedValue = Number.isNaN(typed) ? undefined : fromDisplay(kind, typed, units);
    const sameValue = current === undefined ? typeof stored === 'string' || (optional && text.trim() === '') : typedValue !== undefined && close(typedValue, current);
    if (last.current.units !== units || !sameValue) setText(typeof stored === 'string' ? stored : shown);
    last.current = { units, current };
  }, [current, units, shown, stored, kind, optional, text]);

  const commit = (next: string) => {
    if (timer.current) clearTimeout(timer.current);
    timer.current = null;
    if (waiting.current === null) return;
    waiting.current = null;
    pending(key, false);
    // Start of the edit-to-chart latency (tests/e2e/bench.ts measures it to 'chart-updated').
    performance.mark('edit');
    const n = parseInput(next);
    const v = next.trim() === '' && optional ? undefined : Number.isNaN(n) ? next : fromDisplay(kind, n, units);
    if (onValue) onValue(v);
    else dispatch({ type: 'set', path, value: v });
  };
  const commitRef = useRef(commit);
  commitRef.current = commit;
  // Leaving the sheet with a value still waiting: take it rather than lose it.
  useEffect(() => () => {
    if (waiting.current !== null) commitRef.current(waiting.current);
  }, []);

  const typed = (next: string) => {
    setText(next);
    if (waiting.current === null) pending(key, true);
    waiting.current = next;
    if (timer.current) clearTimeout(timer.current);
    timer.current = setTimeout(() => commitRef.current(next), ENTRY_PAUSE_MS);
  };
  const onKeyDown = (e: KeyboardEvent<HTMLInputElement>) => {
    if (e.key === 'Enter' && waiting.current !== null) commit(waiting.current);
  };

  const local = text.trim() !== '' && Number.isNaN(parseInput(text)) ? ['enter a number'] : text.trim() === '' && !optional && !derived ? ['required'] : [];
  const messages = local.length ? local : fromStore;
  const unitText = unit ?? unitLabel(kind, units);
  return (
    <FieldShell id={id} label={label} unit={unitText} messages={messages} hint={hint} note={note}>
      <input
        id={id}
        className="field__input"
        type="text"
        inputMode="decimal"
        autoComplete="off"
        spellCheck={false}
        value={text}
        data-path={key}
        aria-invalid={messages.length > 0}
        aria-describedby={messages.length ? `${id}-msg` : note ? `${id}-note` : undefined}
        aria-label={unitText ? `${label} (${unitText})` : label}
        placeholder={optional ? 'optional' : undefined}
        onChange={(e) => typed(e.target.value)}
        onKeyDown={onKeyDown}
        onBlur={() => {
          if (waiting.current !== null) commit(waiting.current);
        }}
      />
    </FieldShell>
  );
}, sameFieldProps);

import { parseReviewValue, type ReviewIssue } from '../../app/review/parse';
import type { Review } from '../../app/review/schema';
import type { RecomputeFailure } from '../worker/protocol';
import { lookupMessages, messagesByPath } from './messages';
import { getIn, pathKey, type FieldPath } from './paths';
import { docReducer, initialDocState, type DocAction, type DocState, type Draft } from './reviewState';

type Listener = () => void;

/** The draft as a valid review, or its issues. */
export interface Parsed {
  readonly review: Review | null;
  readonly issues: readonly ReviewIssue[];
}

/** One empty list for every valid draft and every field without a message, so nothing changes identity for nothing. */
const NO_ISSUES: readonly ReviewIssue[] = [];
const NO_MESSAGES: readonly string[] = [];
const NOT_PARSED: Parsed = { review: null, issues: NO_ISSUES };

const sameStrings = (a: readonly string[], b: readonly string[]) => a === b || (a.length === b.length && a.every((s, i) => s === b[i]));

function parse(draft: Draft | null): Parsed {
  if (!draft) return NOT_PARSED;
  const p = parseReviewValue(draft);
  return p.ok ? { review: p.review, issues: NO_ISSUES } : { review: null, issues: p.issues };
}

/**
 * The review being edited, outside React, so that an edit re-renders only what it changes: the
 * sheet as a whole subscribes to the document (`subscribe`, `getState`), each input to its own
 * path (`subscribeField`, `valueAt`, `messagesAt`) and is told only when its value or its messages
 * change. Edits go through the pure docReducer; the draft is validated by the file's schema once
 * per edit (a few kB: well under a millisecond). Snapshots are stable (the same value, the same
 * messages array) until they change, as useSyncExternalStore needs.
 */
export class DocStore {
  private state: DocState = initialDocState;
  private parsed: Parsed = NOT_PARSED;
  private engineError: RecomputeFailure | null = null;
  private messages: ReadonlyMap<string, readonly string[]> = new Map();
  /** The messages last handed out per field: the same array while their words are the same. */
  private readonly shown = new Map<string, readonly string[]>();
  private readonly everyChange = new Set<Listener>();
  private readonly fields = new Map<string, { readonly path: FieldPath; readonly listeners: Set<Listener> }>();

  readonly getState = (): DocState => this.state;
  readonly getParsed = (): Parsed => this.parsed;
  /** The parse of a draft: the store's own, or (a state a render still holds) parsed afresh. */
  parsedOf(draft: Draft | null): Parsed {
    return draft === this.state.draft ? this.parsed : parse(draft);
  }

  /** Apply an edit; returns the new state (the same object when the edit changed nothing). */
  dispatch(action: DocAction): DocState {
    const next = docReducer(this.state, action);
    if (next === this.state) return next;
    const before = { draft: this.state.draft, messages: this.messages };
    this.state = next;
    if (next.draft !== before.draft) {
      this.parsed = parse(next.draft);
      this.messages = this.messagesNow();
    }
    this.changed(before);
    return next;
  }

  /**
   * run()'s refusal of the newest valid edition, shown at its field (null: none). Shown only while
   * the draft is valid, as the sheet's list of problems does.
   */
  setEngineError(error: RecomputeFailure | null): void {
    if (error === this.engineError) return;
    const before = { draft: this.state.draft, messages: this.messages };
    this.engineError = error;
    this.messages = this.messagesNow();
    this.changed(before);
  }

  readonly subscribe = (listener: Listener): (() => void) => {
    this.everyChange.add(listener);
    return () => this.everyChange.delete(listener);
  };

  subscribeField(path: FieldPath, listener: Listener): () => void {
    const key = pathKey(path);
    let entry = this.fields.get(key);
    if (!entry) {
      entry = { path, listeners: new Set() };
      this.fields.set(key, entry);
    }
    const listeners = entry.listeners;
    listeners.add(listener);
    return () => {
      listeners.delete(listener);
      if (!listeners.size && this.fields.get(key)?.listeners === listeners) this.fields.delete(key);
    };
  }

  valueAt(path: FieldPath): unknown {
    return getIn(this.state.draft, path);
  }

  /** The messages of a field by its dotted path; the same array as last time while the words are the same. */
  messagesAt(key: string): readonly string[] {
    const now = lookupMessages(this.messages, key);
    const last = this.shown.get(key);
    if (last && sameStrings(last, now)) return last;
    const next = now.length ? now : NO_MESSAGES;
    if (next === NO_MESSAGES) this.shown.delete(key);
    else this.shown.set(key, next);
    return next;
  }

  private messagesNow(): ReadonlyMap<string, readonly string[]> {
    return messagesByPath(this.parsed.issues, this.parsed.review ? this.engineError : null);
  }

  /** Tell the document's subscribers, and the fields whose value or messages are not what they were. */
  private changed(before: { draft: Draft | null; messages: ReadonlyMap<string, readonly string[]> }): void {
    const told: Listener[] = [...this.everyChange];
    for (const [key, { path, listeners }] of this.fields) {
      const moved = !Object.is(getIn(before.draft, path), getIn(this.state.draft, path)) || !sameStrings(lookupMessages(before.messages, key), lookupMessages(this.messages, key));
      if (moved) told.push(...listeners);
    }
    for (const l of told) l();
  }
}

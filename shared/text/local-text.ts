import * as Y from 'yjs';

import { initialTextState } from './initial-text-state';
import { replaceText } from './replace-text';
import { loadTextDoc, textOf } from './text-doc';
import { textUpdateProblem } from './text-update-problem';
import { decodeTextBytes, encodeTextBytes, isTextUpdateValue, type TextUpdateValue } from './text-value';

/** A mergeable text as a device keeps it: the text shown and, once it has one, its Yjs state. */
export interface LocalText {
  /** base64 Yjs state; absent for a text saved before texts became mergeable. */
  readonly state?: string;
  readonly text?: string | null;
}

/** A local edit's outcome: the new text and state to keep, and the update to push. */
export interface TextWrite {
  readonly text: string;
  readonly state: string;
  readonly update: string;
}

/**
 * The state a device's text has: its stored state, or — for a text kept from before texts were
 * mergeable — the deterministic initial state of its plain text (the client-side migration).
 */
export function localTextState(name: string, local: LocalText): Uint8Array {
  return (local.state && decodeTextBytes(local.state)) || initialTextState(name, local.text ?? '');
}

/**
 * Applies a local edit to a text: a whole new text (from a plain form field; only the changed
 * characters become an edit) or a Yjs update (from an editor bound to the document). The update
 * to push also carries the initial state when the text had none yet, so the server receives
 * everything the edit builds on. Returns a reason instead when the edit cannot be kept.
 */
export function writeLocalText(name: string, local: LocalText, value: string | null | TextUpdateValue, maxLength: number): TextWrite | { readonly problem: string } {
  const base = localTextState(name, local);
  const doc = loadTextDoc([base]);
  const updates: Uint8Array[] = local.state ? [] : [base];
  doc.on('update', (update: Uint8Array) => updates.push(update));
  if (isTextUpdateValue(value)) {
    const bytes = decodeTextBytes(value.yjs);
    const problem = bytes ? textUpdateProblem(name, bytes) : 'is not base64';
    if (problem || !bytes) return { problem: problem ?? 'is not base64' };
    Y.applyUpdate(doc, bytes);
  } else {
    replaceText(doc.getText(name), value ?? '');
  }
  const text = textOf(doc, name);
  if (text.length > maxLength) return { problem: `must be at most ${maxLength} characters` };
  return {
    text,
    state: encodeTextBytes(Y.encodeStateAsUpdate(doc)),
    update: encodeTextBytes(updates.length === 1 ? updates[0]! : Y.mergeUpdates(updates)),
  };
}

/**
 * Merges a pulled value into a device's text. Any order of pulls and local edits gives the same
 * text on every device (a CRDT), so unlike a plain field nothing is skipped for its clock. A
 * plain string (from a server that predates mergeable texts) counts as its initial state.
 */
export function mergePulledText(name: string, local: LocalText, pulled: unknown): { text: string; state: string } | null {
  const bytes = isTextUpdateValue(pulled) ? decodeTextBytes(pulled.yjs) : typeof pulled === 'string' ? initialTextState(name, pulled) : null;
  if (!bytes) return null;
  const doc = loadTextDoc([localTextState(name, local), bytes]);
  return { text: textOf(doc, name), state: encodeTextBytes(Y.encodeStateAsUpdate(doc)) };
}

/**
 * An outbox value written before texts were mergeable (a plain string) as an update: its
 * initial state, the same bytes the device's own text starts from.
 */
export function legacyTextChange(name: string, value: unknown): unknown {
  if (value !== null && typeof value !== 'string') return value;
  return { yjs: encodeTextBytes(initialTextState(name, value ?? '')) } satisfies TextUpdateValue;
}

import * as Y from 'yjs';

import { loadTextDoc, textOf } from './text-doc';
import { textUpdateProblem } from './text-update-problem';

export type TextMerge =
  | {
      readonly ok: true;
      /** The stored state with the update merged in (`Y.mergeUpdates`, not yet compacted). */
      readonly state: Uint8Array;
      /** The text after the update. */
      readonly text: string;
      /** False when the update brought nothing new (a re-sent one). */
      readonly changed: boolean;
    }
  | { readonly ok: false; readonly reason: string };

/**
 * Merges one update into a text's stored state after checking it: it decodes and carries only
 * plain text ({@link textUpdateProblem}), every character it builds on is already in the stored
 * state (otherwise it belongs to another document, or to history this text never had), and the
 * text it leads to is at most `maxLength` UTF-16 code units — the unit of `String.length`,
 * which the plain-text fields' limits use too.
 */
export function mergeTextUpdate(name: string, stored: Uint8Array, update: Uint8Array, maxLength: number): TextMerge {
  const problem = textUpdateProblem(name, update);
  if (problem) return { ok: false, reason: problem };
  const doc = loadTextDoc([stored], false);
  const before = textOf(doc, name);
  const vectorBefore = Y.encodeStateVector(doc);
  try {
    Y.applyUpdate(doc, update);
  } catch {
    return { ok: false, reason: 'is not a Yjs update (it does not apply)' };
  }
  if (doc.store.pendingStructs !== null || doc.store.pendingDs !== null) {
    return { ok: false, reason: 'builds on characters this text does not have (another document, or a lost update)' };
  }
  if ([...doc.share.keys()].some((key) => key !== name)) return { ok: false, reason: 'belongs to another text' };
  const text = textOf(doc, name);
  if (text.length > maxLength) return { ok: false, reason: `would make the text longer than ${maxLength} characters` };
  const changed = text !== before || !sameBytes(vectorBefore, Y.encodeStateVector(doc));
  return { ok: true, state: changed ? Y.mergeUpdates([stored, update]) : stored, text, changed };
}

/**
 * A stored state with deleted characters dropped (Yjs garbage collection): what a fresh
 * device needs, smaller than the merged history. The text it shows is unchanged.
 */
export function compactTextState(state: Uint8Array): Uint8Array {
  return Y.encodeStateAsUpdate(loadTextDoc([state], true));
}

function sameBytes(a: Uint8Array, b: Uint8Array): boolean {
  return a.length === b.length && a.every((byte, i) => byte === b[i]);
}

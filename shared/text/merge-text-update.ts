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
 * Merges updates into one text's stored state, checking each: it decodes and carries only
 * plain text ({@link textUpdateProblem}), every character it builds on is already there
 * (otherwise it belongs to another document, or to history this text never had), and the text
 * it leads to is at most `maxLength` UTF-16 code units — the unit of `String.length`, which the
 * plain-text fields' limits use too. One document serves a whole batch, so a push of many
 * small edits decodes the stored state once.
 */
export class TextMerger {
  private doc: Y.Doc;
  private readonly accepted: Uint8Array[] = [];

  constructor(
    private readonly name: string,
    private readonly stored: Uint8Array,
    private readonly maxLength: number,
  ) {
    this.doc = loadTextDoc([stored], false);
  }

  /** Applies one update; answers whether it changed anything, or why it is refused. */
  apply(update: Uint8Array): { ok: true; changed: boolean } | { ok: false; reason: string } {
    const problem = textUpdateProblem(this.name, update);
    if (problem) return { ok: false, reason: problem };
    let changed = false;
    const seen = () => (changed = true);
    this.doc.on('update', seen);
    let reason: string | null = null;
    try {
      Y.applyUpdate(this.doc, update);
      if (this.doc.store.pendingStructs !== null || this.doc.store.pendingDs !== null) {
        reason = 'builds on characters this text does not have (another document, or a lost update)';
      } else if ([...this.doc.share.keys()].some((key) => key !== this.name)) reason = 'belongs to another text';
      else if (this.doc.getText(this.name).length > this.maxLength) reason = `would make the text longer than ${this.maxLength} characters`;
    } catch {
      reason = 'is not a Yjs update (it does not apply)';
    } finally {
      this.doc.off('update', seen);
    }
    if (reason) {
      // Start again from what was accepted, without the refused update's traces.
      this.doc = loadTextDoc([this.stored, ...this.accepted], false);
      return { ok: false, reason };
    }
    if (changed) this.accepted.push(update);
    return { ok: true, changed };
  }

  /** Whether any accepted update changed the text's state. */
  get changed(): boolean {
    return this.accepted.length > 0;
  }

  /** The text now. */
  get text(): string {
    return textOf(this.doc, this.name);
  }

  /** The stored state with the accepted updates merged in (`Y.mergeUpdates`). */
  state(): Uint8Array {
    return this.accepted.length ? Y.mergeUpdates([this.stored, ...this.accepted]) : this.stored;
  }
}

/** {@link TextMerger} for a single update. */
export function mergeTextUpdate(name: string, stored: Uint8Array, update: Uint8Array, maxLength: number): TextMerge {
  const merger = new TextMerger(name, stored, maxLength);
  const result = merger.apply(update);
  return result.ok ? { ok: true, state: merger.state(), text: merger.text, changed: result.changed } : result;
}

/**
 * The smaller of a stored state and the same state with deleted characters dropped (a Yjs
 * document with garbage collection, re-encoded): what a fresh device needs. Dropping deleted
 * characters pays off on pages with many deletions; on pages written by many insertions in the
 * middle, the merged updates are smaller (each insertion stays one struct, where an integrated
 * document splits it at every later insertion inside it), so they are kept. The text is the same.
 */
export function compactTextState(state: Uint8Array): Uint8Array {
  const collected = Y.encodeStateAsUpdate(loadTextDoc([state], true));
  return collected.length < state.length ? collected : state;
}

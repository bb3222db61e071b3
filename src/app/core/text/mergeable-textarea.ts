import { DestroyRef, Directive, effect, ElementRef, inject, input } from '@angular/core';
import { NgControl } from '@angular/forms';
import { liveQuery } from 'dexie';
import * as Y from 'yjs';

import type { LocalRow } from '@shared/sync/local-row';
import { textStatesOf } from '@shared/text/apply-pulled-texts';
import { localTextState } from '@shared/text/local-text';
import { replaceText } from '@shared/text/replace-text';
import { textDocName, textOf } from '@shared/text/text-doc';
import { encodeTextBytes, type TextUpdateValue } from '@shared/text/text-value';

import { LocalJournal } from '../data/local-journal';

/** Which mergeable text a textarea edits. */
export interface TextTarget {
  readonly collection: string;
  readonly rowId: string;
  readonly field: string;
}

/** Edits typed and not yet saved: the update to write, and how many edits it holds. */
export interface PendingEdits {
  readonly value: TextUpdateValue;
  readonly count: number;
}

/** Updates this textarea applies from the stored row (not typed here). */
const STORED = Symbol('stored');

/**
 * Binds a `<textarea>` to a mergeable text's Yjs document. What the reader types becomes
 * character edits of the document (kept until the form saves them, {@link pendingEdits}); a
 * change that reaches the stored row meanwhile (a pull, another tab) is merged into the same
 * document and shown at once, with the caret and selection kept on the same characters (Yjs
 * relative positions) and nothing typed lost. The form control follows without turning dirty.
 *
 * @example
 * <textarea matInput formControlName="body" [llMergeableText]="{ collection: 'notebookPages', rowId, field: 'body' }"></textarea>
 */
@Directive({
  selector: 'textarea[llMergeableText]',
  exportAs: 'llMergeableText',
  host: { '(input)': 'typed()' },
})
export class MergeableTextarea {
  readonly llMergeableText = input.required<TextTarget>();

  private readonly element: HTMLTextAreaElement = inject(ElementRef).nativeElement;
  private readonly control = inject(NgControl, { optional: true, self: true });
  private readonly journal = inject(LocalJournal);
  private doc = new Y.Doc();
  private name = '';
  private loaded = false;
  private edits: Uint8Array[] = [];
  private markArrived: (failure?: unknown) => void = () => undefined;
  /**
   * Settles once the stored text of the current target has arrived, or with why it could not be
   * read ({@link whenLoaded}); never rejects, so a form that is not saving leaves nothing unhandled.
   */
  private arrived = this.awaitStoredText();

  constructor() {
    inject(DestroyRef).onDestroy(() => this.markArrived()); // a save awaiting a closed form goes on
    effect((onCleanup) => {
      const target = this.llMergeableText();
      const db = this.journal.db();
      if (!db) return this.markArrived(); // nobody signed in: nothing will arrive, and nothing saves
      this.name = textDocName(target.collection, target.rowId, target.field);
      this.doc = new Y.Doc();
      // A new target's text is awaited afresh; one still awaited stays the same promise.
      if (this.loaded) this.arrived = this.awaitStoredText();
      this.loaded = false;
      this.edits = [];
      this.doc.on('update', (update: Uint8Array, origin: unknown) => {
        if (origin !== STORED) this.edits.push(update);
      });
      const subscription = liveQuery(() => db.rows(target.collection).get(target.rowId)).subscribe({
        next: (row) => this.receive(row, target.field),
        // A save waiting for the stored text must not wait forever (the database closed under it, say).
        error: (failure: unknown) => this.markArrived(failure ?? new Error('the stored text could not be read')),
      });
      onCleanup(() => {
        subscription.unsubscribe();
        this.doc.destroy();
      });
    });
  }

  /**
   * Resolves once the stored text has arrived: until then, what was typed is not yet an edit of it,
   * and {@link pendingEdits} would not hold it. A form awaits this before it saves. Rejects when the
   * stored text could not be read: the form then says it did not save, and the typed text stays.
   */
  whenLoaded(): Promise<void> {
    return this.arrived.then((failure) => {
      if (failure !== undefined) throw failure;
    });
  }

  private awaitStoredText(): Promise<unknown> {
    return new Promise<unknown>((resolve) => (this.markArrived = resolve));
  }

  /** The edits typed since the last save, as one update; null when there are none. */
  pendingEdits(): PendingEdits | null {
    if (this.edits.length === 0) return null;
    return { value: { yjs: encodeTextBytes(Y.mergeUpdates(this.edits)) }, count: this.edits.length };
  }

  /** The edits of a {@link pendingEdits} are saved: forget them (later ones stay pending). */
  saved(edits: PendingEdits): void {
    this.edits = this.edits.slice(edits.count);
  }

  /** Makes the whole text `text`, as if the reader had typed it (a restored version, say). */
  replaceAll(text: string): void {
    this.element.value = text;
    this.control?.control?.setValue(text, { emitModelToViewChange: false });
    this.control?.control?.markAsDirty();
    this.typed();
  }

  /** The reader typed: the characters that changed become edits of the document. */
  protected typed(): void {
    if (this.loaded) replaceText(this.doc.getText(this.name), this.element.value);
  }

  private receive(row: LocalRow | undefined, field: string): void {
    const text = this.doc.getText(this.name);
    const focused = this.element.ownerDocument.activeElement === this.element;
    const anchors = [this.element.selectionStart, this.element.selectionEnd].map((index) =>
      Y.createRelativePositionFromTypeIndex(text, Math.min(index, text.length)),
    );
    const state = localTextState(this.name, { state: row ? textStatesOf(row)[field] : undefined, text: row?.[field] as string | null | undefined });
    Y.applyUpdate(this.doc, state, STORED);
    if (!this.loaded) {
      this.loaded = true;
      // Typed before the stored text arrived: keep it as the reader's edit.
      if (this.element.value !== '' && this.element.value !== textOf(this.doc, this.name)) this.typed();
      this.markArrived();
    }
    const next = textOf(this.doc, this.name);
    if (next === this.element.value) return;
    const scrollTop = this.element.scrollTop;
    this.element.value = next;
    this.control?.control?.setValue(next, { emitModelToViewChange: false });
    if (focused) {
      const [start, end] = anchors.map((anchor) => Y.createAbsolutePositionFromRelativePosition(anchor, this.doc)?.index ?? next.length);
      this.element.setSelectionRange(start!, end!);
    }
    this.element.scrollTop = scrollTop;
  }
}

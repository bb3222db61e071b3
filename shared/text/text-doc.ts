import * as Y from 'yjs';

/**
 * The name of a mergeable text's root type: its collection, row and field. Each text is its own
 * Yjs document and its characters live under this name, so an update made for another text
 * cannot land in this one (see {@link textUpdateProblem}).
 *
 * @example
 * textDocName('notebookPages', '6f1c…', 'body') // 'notebookPages/6f1c…/body'
 */
export const textDocName = (collection: string, rowId: string, field: string): string => `${collection}/${rowId}/${field}`;

/** A Yjs document holding the given states (full states or updates, in any order). */
export function loadTextDoc(states: readonly Uint8Array[], gc = true): Y.Doc {
  const doc = new Y.Doc({ gc });
  for (const state of states) Y.applyUpdate(doc, state);
  return doc;
}

/** The text a document shows: what the reader sees on every device, and what a pull returns. */
export const textOf = (doc: Y.Doc, name: string): string => doc.getText(name).toString();

/** The state of an empty text. */
export const EMPTY_TEXT_STATE: Uint8Array = Y.encodeStateAsUpdate(new Y.Doc());

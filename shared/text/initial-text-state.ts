import * as Y from 'yjs';

import { EMPTY_TEXT_STATE } from './text-doc';

/**
 * The Yjs state a plain text starts as when it becomes mergeable. Made by a client id derived
 * from the document's name and the text itself, so every device (and the server's migration)
 * turning the same text of the same field into a document produces the very same bytes, which
 * Yjs then recognises as one insertion rather than two. A different text gets a different
 * client id, so two devices that migrate different texts keep both, never a corrupted mix.
 *
 * @example
 * initialTextState('notebookPages/…/body', 'Chapter notes') // the same bytes on every device
 */
export function initialTextState(name: string, text: string): Uint8Array {
  if (text === '') return EMPTY_TEXT_STATE;
  const doc = new Y.Doc();
  doc.clientID = fnv1a32(`${name}\u0000${text}`);
  doc.getText(name).insert(0, text);
  return Y.encodeStateAsUpdate(doc);
}

/** FNV-1a, 32 bits, over UTF-16 code units: a stable unsigned client id (Yjs ids are uint32). */
function fnv1a32(input: string): number {
  let hash = 0x811c9dc5;
  for (let i = 0; i < input.length; i++) {
    hash ^= input.charCodeAt(i);
    hash = Math.imul(hash, 0x01000193) >>> 0;
  }
  return hash;
}

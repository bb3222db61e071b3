import type * as Y from 'yjs';

/**
 * Turns `ytext` into `next` with one deletion and one insertion around the longest common start
 * and end, so an edit from a plain text box touches only the characters that changed and
 * merges with other devices' edits elsewhere. Never splits a surrogate pair.
 *
 * @example
 * replaceText(ytext, 'The red fox') // on 'The fox': inserts 'red ' at 4, deletes nothing
 */
export function replaceText(ytext: Y.Text, next: string): void {
  const current = ytext.toString();
  if (current === next) return;
  let start = 0;
  const shortest = Math.min(current.length, next.length);
  while (start < shortest && current.charCodeAt(start) === next.charCodeAt(start)) start++;
  if (start > 0 && isHighSurrogate(current.charCodeAt(start - 1))) start--;
  let end = 0;
  while (end < shortest - start && current.charCodeAt(current.length - 1 - end) === next.charCodeAt(next.length - 1 - end)) end++;
  if (end > 0 && isLowSurrogate(current.charCodeAt(current.length - end))) end--;
  const run = () => {
    const removed = current.length - start - end;
    if (removed > 0) ytext.delete(start, removed);
    const inserted = next.slice(start, next.length - end);
    if (inserted) ytext.insert(start, inserted);
  };
  if (ytext.doc) ytext.doc.transact(run);
  else run();
}

const isHighSurrogate = (code: number) => code >= 0xd800 && code <= 0xdbff;
const isLowSurrogate = (code: number) => code >= 0xdc00 && code <= 0xdfff;

import type { PatchOf } from '@shared/sync/schema/collection';
import type { NotebookPage, notebookPages } from '@shared/sync/schema/collections';

/** The page editor's form values. */
export interface PageFormValue {
  title: string;
  body: string;
}

export function toPageForm(page: NotebookPage): PageFormValue {
  return { title: page.title ?? '', body: page.body ?? '' };
}

/** Form values as fields: the title trimmed, the body exactly as typed; blanks as null. */
export function toPageFields(value: PageFormValue): Pick<PatchOf<typeof notebookPages>, 'title' | 'body'> {
  return {
    title: value.title.trim() === '' ? null : value.title.trim(),
    body: value.body.trim() === '' ? null : value.body,
  };
}

/**
 * Only the fields the reader changed: saving a new body from a phone must not overwrite a title
 * changed meanwhile on a laptop.
 */
export function changedPageFields(before: PageFormValue, after: PageFormValue): Pick<PatchOf<typeof notebookPages>, 'title' | 'body'> {
  const old = toPageFields(before);
  const next = toPageFields(after);
  return Object.fromEntries(Object.entries(next).filter(([field, value]) => value !== old[field as keyof typeof old]));
}

import type { LocalRow } from '../sync/local-row';

/**
 * Where a device keeps each mergeable text's Yjs state (base64), beside the text itself in the
 * field: `row._text[field]`. Like `_hlc`, it never leaves the device as a field. (No Yjs import
 * here, so the app's first bundle can do without Yjs until a text is written or pulled.)
 */
export const TEXT_STATES = '_text';

/** A row's stored Yjs states, by field. */
export const textStatesOf = (row: LocalRow): Readonly<Record<string, string>> => (row[TEXT_STATES] as Record<string, string> | undefined) ?? {};

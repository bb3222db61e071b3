import type { LocalRow } from '../sync/local-row';
import { fieldSpecOf } from '../sync/schema/collections';
import { writeLocalText } from '../text/local-text';
import { textDocName } from '../text/text-doc';
import { TEXT_STATES, textStatesOf } from '../text/text-states';
import type { TextImporter } from './import-row';

/**
 * An imported text becomes a character edit of the device's own document (as a form's whole-text
 * write does in JournalStore), so it merges with the server's text instead of replacing it.
 */
export const importText: TextImporter = (collection, row: LocalRow, field, value) => {
  const states = textStatesOf(row);
  const local = { state: states[field], text: row[field] as string | null | undefined };
  const written = writeLocalText(textDocName(collection, row.id, field), local, value, fieldSpecOf(collection, field)!.maxLength!);
  if ('problem' in written) return { problem: written.problem };
  return { row: { [field]: written.text === '' ? null : written.text, [TEXT_STATES]: { ...states, [field]: written.state } }, value: { yjs: written.update } };
};

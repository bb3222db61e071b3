import type { PulledChange } from '../api/sync';
import type { LocalRow } from '../sync/local-row';
import { mergePulledText } from './local-text';
import { textDocName } from './text-doc';
import { TEXT_STATES, textStatesOf } from './text-states';

export { TEXT_STATES, textStatesOf } from './text-states';

/**
 * Merges pulled mergeable texts into a local row: every pulled state is merged in, whatever its
 * clock, because merging Yjs states loses nothing (pending local edits included). The field's
 * clock becomes the greater of the two. Returns the same row object when nothing changed.
 */
export function applyPulledTexts(collection: string, row: LocalRow, changes: readonly Pick<PulledChange, 'field' | 'value' | 'hlc' | 'state'>[]): LocalRow {
  let next: Record<string, unknown> | null = null;
  for (const change of changes) {
    const current = (next ?? row) as LocalRow;
    const states = textStatesOf(current);
    const local = { state: states[change.field], text: current[change.field] as string | null | undefined };
    const merged = mergePulledText(textDocName(collection, row.id, change.field), local, typeof change.state === 'string' ? { yjs: change.state } : change.value);
    if (!merged) continue;
    const text = merged.text === '' ? null : merged.text;
    const clock = current._hlc[change.field];
    if (merged.state === local.state && text === (local.text ?? null) && clock !== undefined && clock >= change.hlc) continue;
    next = {
      ...current,
      [change.field]: text,
      [TEXT_STATES]: { ...states, [change.field]: merged.state },
      _hlc: { ...current._hlc, [change.field]: clock !== undefined && clock > change.hlc ? clock : change.hlc },
    };
  }
  return (next as LocalRow | null) ?? row;
}

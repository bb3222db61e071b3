import type { CollectionName } from '../sync/schema/collections';
import { dependentsOf } from './deleted-with';
import { deletedAtMs, deletionClock, editedAfterDelete, inTrash, type TombstonedRow } from './tombstone';

/** The kinds Trash shows, in the order of its groups. */
export const TRASH_KINDS = [
  'books',
  'series',
  'readings',
  'sessions',
  'quotes',
  'notebooks',
  'notebookPages',
  'pageTemplates',
  'labels',
  'challenges',
  'monthPicks',
  'favourites',
] as const satisfies readonly CollectionName[];
export type TrashKind = (typeof TRASH_KINDS)[number];

export interface TrashRow extends TombstonedRow {
  readonly id: string;
  readonly [field: string]: unknown;
}

/** One thing in Trash, with how many rows of each kind went with it. */
export interface TrashEntry {
  readonly collection: TrashKind;
  readonly row: TrashRow;
  readonly deletedAt: number;
  /** It (or something that went with it) was written after the delete, on a device that had not seen it. */
  readonly editedAfterDelete: boolean;
  readonly companions: readonly { readonly collection: CollectionName; readonly rows: readonly TrashRow[] }[];
}

/**
 * Trash from the deleted rows of each kind: what was deleted within the window, newest first. A
 * row deleted in the same write as its parent (the same clock) is listed under the parent, not
 * on its own, since restoring the parent brings it back. Kinds outside {@link TRASH_KINDS} (a
 * book's status history) may be given: they count under their parent but are never listed.
 */
export function trashEntries(deleted: Partial<Record<CollectionName, readonly TrashRow[]>>, nowMs: number): TrashEntry[] {
  const companionIds = new Set<string>();
  const entries: TrashEntry[] = [];
  for (const collection of TRASH_KINDS) {
    for (const row of deleted[collection] ?? []) {
      if (!inTrash(row, nowMs)) continue;
      const clock = deletionClock(row)!;
      const companions = dependentsOf(collection).map(({ collection: kind, ref }) => ({
        collection: kind,
        rows: (deleted[kind] ?? []).filter((child) => child[ref] === row.id && deletionClock(child) === clock),
      }));
      for (const group of companions) for (const child of group.rows) companionIds.add(`${group.collection}/${child.id}`);
      const edited = editedAfterDelete(row) || companions.some((group) => group.rows.some(editedAfterDelete));
      entries.push({ collection, row, deletedAt: deletedAtMs(row)!, editedAfterDelete: edited, companions: companions.filter((g) => g.rows.length > 0) });
    }
  }
  return entries.filter((entry) => !companionIds.has(`${entry.collection}/${entry.row.id}`)).sort((a, b) => b.deletedAt - a.deletedAt);
}

import { inject, Injectable } from '@angular/core';

import { dependentsOf, parentsOf } from '@shared/trash/deleted-with';
import { deletionClock, type TombstonedRow } from '@shared/trash/tombstone';
import type { CollectionName } from '@shared/sync/schema/collections';

import type { JournalDb } from '../data/journal-db';
import { JournalStore, type RowWrite } from '../data/journal-store';
import { LocalJournal } from '../data/local-journal';

/** The rows of one kind that go with a delete. */
export interface Companions {
  readonly collection: CollectionName;
  readonly ids: readonly string[];
}

type Row = TombstonedRow & { readonly id: string } & Readonly<Record<string, unknown>>;

/** A parent brought back from Trash because a row of its was restored (the row as it was in Trash). */
export interface RestoredParent {
  readonly collection: CollectionName;
  readonly row: Row;
}

/**
 * Deletes and restores by tombstone. A row is deleted in one write together with what depends
 * on it (a book's readings, sessions, quotes and status history; a notebook's pages), so all of
 * them carry the delete's one clock; restoring lifts the tombstone of exactly the rows with that
 * clock, bringing back what went together and nothing deleted earlier on its own.
 */
@Injectable({ providedIn: 'root' })
export class Deletions {
  private readonly store = inject(JournalStore);
  private readonly journal = inject(LocalJournal);

  /** What would go with a delete of this row now (rows not deleted yet), per kind. */
  async companionsOf(collection: CollectionName, id: string): Promise<Companions[]> {
    const db = this.journal.requireDb();
    return Promise.all(
      dependentsOf(collection).map(async ({ collection: kind, ref }) => {
        const rows = await rowsReferring(db, kind, ref, id);
        return { collection: kind, ids: rows.filter((row) => row.deleted !== true).map((row) => row.id) };
      }),
    );
  }

  /** Deletes the row and its companions in one write (one clock). */
  async remove(collection: CollectionName, id: string): Promise<void> {
    const companions = await this.companionsOf(collection, id);
    await this.store.writeAll([
      { collection, rowId: id, patch: { deleted: true } },
      ...companions.flatMap(({ collection: kind, ids }) => ids.map((rowId): RowWrite => ({ collection: kind, rowId, patch: { deleted: true } }))),
    ]);
  }

  /**
   * Restores the row and whatever was deleted in the same write, in one write. A row whose
   * parent is in Trash (a session of a deleted book) brings the parent back too, with what went
   * with it: a child alone would show nowhere. Resolves with the parents restored along.
   */
  async restore(collection: CollectionName, id: string): Promise<RestoredParent[]> {
    const db = this.journal.requireDb();
    const row = (await db.rows(collection).get(id)) as Row | undefined;
    if (!row || !deletionClock(row)) return [];
    const writes = await this.restoreWrites(db, collection, row);
    const parents: RestoredParent[] = [];
    for (const { collection: kind, ref } of parentsOf(collection)) {
      const parentId = row[ref];
      const parent = typeof parentId === 'string' ? ((await db.rows(kind).get(parentId)) as Row | undefined) : undefined;
      if (!parent || !deletionClock(parent)) continue;
      const more = await this.restoreWrites(db, kind, parent);
      writes.push(...more.filter((write) => !writes.some((known) => known.collection === write.collection && known.rowId === write.rowId)));
      parents.push({ collection: kind, row: parent });
    }
    await this.store.writeAll(writes);
    return parents;
  }

  /** Lifting the tombstone of a row and of its dependents deleted with it (the same clock). */
  private async restoreWrites(db: JournalDb, collection: CollectionName, row: Row): Promise<RowWrite[]> {
    const clock = deletionClock(row);
    const writes: RowWrite[] = [{ collection, rowId: row.id, patch: { deleted: false } }];
    for (const { collection: kind, ref } of dependentsOf(collection)) {
      const rows = await rowsReferring(db, kind, ref, row.id);
      for (const child of rows) if (deletionClock(child) === clock) writes.push({ collection: kind, rowId: child.id, patch: { deleted: false } });
    }
    return writes;
  }
}

/** The rows of `collection` whose `ref` field points at `id` (a book's readings, a notebook's pages), deleted or not. */
async function rowsReferring(db: JournalDb, collection: CollectionName, ref: string, id: string): Promise<Row[]> {
  return (await db.rows(collection).where(ref).equals(id).toArray()) as Row[];
}

import { inject, Injectable } from '@angular/core';

import { BOOK_REFERENCES, referenceMoves } from '@shared/duplicates/book-references';
import { mergeBooks, type MergeField } from '@shared/duplicates/merge-books';
import type { CircleCollectionName } from '@shared/circles/circle-collections';
import { collectionSpec, type Book } from '@shared/sync/schema/collections';

import { JournalStore } from '../../../core/data/journal-store';
import { LocalJournal } from '../../../core/data/local-journal';
import { CircleStore } from '../../circles';

type Rows = Record<string, Readonly<Record<string, unknown>>[]>;

/**
 * Merges two books on this device: the reader's picks, every reference to the other book moved
 * to the kept one (every field the shared schema marks as holding a book id) and the other book
 * a tombstone, in one journal transaction. A circle's link to the other book follows in the
 * circle's own store (circle data syncs by circle, through its own outbox).
 */
@Injectable({ providedIn: 'root' })
export class BookMerge {
  private readonly store = inject(JournalStore);
  private readonly circles = inject(CircleStore);
  private readonly journal = inject(LocalJournal);

  /** Merges `other` into `kept`; answers how many rows now point at the kept book instead. */
  async merge(kept: Book, other: Book, picks: Partial<Record<MergeField, 'kept' | 'other'>>): Promise<number> {
    const moves = referenceMoves(await this.referencingRows(other.id), other.id, kept.id);
    await this.store.writeAll(mergeBooks(kept, other, picks, moves));
    for (const move of moves.filter((one) => one.circle)) {
      const row = (await this.journal.requireDb().table(move.collection).get(move.rowId)) as { circleId?: string } | undefined;
      if (row?.circleId) await this.circles.write(move.collection as CircleCollectionName, move.rowId, row.circleId, move.patch);
    }
    return moves.length;
  }

  /** Rows that may name the book, not deleted: by index where the field has one, else the (small) table. */
  private async referencingRows(bookId: string): Promise<Rows> {
    const db = this.journal.requireDb();
    const rows: Rows = {};
    for (const { collection, field, holds } of BOOK_REFERENCES) {
      const table = db.table<Record<string, unknown>, string>(collection);
      const indexed = holds === 'value' && collectionSpec(collection)?.indexes.includes(field);
      const found = indexed ? await table.where(field).equals(bookId).toArray() : await table.toArray();
      rows[collection] = [...(rows[collection] ?? []), ...found.filter((row) => !row['deleted'])];
    }
    return rows;
  }
}

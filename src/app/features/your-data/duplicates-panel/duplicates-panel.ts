import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';

import { findDuplicates } from '@shared/duplicates/book-keys';
import { BOOK_CHILDREN, differingFields, mergeBooks, type BookChild, type MergeField } from '@shared/duplicates/merge-books';
import type { Book } from '@shared/sync/schema/collections';

import { liveQuerySignal } from '../../../core/data/live-query';
import { JournalStore } from '../../../core/data/journal-store';
import { LocalJournal } from '../../../core/data/local-journal';

const FIELD_LABELS: Record<MergeField, string> = {
  title: 'Title',
  subtitle: 'Subtitle',
  authors: 'Authors',
  isbn: 'ISBN',
  format: 'Format',
  status: 'Status',
  rating: 'Rating',
  pageCount: 'Pages',
  audioMinutes: 'Minutes',
  publisher: 'Publisher',
  year: 'Year',
  tags: 'Tags',
  coverId: 'Cover',
};

/** Books that look like the same book (same ISBN-13, or same title and first author), merged two at a time. */
@Component({
  selector: 'll-duplicates-panel',
  imports: [MatButtonModule],
  templateUrl: './duplicates-panel.html',
  styleUrl: './duplicates-panel.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class DuplicatesPanel {
  private readonly store = inject(JournalStore);
  private readonly journal = inject(LocalJournal);

  private readonly books = liveQuerySignal(async (db) => ((await db.rows('books').toArray()) as Book[]).filter((book) => !book.deleted), [] as Book[]);
  protected readonly groups = computed(() => findDuplicates(this.books()));
  /** The pair being merged: kept first. */
  protected readonly pair = signal<[Book, Book] | null>(null);
  protected readonly picks = signal<Partial<Record<MergeField, 'kept' | 'other'>>>({});
  protected readonly message = signal<string | null>(null);
  protected readonly fields = computed(() => {
    const pair = this.pair();
    return pair ? differingFields(pair[0], pair[1]).map((field) => ({ field, label: FIELD_LABELS[field] })) : [];
  });

  protected open(group: readonly Book[]): void {
    this.message.set(null);
    this.picks.set({});
    this.pair.set([group[0]!, group[1]!]);
  }

  protected close(): void {
    this.pair.set(null);
  }

  protected swap(): void {
    this.pair.update((pair) => pair && [pair[1], pair[0]]);
    this.picks.set({});
  }

  protected pick(field: MergeField, side: 'kept' | 'other'): void {
    this.picks.update((picks) => ({ ...picks, [field]: side }));
  }

  protected show(book: Book, field: MergeField): string {
    const value = book[field];
    if (value === null || value === undefined || value === '') return '—';
    if (field === 'coverId') return 'a cover';
    return Array.isArray(value) ? value.join(', ') : String(value);
  }

  /** Writes the merge in one transaction: picked values, children moved, the other book a tombstone. */
  protected async merge(): Promise<void> {
    const pair = this.pair();
    const db = this.journal.db();
    if (!pair || !db) return;
    const [kept, other] = pair;
    const children: { collection: BookChild; id: string }[] = [];
    for (const collection of BOOK_CHILDREN) {
      const rows = await db
        .rows(collection)
        .filter((row) => row['bookId'] === other.id && !row['deleted'])
        .toArray();
      for (const row of rows) children.push({ collection, id: row.id });
    }
    await this.store.writeAll(mergeBooks(kept, other, this.picks(), children));
    this.pair.set(null);
    this.message.set(`Merged into “${kept.title}”: ${children.length} readings, sessions, quotes and other entries moved to it.`);
  }
}

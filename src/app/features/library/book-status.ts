import { inject, Injectable } from '@angular/core';

import type { Book } from '@shared/sync/schema/collections';

import { JournalStore } from '../../core/data/journal-store';

/**
 * Changing a book's status: the book keeps its current status and when it changed, and every
 * change is added to the book's history as a row of its own, so changes made on two devices
 * offline both stay. Both are written in one transaction.
 */
@Injectable({ providedIn: 'root' })
export class BookStatus {
  private readonly store = inject(JournalStore);

  /** Does nothing when the book already has that status. */
  async change(bookId: string, status: NonNullable<Book['status']>, at = new Date()): Promise<void> {
    const book = (await this.store.get('books', bookId)) as Book | undefined;
    if (book?.status === status) return;
    const changedAt = at.toISOString();
    await this.store.writeAll([
      { collection: 'books', rowId: bookId, patch: { status, statusChangedAt: changedAt } },
      { collection: 'bookStatusChanges', rowId: crypto.randomUUID(), patch: { bookId, status, changedAt, deleted: false } },
    ]);
  }
}

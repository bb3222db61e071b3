import { inject, Injectable } from '@angular/core';
import { MatSnackBar } from '@angular/material/snack-bar';
import { Router } from '@angular/router';

import { nextUnread, seriesBooks } from '@shared/journal/series-order';
import type { Book } from '@shared/sync/schema/collections';

import { JournalStore, type RowWrite } from '../data/journal-store';

/**
 * Changing a book's status: the book keeps its current status and when it changed, and every
 * change is added to the book's history as a row of its own, so changes made on two devices
 * offline both stay. Both are written in one transaction. Finishing a book of a series suggests
 * the next one to read. The book editor writes the same rows with its other fields
 * ({@link BookStatus.writes}) and then calls {@link BookStatus.afterChange}.
 */
@Injectable({ providedIn: 'root' })
export class BookStatus {
  private readonly store = inject(JournalStore);
  private readonly snackBar = inject(MatSnackBar);
  private readonly router = inject(Router);

  /** Does nothing when the book already has that status. */
  async change(bookId: string, status: NonNullable<Book['status']>, at = new Date()): Promise<void> {
    // The book is read in the write's own transaction: one round trip, and no edit in between.
    const book = await this.store.writeAllUnless(this.writes(bookId, status, at), { collection: 'books', rowId: bookId }, (row) => row?.status === status);
    if (book?.status === status) return;
    await this.afterChange(bookId, status, book?.seriesId);
  }

  /** The rows of a status change: the book's status and when, and its history entry. */
  writes(bookId: string, status: NonNullable<Book['status']>, at = new Date(), bookFields: Readonly<Record<string, unknown>> = {}): RowWrite[] {
    const changedAt = at.toISOString();
    return [
      { collection: 'books', rowId: bookId, patch: { ...bookFields, status, statusChangedAt: changedAt } },
      { collection: 'bookStatusChanges', rowId: crypto.randomUUID(), patch: { bookId, status, changedAt, deleted: false } },
    ];
  }

  /** After a status change is saved: finishing a book of a series suggests the next one. */
  async afterChange(bookId: string, status: NonNullable<Book['status']>, seriesId: string | null | undefined): Promise<void> {
    if (status === 'finished' && seriesId) await this.suggestNext(bookId, seriesId);
  }

  /** The next book of the series, offered in a snackbar. */
  private async suggestNext(bookId: string, seriesId: string): Promise<void> {
    const series = await this.store.get('series', seriesId);
    if (series?.deleted) return; // a deleted series links nothing
    const next = nextUnread(seriesBooks(await this.store.list('books'), seriesId), bookId);
    if (!next) return;
    this.snackBar
      .open(`Next in ${series?.name ?? 'the series'}: ${next.title ?? 'the next book'}`, 'Open', { duration: 8000 })
      .onAction()
      .subscribe(() => void this.router.navigate(['/library', next.id]));
  }
}

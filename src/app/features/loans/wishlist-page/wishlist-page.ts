import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { RouterLink } from '@angular/router';

import { comingOut } from '@shared/loans/coming-out';
import type { Book } from '@shared/sync/schema/collections';

import { JournalStore } from '../../../core/data/journal-store';
import { liveQuerySignal } from '../../../core/data/live-query';
import { readerToday } from '../../../core/time/reader-today';

const PRIORITY_ORDER = { high: 0, medium: 1, low: 2 } as const;

/** Books the reader wants (where to get them, a price note) and releases ahead, this week first. */
@Component({
  selector: 'll-wishlist-page',
  imports: [RouterLink, MatButtonModule],
  templateUrl: './wishlist-page.html',
  styleUrl: './wishlist-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class WishlistPage {
  private readonly store = inject(JournalStore);
  private readonly today = readerToday();
  private readonly books = liveQuerySignal(async (db) => ((await db.rows('books').toArray()) as Book[]).filter((b) => !b.deleted), [] as Book[]);

  protected readonly wanted = computed(() =>
    this.books()
      .filter((b) => b.copy === 'wishlist')
      .sort((a, b) => PRIORITY_ORDER[a.wishPriority ?? 'low'] - PRIORITY_ORDER[b.wishPriority ?? 'low'] || (a.title ?? '').localeCompare(b.title ?? '')),
  );
  protected readonly releases = computed(() => comingOut(this.books(), this.today));

  /** Bought or borrowed: onto the shelves as to be read, off the wishlist. */
  protected gotIt(book: Book, copy: 'owned' | 'library'): Promise<void> {
    return this.store.write('books', book.id, { copy, status: book.status ?? 'tbr' });
  }
}

import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { RouterLink } from '@angular/router';

import type { CollectionName } from '@shared/sync/schema/collections';
import { companionLine } from '@shared/trash/companion-words';
import { DELETE_CLOCK_INDEX, purgeCutoffClock } from '@shared/trash/tombstone';
import { TRASH_KINDS, trashEntries, type TrashEntry, type TrashKind, type TrashRow } from '@shared/trash/trash-entries';

import type { JournalDb } from '../../../core/data/journal-db';
import { liveQuerySignal } from '../../../core/data/live-query';
import { CLOCK } from '../../../core/time/clock';
import { Deletions } from '../../../core/trash/deletions';
import { ReaderDatePipe } from '../../../ui/reader-date';
import { TRASH_HEADINGS, trashTitle } from './trash-words';

type Deleted = Partial<Record<CollectionName, TrashRow[]>>;

/** Listed under their book, never on their own. */
const COUNTED_ONLY = ['bookStatusChanges'] as const;

/**
 * The rows of the kinds Trash shows deleted within its window, read through the delete-clock
 * index (never a whole table), and the titles of the books they name.
 */
async function deletedRows(db: JournalDb, nowMs: number): Promise<{ deleted: Deleted; titles: Map<string, string> }> {
  const deleted: Deleted = {};
  const cutoff = purgeCutoffClock(nowMs);
  for (const kind of [...TRASH_KINDS, ...COUNTED_ONLY])
    deleted[kind] = (await db
      .rows(kind)
      .where(DELETE_CLOCK_INDEX)
      .aboveOrEqual(cutoff)
      .filter((row) => row['deleted'] === true)
      .toArray()) as TrashRow[];
  const bookIds = [...new Set(Object.values(deleted).flatMap((rows) => rows.map((row) => (row['bookId'] as string | undefined) ?? row.id)))];
  const books = await db.rows('books').bulkGet(bookIds);
  return { deleted, titles: new Map(books.flatMap((book) => (book ? [[book.id, String(book['title'] ?? 'a book')] as const] : []))) };
}

/** One group of Trash: a kind and its entries. */
interface TrashGroup {
  readonly kind: TrashKind;
  readonly heading: string;
  readonly items: readonly { readonly entry: TrashEntry; readonly title: string; readonly along: string }[];
}

/** Settings › Trash: what was deleted in the last 30 days, by kind, each restorable with what went with it. */
@Component({
  selector: 'll-trash-page',
  imports: [ReaderDatePipe, RouterLink, MatButtonModule, MatIconModule],
  templateUrl: './trash-page.html',
  styleUrl: './trash-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class TrashPage {
  private readonly deletions = inject(Deletions);
  private readonly clock = inject(CLOCK);
  private readonly data = liveQuerySignal((db) => deletedRows(db, this.clock.now()), undefined);
  protected readonly loaded = computed(() => this.data() !== undefined);
  protected readonly restored = signal<string | null>(null);

  protected readonly groups = computed<TrashGroup[]>(() => {
    const data = this.data();
    if (!data) return [];
    const bookTitle = (id: unknown) => (typeof id === 'string' && data.titles.get(id)) || 'a book';
    const entries = trashEntries(data.deleted, this.clock.now());
    return TRASH_KINDS.map((kind) => ({
      kind,
      heading: TRASH_HEADINGS[kind],
      items: entries
        .filter((entry) => entry.collection === kind)
        .map((entry) => ({
          entry,
          title: trashTitle(entry, bookTitle),
          along: companionLine(entry.companions.map(({ collection, rows }) => ({ collection, count: rows.length }))),
        })),
    })).filter((group) => group.items.length > 0);
  });

  protected async restore(entry: TrashEntry, title: string): Promise<void> {
    const parents = await this.deletions.restore(entry.collection, entry.row.id);
    // Said aloud: restoring a session of a deleted book brought the book back too.
    const along = parents.map(({ collection, row }) =>
      collection === 'books' ? `the book “${String(row['title'] ?? 'Untitled book')}”` : `the notebook “${String(row['title'] ?? 'Untitled')}”`,
    );
    this.restored.set(along.length ? `${title} is back, and so is ${along.join(' and ')} it belongs to (it was in Trash too).` : `${title} is back.`);
  }
}

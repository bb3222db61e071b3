import { afterNextRender, ChangeDetectionStrategy, Component, computed, ElementRef, inject, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { ActivatedRoute } from '@angular/router';

import { findDuplicates } from '@shared/duplicates/book-keys';
import { differingFields, type MergeField } from '@shared/duplicates/merge-books';
import type { Book } from '@shared/sync/schema/collections';

import { liveQuerySignal } from '../../../core/data/live-query';
import { liveQueryFor } from '../../../core/data/live-query-for';
import { BookMerge } from './book-merge';

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
  seriesId: 'Series',
  seriesPosition: 'Place in the series',
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
  private readonly merging = inject(BookMerge);

  /**
   * Looking reads the whole library, again after every change: only once the reader asks (or
   * arrives from the Library's "See possible duplicates"), never during an import they did not.
   */
  protected readonly looking = signal(inject(ActivatedRoute, { optional: true })?.snapshot.fragment === 'duplicates');
  private readonly found = liveQueryFor(this.looking, async (db, looking) =>
    looking ? ((await db.rows('books').toArray()) as Book[]).filter((book) => !book.deleted) : null,
  );
  protected readonly loaded = computed(() => Array.isArray(this.found()));
  private readonly books = computed(() => this.found() ?? []);
  private readonly seriesNames = liveQuerySignal(
    async (db) => new Map((await db.rows('series').toArray()).map((one) => [one.id, String(one['name'] ?? '')])),
    new Map(),
  );
  protected readonly groups = computed(() => findDuplicates(this.books()));
  /** The pair being merged: kept first. */
  protected readonly pair = signal<[Book, Book] | null>(null);
  protected readonly picks = signal<Partial<Record<MergeField, 'kept' | 'other'>>>({});
  protected readonly message = signal<string | null>(null);
  protected readonly fields = computed(() => {
    const pair = this.pair();
    return pair ? differingFields(pair[0], pair[1]).map((field) => ({ field, label: FIELD_LABELS[field] })) : [];
  });

  constructor() {
    const host = inject<ElementRef<HTMLElement>>(ElementRef).nativeElement;
    if (this.looking()) afterNextRender(() => host.scrollIntoView?.({ block: 'start' }));
  }

  protected look(): void {
    this.looking.set(true);
  }

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
    if (field === 'seriesId') return this.seriesNames().get(String(value)) || 'a series';
    return Array.isArray(value) ? value.join(', ') : String(value);
  }

  /** Writes the merge in one transaction: picked values, every reference moved, the other book a tombstone. */
  protected async merge(): Promise<void> {
    const pair = this.pair();
    if (!pair) return;
    const [kept, other] = pair;
    const moved = await this.merging.merge(kept, other, this.picks());
    this.pair.set(null);
    this.message.set(`Merged into “${kept.title}”: ${moved} readings, sessions, quotes and other entries now point at it.`);
  }
}

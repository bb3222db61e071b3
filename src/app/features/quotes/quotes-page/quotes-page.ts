import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatChipsModule } from '@angular/material/chips';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatSlideToggleModule } from '@angular/material/slide-toggle';

import type { Book, Quote } from '@shared/sync/schema/collections';

import { liveQuerySignal } from '../../../core/data/live-query';
import { LabelDirectory } from '../../../core/read-model/label-directory';
import { QuoteCapture } from '../quote-capture';
import { QuoteCard } from '../quote-card/quote-card';
import { queryQuotes, quoteSearchText } from '../quote-query';
import { allQuotes, type AllQuotes } from '../quotes-data';

/** How many quotes show at first, and how many more each "Show more" adds. */
const PAGE = 50;

/** Every quote the reader kept, from every book: search, filter by label or favourite, newest first. */
@Component({
  selector: 'll-quotes-page',
  imports: [MatButtonModule, MatChipsModule, MatFormFieldModule, MatIconModule, MatInputModule, MatSlideToggleModule, QuoteCard],
  templateUrl: './quotes-page.html',
  styleUrl: './quotes-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class QuotesPage {
  private readonly capture = inject(QuoteCapture);
  private readonly labels = inject(LabelDirectory);

  private readonly data = liveQuerySignal<AllQuotes | undefined>(allQuotes, undefined);
  protected readonly loaded = computed(() => this.data() !== undefined);
  protected readonly quotes = computed(() => this.data()?.quotes ?? []);
  /** Deleted books too: their quotes still name where they came from. */
  protected readonly books = computed(() => new Map((this.data()?.books ?? []).map((book) => [book.id, book])));
  /** Search text per quote, rebuilt when quotes or books change rather than on every keystroke. */
  private readonly index = computed(() => {
    const books = this.books();
    return new Map(this.quotes().map((quote) => [quote.id, quoteSearchText(quote, quote.bookId ? books.get(quote.bookId) : undefined)]));
  });
  /** Only the labels some quote carries are worth filtering by. */
  protected readonly usedLabels = computed(() => {
    const used = new Set(this.quotes().flatMap((quote) => quote.labelIds ?? []));
    return this.labels.all().filter((label) => used.has(label.id));
  });

  protected readonly text = signal('');
  protected readonly labelIds = signal<readonly string[]>([]);
  protected readonly favouritesOnly = signal(false);
  protected readonly limit = signal(PAGE);

  protected readonly found = computed(() =>
    queryQuotes(this.quotes(), this.index(), {
      text: this.text(),
      // A label deleted while chosen no longer narrows anything.
      labelIds: this.labelIds().filter((id) => this.usedLabels().some((label) => label.id === id)),
      favouritesOnly: this.favouritesOnly(),
    }),
  );
  protected readonly shown = computed(() => this.found().slice(0, this.limit()));
  protected readonly countLine = computed(() => {
    const [found, all] = [this.found().length, this.quotes().length];
    const noun = (n: number) => (n === 1 ? 'quote' : 'quotes');
    return found === all ? `${all} ${noun(all)}` : `${found} of ${all} ${noun(all)}`;
  });

  protected bookOf(quote: Quote): Book | undefined {
    return quote.bookId ? this.books().get(quote.bookId) : undefined;
  }

  protected search(text: string): void {
    this.text.set(text);
    this.limit.set(PAGE);
  }

  protected filterLabels(ids: readonly string[] | null): void {
    this.labelIds.set(ids ?? []);
    this.limit.set(PAGE);
  }

  protected filterFavourites(on: boolean): void {
    this.favouritesOnly.set(on);
    this.limit.set(PAGE);
  }

  protected showMore(): void {
    this.limit.update((limit) => limit + PAGE);
  }

  protected captureQuote(): void {
    void this.capture.open();
  }
}

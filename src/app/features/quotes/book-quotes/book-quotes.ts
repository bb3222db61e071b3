import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';

import { QuoteCard } from '../quote-card/quote-card';
import { bookQuotes } from '../quotes-data';
import { liveQueryFor } from '../../../core/data/live-query-for';

/** The quotes kept from one book, newest first, for its book page. Live from this device. */
@Component({
  selector: 'll-book-quotes',
  imports: [QuoteCard],
  template: `
    <section aria-labelledby="book-quotes-heading">
      <h2 id="book-quotes-heading">Quotes</h2>
      @for (quote of quotes(); track quote.id) {
        <ll-quote-card [quote]="quote" [book]="book()" [showBook]="false" />
      } @empty {
        <p class="quiet">No quotes from this book yet. When a passage stays with you, use Capture a quote to keep it with its page.</p>
      }
    </section>
  `,
  styles: `
    h2 {
      margin-top: 24px;
    }
    .quiet {
      color: var(--mat-sys-on-surface-variant);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class BookQuotes {
  /** The book whose quotes to show. */
  readonly bookId = input.required<string>();

  private readonly data = liveQueryFor(this.bookId, bookQuotes);
  protected readonly book = computed(() => this.data()?.book);
  protected readonly quotes = computed(() => this.data()?.quotes ?? []);
}

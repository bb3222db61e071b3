import { ChangeDetectionStrategy, Component } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';
import { RouterLink } from '@angular/router';

/** A part of the journal the hub links to. */
interface JournalPart {
  readonly path: string;
  readonly title: string;
  readonly about: string;
  readonly icon: string;
}

/** The journal: everything the reader keeps beyond the books themselves. */
@Component({
  selector: 'll-journal',
  imports: [RouterLink, MatIconModule],
  templateUrl: './journal.html',
  styleUrl: './journal.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class Journal {
  protected readonly parts: readonly JournalPart[] = [
    { path: '/journal/quotes', title: 'Quotes', about: 'Passages you kept, from every book', icon: 'format_quote' },
    { path: '/journal/notebooks', title: 'Notebooks', about: 'Free pages, on a book or on anything', icon: 'menu_book' },
    { path: '/journal/series', title: 'Series', about: 'Where you are in each series, and what is next', icon: 'collections_bookmark' },
    { path: '/journal/favourites', title: 'Favourites and picks', about: 'Books, authors and quotes you love, and a pick for each month', icon: 'favorite' },
    { path: '/journal/labels', title: 'Labels', about: 'Your small labels for books and quotes', icon: 'sell' },
  ];
}

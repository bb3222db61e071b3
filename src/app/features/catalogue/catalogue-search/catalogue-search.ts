import { ChangeDetectionStrategy, Component, inject, input, output, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';

import type { CatalogueBook } from '@shared/api/catalogue';

import { CatalogueClient } from '../catalogue-client';
import type { FillInResult } from '../fill-in-dialog/fill-in-dialog';
import { matchLine, type FillValues } from '../fill-values';
import { OpenFillIn } from '../open-fill-in';

/**
 * Find a book in the catalogue by words of its title or its author's name (for books without
 * an ISBN to hand). Results show year and format; choosing one opens the same fill-in choice.
 * Not a <form>: it sits inside the book editor's form, so Enter in its field searches.
 */
@Component({
  selector: 'll-catalogue-search',
  imports: [MatButtonModule, MatFormFieldModule, MatInputModule],
  templateUrl: './catalogue-search.html',
  styleUrl: './catalogue-search.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class CatalogueSearch {
  private readonly client = inject(CatalogueClient);
  private readonly fillIn = inject(OpenFillIn);

  readonly current = input.required<Partial<FillValues>>();
  readonly filled = output<FillInResult>();

  protected readonly words = signal('');
  protected readonly results = signal<readonly CatalogueBook[]>([]);
  private source = '';
  protected readonly message = signal('');
  protected readonly busy = signal(false);
  protected readonly matchLine = matchLine;

  protected async search(): Promise<void> {
    const words = this.words().trim();
    if (!words) {
      this.message.set('Type some words of the title or the author’s name.');
      return;
    }
    this.busy.set(true);
    this.message.set('Searching the catalogue…');
    const outcome = await this.client.search(words);
    this.busy.set(false);
    if (outcome.kind === 'problem') {
      this.results.set([]);
      this.message.set(outcome.message);
      return;
    }
    this.source = outcome.source;
    this.results.set(outcome.books);
    this.message.set(`${outcome.books.length} ${outcome.books.length === 1 ? 'book' : 'books'} found.`);
  }

  protected async use(book: CatalogueBook): Promise<void> {
    const chosen = await this.fillIn.choose({ books: [book], source: this.source, current: this.current() });
    if (Object.keys(chosen).length > 0) {
      this.filled.emit(chosen);
      this.results.set([]);
      this.message.set('Filled in from the catalogue. Check the details, then save.');
    }
  }
}

import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { RouterLink } from '@angular/router';

import { notebooksAbout } from '../notebook-data';
import { liveQueryFor } from '../../../core/data/live-query-for';

/** The notebooks attached to one book, for the book's page; live from this device. */
@Component({
  selector: 'll-book-notebooks',
  imports: [RouterLink, MatButtonModule, MatIconModule],
  templateUrl: './book-notebooks.html',
  styleUrl: './book-notebooks.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class BookNotebooks {
  /** The book whose notebooks to list. */
  readonly bookId = input.required<string>();

  private readonly found = liveQueryFor(this.bookId, notebooksAbout);
  protected readonly notebooks = computed(() => this.found() ?? []);
  protected readonly loaded = computed(() => this.found() !== undefined);
}

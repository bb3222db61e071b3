import { ChangeDetectionStrategy, Component, inject, input, output, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';

import { normalizeIsbn } from '@shared/isbn/normalize-isbn';

import { CatalogueClient } from '../catalogue-client';
import type { FillInResult } from '../fill-in-dialog/fill-in-dialog';
import type { FillValues } from '../fill-values';
import { OpenFillIn } from '../open-fill-in';

/**
 * "Fill in from the catalogue" beside a form's ISBN: looks the ISBN up, lets the reader choose
 * the match and the fields, and hands the chosen values back. Problems are said in the status
 * line under the button; offline, the ISBN is handed back through `queued` for later.
 */
@Component({
  selector: 'll-catalogue-fill',
  imports: [MatButtonModule, MatIconModule],
  template: `
    <button mat-stroked-button type="button" (click)="lookUp()" [disabled]="busy()">
      <mat-icon aria-hidden="true">travel_explore</mat-icon>
      Fill in from the catalogue
    </button>
    <p class="message" role="status">{{ message() }}</p>
  `,
  styles: `
    :host {
      display: block;
    }
    .message {
      margin: 0.25rem 0 0;
      min-height: 1.25rem;
      color: var(--mat-sys-on-surface-variant);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class CatalogueFill {
  private readonly client = inject(CatalogueClient);
  private readonly fillIn = inject(OpenFillIn);

  /** The ISBN as typed (ISBN-10 or ISBN-13, hyphens allowed). */
  readonly isbn = input.required<string>();
  /** What the form holds now, so nothing typed is replaced without asking. */
  readonly current = input.required<Partial<FillValues>>();
  /** The values the reader chose to take. */
  readonly filled = output<FillInResult>();
  /** The ISBN-13 to look up once online: the look-up could not run now. */
  readonly queued = output<string>();

  protected readonly busy = signal(false);
  protected readonly message = signal('');

  /** Looks the ISBN up now; after a barcode scan the scanned ISBN is passed, before the input catches up. */
  async lookUp(scanned?: string): Promise<void> {
    const isbn = normalizeIsbn(scanned ?? this.isbn() ?? '');
    if (!isbn) {
      this.message.set('Type or scan a valid ISBN first, then the catalogue can be asked.');
      return;
    }
    this.busy.set(true);
    this.message.set('Asking the catalogue…');
    const outcome = await this.client.lookUp(isbn);
    this.busy.set(false);
    if (outcome.kind === 'problem') {
      this.message.set(outcome.message);
      if (outcome.problem === 'offline') this.queued.emit(isbn);
      return;
    }
    this.message.set('');
    const chosen = await this.fillIn.choose({ books: outcome.books, source: outcome.source, current: this.current() });
    const count = Object.keys(chosen).length;
    if (count > 0) {
      this.filled.emit(chosen);
      this.message.set(`Filled in ${count} ${count === 1 ? 'detail' : 'details'} from the catalogue. Check them, then save.`);
    }
  }
}

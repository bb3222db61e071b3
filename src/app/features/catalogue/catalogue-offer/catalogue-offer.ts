import { ChangeDetectionStrategy, Component, computed, DestroyRef, effect, inject, input, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';

import type { CatalogueBook } from '@shared/api/catalogue';
import type { Book } from '@shared/sync/schema/collections';

import { JournalStore } from '../../../core/data/journal-store';
import { changedFields, toFormValue, type BookFormValue } from '../../library';
import { CatalogueClient } from '../catalogue-client';
import { matchLine } from '../fill-values';
import { OpenFillIn } from '../open-fill-in';
import { PendingLookups } from '../pending-lookups';

type OfferState =
  | { readonly kind: 'idle' | 'asking' | 'waiting' }
  | { readonly kind: 'found'; readonly books: readonly CatalogueBook[]; readonly source: string }
  | { readonly kind: 'none'; readonly message: string };

/**
 * On a book's page: a look-up the reader asked for while offline is run once there is a
 * connection, and what the catalogue found is offered ("We found details for this ISBN").
 * Taking it writes only the fields the reader chose; "Not now" forgets the offer.
 */
@Component({
  selector: 'll-catalogue-offer',
  imports: [MatButtonModule],
  templateUrl: './catalogue-offer.html',
  styleUrl: './catalogue-offer.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class CatalogueOffer {
  private readonly pending = inject(PendingLookups);
  private readonly client = inject(CatalogueClient);
  private readonly fillIn = inject(OpenFillIn);
  private readonly store = inject(JournalStore);

  readonly book = input.required<Book>();

  protected readonly isbn = computed(() => this.pending.all()[this.book().id] ?? null);
  protected readonly state = signal<OfferState>({ kind: 'idle' });
  protected readonly found = computed(() => {
    const state = this.state();
    return state.kind === 'found' ? state : null;
  });
  protected readonly problem = computed(() => {
    const state = this.state();
    return state.kind === 'none' ? state.message : null;
  });
  protected readonly matchLine = matchLine;

  constructor() {
    effect(() => {
      if (this.isbn() && this.state().kind === 'idle') void this.ask();
    });
    // Offline now: try again as soon as the browser says the network is back.
    const retry = () => {
      if (this.state().kind === 'waiting') void this.ask();
    };
    globalThis.addEventListener?.('online', retry);
    inject(DestroyRef).onDestroy(() => globalThis.removeEventListener?.('online', retry));
  }

  /** Asks the catalogue again (also the "Try now" button while waiting). */
  protected async ask(): Promise<void> {
    const isbn = this.isbn();
    if (!isbn) return;
    this.state.set({ kind: 'asking' });
    const outcome = await this.client.lookUp(isbn);
    if (outcome.kind === 'found') this.state.set({ kind: 'found', books: outcome.books, source: outcome.source });
    else if (outcome.problem === 'offline') this.state.set({ kind: 'waiting' });
    else this.state.set({ kind: 'none', message: outcome.message });
  }

  protected async review(books: readonly CatalogueBook[], source: string): Promise<void> {
    const before = toFormValue(this.book());
    const chosen = await this.fillIn.choose({ books, source, current: before });
    if (Object.keys(chosen).length === 0) return;
    const patch = changedFields(before, { ...before, ...chosen } as BookFormValue);
    await this.store.write('books', this.book().id, patch);
    this.forget();
  }

  protected forget(): void {
    this.pending.remove(this.book().id);
    this.state.set({ kind: 'idle' });
  }
}

import { ChangeDetectionStrategy, Component, input } from '@angular/core';

import type { Book } from '@shared/sync/schema/collections';

import { BookLoans } from './book-loans/book-loans';
import { LoanSettings } from './loan-settings/loan-settings';

/*
 * Today imports this area's index for its card, so whatever the index names statically lands in
 * Today's first download. The book page's and Settings' panels hold forms (Angular forms, form
 * fields, checkboxes: ~25 KB gzip), so the index offers them through these wrappers, whose
 * `@defer` loads the panel in its own chunk.
 */

/** The book page's loans section, loaded once the page is idle. */
@Component({
  selector: 'll-book-loans-section',
  imports: [BookLoans],
  template: `
    @defer (on idle) {
      <ll-book-loans [book]="book()" />
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class BookLoansSection {
  readonly book = input.required<Book>();
}

/** Settings' loan reminders and calendar panels, loaded once the page is idle. */
@Component({
  selector: 'll-loan-settings-section',
  imports: [LoanSettings],
  template: `
    @defer (on idle) {
      <ll-loan-settings />
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class LoanSettingsSection {}

import { ChangeDetectionStrategy, Component, inject, input, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { RouterLink } from '@angular/router';

import type { Library } from '@shared/sync/schema/collections';

import { LoanActions } from '../loan-actions';
import { downloadLoanIcs } from '../loan-ics';
import { LoanEditor } from '../loan-editor/loan-editor';
import type { LoanView } from '../loan-view';

/** One loan, hold or lending with where it stands and its one-click actions. */
@Component({
  selector: 'll-loan-item',
  imports: [RouterLink, MatButtonModule, LoanEditor],
  templateUrl: './loan-item.html',
  styleUrl: './loan-item.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class LoanItem {
  readonly view = input.required<LoanView>();
  readonly library = input<Library | undefined>();
  /** The reader's libraries, for the edit form's choice. */
  readonly libraries = input<readonly Library[]>([]);
  /** Off on the book page, which is already that book's. */
  readonly linkTitle = input(true);
  /** A sentence under it (will the reader finish before it is due). */
  readonly note = input<string | null>(null);

  protected readonly actions = inject(LoanActions);
  protected readonly problem = signal('');
  protected readonly editing = signal(false);
  protected readonly download = downloadLoanIcs;

  protected async renew(): Promise<void> {
    this.problem.set((await this.actions.renew(this.view().loan, this.library())) ?? '');
  }
}

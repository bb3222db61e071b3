import { ChangeDetectionStrategy, Component, computed } from '@angular/core';
import { RouterLink } from '@angular/router';

import { needsAttention } from '@shared/loans/loan-state';
import { byUrgency } from '@shared/loans/urgency';

import { readerToday } from '../../../core/time/reader-today';
import { loansData, NO_LOANS } from '../loans-data';
import { loanView } from '../loan-view';

/** Today's card: loans due within 3 days or overdue, and holds ready; nothing at all otherwise. */
@Component({
  selector: 'll-loans-today',
  imports: [RouterLink],
  templateUrl: './loans-today.html',
  styleUrl: './loans-today.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class LoansToday {
  private readonly today = readerToday();
  private readonly data = loansData();
  /** The store has answered (Today shows its cards together, so none pushes another down). */
  readonly loaded = computed(() => this.data() !== NO_LOANS);
  protected readonly items = computed(() => {
    const books = new Map(this.data().books.map((b) => [b.id, b]));
    const libraries = new Map(this.data().libraries.map((l) => [l.id, l]));
    return byUrgency(this.data().loans, this.today)
      .map((loan) => loanView(loan, this.today, books, libraries))
      .filter((v) => needsAttention(v.state));
  });
}

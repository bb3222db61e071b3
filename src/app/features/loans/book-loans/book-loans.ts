import { ChangeDetectionStrategy, Component, computed, inject, input, signal } from '@angular/core';
import { FormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { RouterLink } from '@angular/router';

import { finishBeforeDueSentence } from '@shared/loans/finish-before-due-sentence';
import { byUrgency } from '@shared/loans/urgency';
import type { Book, Session } from '@shared/sync/schema/collections';

import { JournalStore } from '../../../core/data/journal-store';
import { ReaderSettings } from '../../../core/settings/reader-settings';
import { liveQuerySignal } from '../../../core/data/live-query';
import { readerToday } from '../../../core/time/reader-today';
import { TIME_ZONE } from '../../../core/time/time-zone';
import { bookForecast, bookProgress } from '../../../core/read-model/book-forecast';
import { LoanItem } from '../loan-item/loan-item';
import { loansData } from '../loans-data';
import { loanView } from '../loan-view';

/** The book page's loans: each open loan of this book, will the reader finish before it is due, and a quick library loan. */
@Component({
  selector: 'll-book-loans',
  imports: [FormsModule, RouterLink, MatButtonModule, MatFormFieldModule, MatInputModule, LoanItem],
  templateUrl: './book-loans.html',
  styleUrl: './book-loans.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class BookLoans {
  readonly book = input.required<Book>();

  private readonly store = inject(JournalStore);
  private readonly timeZone = inject(TIME_ZONE);
  private readonly dates = inject(ReaderSettings);
  private readonly today = readerToday();
  private readonly data = loansData();
  private readonly sessions = liveQuerySignal(async (db) => ((await db.rows('sessions').toArray()) as Session[]).filter((s) => !s.deleted), [] as Session[]);
  protected readonly libraries = computed(() => this.data().libraries);
  protected readonly libraryById = computed(() => new Map(this.data().libraries.map((l) => [l.id, l])));

  protected readonly items = computed(() => {
    const book = this.book();
    const books = new Map(this.data().books.map((b) => [b.id, b]));
    const mine = this.data().loans.filter((l) => l.bookId === book.id);
    return byUrgency(mine, this.today)
      .map((loan) => loanView(loan, this.today, books, this.libraryById()))
      .filter((v) => v.state !== 'closed')
      .map((view) => ({ view, note: view.loan.kind !== 'lentOut' && view.loan.dueOn ? this.sentence(book, view.loan.dueOn) : null }));
  });

  protected readonly dueOn = signal('');
  protected readonly problem = signal('');

  /** "At your pace you finish around …" for a book being read. */
  private sentence(book: Book, dueOn: string): string | null {
    if (book.status !== 'reading') return null;
    const forecast = bookForecast(book, this.sessions(), this.data().books, this.today, this.timeZone);
    const { position, end } = bookProgress(
      book,
      this.sessions().filter((s) => s.bookId === book.id),
    );
    if (!forecast || end === null) return null;
    return finishBeforeDueSentence({
      remaining: end - position,
      pace: forecast.pace,
      minutesPerDay: forecast.minutesPerDay,
      today: this.today,
      timeZone: this.timeZone,
      dueOn,
      locale: this.dates.locale(),
    });
  }

  protected async borrow(): Promise<void> {
    if (!/^\d{4}-\d{2}-\d{2}$/.test(this.dueOn())) {
      this.problem.set('Choose the due date.');
      return;
    }
    await this.store.create('loans', { kind: 'library', bookId: this.book().id, startedOn: this.today, dueOn: this.dueOn(), renewalsUsed: 0 });
    this.problem.set('');
    this.dueOn.set('');
  }
}

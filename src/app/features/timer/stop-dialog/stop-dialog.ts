import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { FormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatSnackBar } from '@angular/material/snack-bar';

import { SESSION_MOODS, type Book, type Session } from '@shared/sync/schema/collections';

import { InvalidFieldsError } from '../../../core/data/field-errors';
import { JournalStore } from '../../../core/data/journal-store';
import { fieldError, showServerErrors } from '../../../ui/field-errors';
import { BookStatus } from '../../../core/read-model/book-status';
import { minutesText, minutesWords, positionEnd, positionUnit, reachedEnd } from '../book-progress';
import { CLOCK } from '../../../core/time/clock';
import { changedStopFields, MOOD_LABELS, stopFields, stopFormPrefill, stopProblems, type StopFormValue } from './stop-form-model';
import { ChoiceField } from '../../../ui/choice-field/choice-field';

/** The session the stop form is about; it is already saved when the dialog opens. */
export interface StopDialogData {
  readonly sessionId: string;
}

/**
 * After the timer stops: where the reader got to (in the book's own unit), the ebook location or
 * playback speed, a mood and a note. The session is already saved, so closing the dialog loses
 * nothing; saving writes only what changed, marks a TBR or paused book as reading, and offers to
 * mark it finished when the position is the book's end.
 */
@Component({
  selector: 'll-stop-dialog',
  imports: [ChoiceField, ReactiveFormsModule, MatDialogModule, MatButtonModule, MatFormFieldModule, MatInputModule],
  templateUrl: './stop-dialog.html',
  styleUrl: './stop-dialog.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class StopDialog {
  private readonly data = inject<StopDialogData>(MAT_DIALOG_DATA);
  private readonly ref = inject<MatDialogRef<StopDialog, boolean>>(MatDialogRef);
  private readonly store = inject(JournalStore);
  private readonly bookStatus = inject(BookStatus);
  private readonly clock = inject(CLOCK);
  private readonly snackBar = inject(MatSnackBar);

  protected readonly session = signal<Session | undefined>(undefined);
  protected readonly book = signal<Book | undefined>(undefined);
  private others: Session[] = [];
  protected readonly step = signal<'form' | 'finish'>('form');
  protected readonly sessionNotes = signal<string[]>([]);
  protected readonly problem = signal('');

  protected readonly form = inject(FormBuilder).nonNullable.group({
    toPosition: null as number | null,
    ebookLocation: ['', Validators.maxLength(40)],
    playbackSpeed: null as number | null,
    mood: '' as StopFormValue['mood'],
    note: ['', Validators.maxLength(2000)],
  });

  protected readonly unit = computed(() => positionUnit(this.book()));
  protected readonly end = computed(() => positionEnd(this.book()));
  protected readonly positionLabel = computed(() =>
    this.unit() === 'percent' ? 'Percent read' : this.unit() === 'minute' ? 'Minutes listened into the book' : 'Page you reached',
  );
  protected readonly positionHint = computed(() => {
    const end = this.end();
    if (this.unit() === 'percent') return 'From 0 to 100';
    if (end == null) return '';
    return this.unit() === 'minute' ? `Of ${end} (${minutesText(end)})` : `Of ${end} pages`;
  });
  protected readonly heading = computed(() => {
    const session = this.session();
    // Until the session is read, no length at all rather than a wrong one.
    if (!session) return 'Session saved';
    const minutes = minutesWords(session.activeMinutes);
    return this.unit() === 'minute' ? `You listened for ${minutes}` : `You read for ${minutes}`;
  });
  /** A session under a minute is not worth keeping unless the reader adds to it. */
  protected readonly underAMinute = computed(() => {
    const session = this.session();
    return !!session && !((session.activeMinutes ?? 0) >= 1);
  });
  protected readonly moods = SESSION_MOODS;
  protected readonly moodLabels = MOOD_LABELS;
  protected readonly fieldError = fieldError;

  constructor() {
    void this.load();
  }

  private async load(): Promise<void> {
    const session = await this.store.get('sessions', this.data.sessionId);
    if (!session) return;
    const [book, sessions] = await Promise.all([session.bookId ? this.store.get('books', session.bookId) : Promise.resolve(undefined), this.store.list('sessions')]);
    this.others = sessions;
    this.book.set(book);
    this.session.set(session);
    this.form.reset(
      stopFormPrefill(
        session,
        sessions.filter((s) => s.bookId === session.bookId),
      ),
    );
  }

  protected async save(): Promise<void> {
    const session = this.session();
    if (!session) return;
    this.form.markAllAsTouched();
    if (this.form.invalid) return;
    const fields = stopFields(this.form.getRawValue(), this.book());
    const problems = stopProblems(this.book(), session, fields, this.others, this.clock.now());
    this.sessionNotes.set(problems.session);
    if (Object.keys(problems.fields).length > 0) {
      showServerErrors(this.form, problems.fields);
      return;
    }
    try {
      await this.store.write('sessions', session.id, changedStopFields(session, fields));
    } catch (error) {
      if (error instanceof InvalidFieldsError) showServerErrors(this.form, error.fields);
      this.problem.set('This could not be saved. The session itself is kept as it was.');
      return;
    }
    const book = this.book();
    if (book && (book.status === 'tbr' || book.status === 'paused')) await this.bookStatus.change(book.id, 'reading');
    if (book && book.status !== 'finished' && reachedEnd(book, fields.toPosition ?? null)) this.step.set('finish');
    else this.ref.close(true);
  }

  protected async markFinished(): Promise<void> {
    const book = this.book();
    if (book) await this.bookStatus.change(book.id, 'finished');
    this.ref.close(true);
  }

  /** Skip: keeps the saved session as it is, except one under a minute, which it discards. */
  protected async skip(): Promise<void> {
    const session = this.session();
    if (this.step() === 'form' && session && this.underAMinute()) {
      await this.store.write('sessions', session.id, { deleted: true });
      this.snackBar.open('Under a minute, so the session was not kept.', 'OK', { duration: 6000 });
    }
    this.close();
  }

  protected close(): void {
    this.ref.close(this.step() === 'finish');
  }
}

import { ChangeDetectionStrategy, Component, computed, effect, inject, input, signal } from '@angular/core';
import { FormBuilder, ReactiveFormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { Router, RouterLink } from '@angular/router';

import { localDateTime } from '@shared/calendar/local-date-time';
import { sessionProblems } from '@shared/reading/session-problems';
import { SESSION_MOODS, type Book, type Session } from '@shared/sync/schema/collections';

import { InvalidFieldsError } from '../../../core/data/field-errors';
import { JournalStore } from '../../../core/data/journal-store';
import { UnsavedWork } from '../../../core/pwa/unsaved-work';
import { LEAVE_WITHOUT_ASKING } from '../../../core/pwa/unsaved-work-guard';
import { CLOCK } from '../../../core/time/clock';
import { TIME_ZONE } from '../../../core/time/time-zone';
import { fieldError, showServerErrors } from '../../../ui/field-errors';
import { TextField } from '../../../ui/text-field/text-field';
import { MOOD_LABELS, positionLabels } from '../book-position';
import { latestPosition } from '../../../core/read-model/reading-sessions';
import { SessionFollowUp } from '../session-follow-up';
import { changedSessionFields, EMPTY_SESSION_FORM, readSessionForm, spanMinutes, toSessionForm, type SessionFormValue } from './session-form-model';
import { ChoiceField } from '../../../ui/choice-field/choice-field';

/** A new session starts as the half hour just gone. */
const DEFAULT_MINUTES = 30;

/**
 * One reading session, typed in by hand (read without the timer) or corrected afterwards. Times
 * are the reader's wall-clock times in their zone and are stored as UTC. An impossible session
 * (backwards, in the future, over 20 hours, overlapping another) is refused with a reason per
 * field, and nothing is saved.
 */
@Component({
  selector: 'll-session-editor',
  imports: [ChoiceField, ReactiveFormsModule, RouterLink, MatButtonModule, MatFormFieldModule, MatInputModule, TextField],
  templateUrl: './session-editor.html',
  styleUrl: './session-editor.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SessionEditor {
  private readonly store = inject(JournalStore);
  private readonly router = inject(Router);
  private readonly followUp = inject(SessionFollowUp);
  private readonly clock = inject(CLOCK);

  /** The book, from the route. */
  readonly id = input.required<string>();
  /** The session, from the route; absent for a new one. */
  readonly sessionId = input<string>();

  /** The reader's zone, shown beside the times. */
  protected readonly timeZone = inject(TIME_ZONE);
  protected readonly form = inject(FormBuilder).nonNullable.group({ ...EMPTY_SESSION_FORM });
  protected readonly book = signal<Book | null>(null);
  protected readonly missing = signal(false);
  /** Every reason the session was refused, for the alert below the form. */
  protected readonly problems = signal<string[]>([]);
  protected readonly saving = signal(false);
  protected readonly format = computed(() => this.book()?.format ?? 'print');
  protected readonly positions = computed(() => positionLabels(this.format()));
  protected readonly moods = SESSION_MOODS;
  protected readonly moodLabels = MOOD_LABELS;
  protected readonly fieldError = fieldError;
  /** Cancel discards on purpose, so it leaves without asking. */
  protected readonly leaveWithoutAsking = LEAVE_WITHOUT_ASKING;

  private stored: Session | undefined;
  private original: SessionFormValue = EMPTY_SESSION_FORM;

  constructor() {
    inject(UnsavedWork).trackForm(this.form);
    effect(() => void this.load(this.id(), this.sessionId()));
    this.followSpan();
  }

  private async load(bookId: string, sessionId: string | undefined): Promise<void> {
    const book = await this.store.get('books', bookId);
    const session = sessionId ? await this.store.get('sessions', sessionId) : undefined;
    if (!book || book.deleted || (sessionId && (!session || session.deleted))) {
      this.missing.set(true);
      return;
    }
    this.book.set(book);
    this.stored = session;
    this.original = session ? toSessionForm(session, this.timeZone) : EMPTY_SESSION_FORM;
    this.form.reset(session ? this.original : await this.newSession(bookId));
  }

  /** The half hour just gone, from where the reader last got to in this book. */
  private async newSession(bookId: string): Promise<SessionFormValue> {
    const end = Math.floor(this.clock.now() / 60_000) * 60_000;
    const ownSessions = (await this.store.list('sessions')).filter((s) => s.bookId === bookId);
    const from = latestPosition(ownSessions)?.toPosition;
    return {
      ...EMPTY_SESSION_FORM,
      startedAt: localDateTime(new Date(end - DEFAULT_MINUTES * 60_000).toISOString(), this.timeZone),
      endedAt: localDateTime(new Date(end).toISOString(), this.timeZone),
      activeMinutes: String(DEFAULT_MINUTES),
      fromPosition: from == null ? '' : String(from),
    };
  }

  /**
   * Active minutes are the whole span until the reader says otherwise: while they still equal
   * the span (or are blank), moving a time moves them too.
   */
  private followSpan(): void {
    let last = this.form.getRawValue();
    this.form.valueChanges.subscribe(() => {
      const next = this.form.getRawValue();
      if (next.startedAt !== last.startedAt || next.endedAt !== last.endedAt) {
        const before = spanMinutes(last.startedAt, last.endedAt, this.timeZone);
        const after = spanMinutes(next.startedAt, next.endedAt, this.timeZone);
        const active = next.activeMinutes.trim();
        if (after !== null && after >= 0 && (active === '' || (before !== null && Number(active) === before))) {
          this.form.controls.activeMinutes.setValue(String(after), { emitEvent: false });
          next.activeMinutes = String(after);
        }
      }
      last = next;
    });
  }

  protected async save(): Promise<void> {
    const book = this.book();
    if (!book || this.saving()) return;
    this.problems.set([]);
    const value = this.form.getRawValue();
    const read = readSessionForm(value, book, this.timeZone);
    const sessionId = this.stored?.id ?? crypto.randomUUID();
    const patch = this.stored
      ? changedSessionFields(this.original, value, read.fields)
      : { ...read.fields, bookId: book.id, format: book.format ?? 'print', source: 'manual' as const, deleted: false };

    const candidate = { ...this.stored, ...patch, id: sessionId };
    const others = await this.store.list('sessions');
    const problems = { ...read.problems, ...sessionProblems(candidate, others, this.clock.now()) };
    if (Object.keys(problems).length > 0) return this.refuse(problems);

    this.saving.set(true);
    try {
      if (Object.keys(patch).length > 0) await this.store.write('sessions', sessionId, patch);
      this.form.markAsPristine();
      const toPosition = 'toPosition' in patch ? patch.toPosition : undefined;
      await this.followUp.afterSave({ bookId: book.id, isNew: !this.stored, toPosition });
      await this.router.navigate(['/library', book.id]);
    } catch (error) {
      if (error instanceof InvalidFieldsError) return this.refuse(error.fields);
      this.problems.set(['This session could not be saved. What was saved before is unchanged.']);
    } finally {
      this.saving.set(false);
    }
  }

  private refuse(problems: Record<string, string>): void {
    showServerErrors(this.form, problems);
    this.problems.set([...new Set(Object.values(problems))]);
  }
}

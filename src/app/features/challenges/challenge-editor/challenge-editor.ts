import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { FormArray, FormBuilder, FormControl, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatRadioModule } from '@angular/material/radio';
import { Router, RouterLink } from '@angular/router';
import { map } from 'rxjs';

import { COUNT_CHALLENGE_TARGETS } from '@shared/challenges/count-challenge-progress';
import { isoWeeksOfYear } from '@shared/calendar/iso-weeks-of-year';
import { isoWeekOf } from '@shared/calendar/iso-week-of';
import { CHALLENGE_KINDS, type Challenge } from '@shared/sync/schema/collections';

import { JournalStore } from '../../../core/data/journal-store';
import { UnsavedWork } from '../../../core/pwa/unsaved-work';
import { LEAVE_WITHOUT_ASKING } from '../../../core/pwa/unsaved-work-guard';
import { readerToday } from '../../../core/time/reader-today';
import { defaultChallengeName, KIND_LABELS } from '../../../ui/challenge-labels';
import { periodLine } from '../challenge-period';
import { challengeFormValidator, countTarget, newChallengeFields, weekYear, type ChallengeFormValue } from './challenge-form';
import { ReaderSettings } from '../../../core/settings/reader-settings';

/** What each kind asks of the reader, in a line. */
const KIND_ABOUT: Readonly<Record<NonNullable<Challenge['kind']>, string>> = {
  count: 'A number of books finished between two dates',
  alphabet: 'A book for every letter, by title or by the author’s surname',
  weekly: 'One book finished in each week of a year, Monday to Sunday',
  prompts: 'Your own list of prompts, each answered by a book',
};

/** Starts a challenge of any kind. */
@Component({
  selector: 'll-challenge-editor',
  imports: [ReactiveFormsModule, RouterLink, MatButtonModule, MatFormFieldModule, MatIconModule, MatInputModule, MatRadioModule],
  templateUrl: './challenge-editor.html',
  styleUrl: './challenge-editor.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ChallengeEditor {
  private readonly dates = inject(ReaderSettings);
  private readonly store = inject(JournalStore);
  private readonly router = inject(Router);
  private readonly today = readerToday();
  private readonly year = this.today.slice(0, 4);

  protected readonly kinds = CHALLENGE_KINDS;
  protected readonly kindLabels = KIND_LABELS;
  protected readonly kindAbout = KIND_ABOUT;
  protected readonly readyTargets = COUNT_CHALLENGE_TARGETS;

  protected readonly form = inject(FormBuilder).nonNullable.group(
    {
      kind: 'count' as ChallengeFormValue['kind'],
      name: ['', Validators.maxLength(200)],
      target: String(COUNT_CHALLENGE_TARGETS[0]),
      otherTarget: '',
      alphabetBy: 'title' as ChallengeFormValue['alphabetBy'],
      periodStart: `${this.year}-01-01`,
      periodEnd: `${this.year}-12-31`,
      // The ISO year of today, which differs from the calendar year in the last days of December.
      weekYear: String(isoWeekOf(this.today).year),
      weekFrom: 'this-week' as ChallengeFormValue['weekFrom'],
      prompts: new FormArray([new FormControl('', { nonNullable: true, validators: Validators.maxLength(300) })]),
    },
    { validators: challengeFormValidator },
  );
  private readonly value = toSignal(this.form.valueChanges.pipe(map(() => this.form.getRawValue())), { initialValue: this.form.getRawValue() });
  protected readonly kind = computed(() => this.value().kind);
  protected readonly namePlaceholder = computed(() => {
    const value = this.value();
    const year = value.kind === 'weekly' ? (weekYear(value.weekYear) ?? Number(this.year)) : Number(value.periodStart.slice(0, 4)) || Number(this.year);
    return defaultChallengeName(value.kind, { target: countTarget(value) ?? undefined, year });
  });
  /** The weeks of the chosen year, in words. */
  protected readonly weeksLine = computed(() => {
    const year = weekYear(this.value().weekYear);
    if (year === null) return '';
    const weeks = isoWeeksOfYear(year);
    return `${weeks.length} weeks: ${periodLine({ periodStart: weeks[0].monday, periodEnd: weeks[weeks.length - 1].sunday }, this.dates)}`;
  });
  protected readonly problem = signal('');
  /** Cancel discards on purpose, so it leaves without asking. */
  protected readonly leaveWithoutAsking = LEAVE_WITHOUT_ASKING;
  protected readonly prompts = this.form.controls.prompts;

  constructor() {
    inject(UnsavedWork).trackForm(this.form);
  }

  protected addPrompt(): void {
    this.prompts.push(new FormControl('', { nonNullable: true, validators: Validators.maxLength(300) }));
  }

  protected removePrompt(index: number): void {
    this.prompts.removeAt(index);
  }

  protected async save(): Promise<void> {
    this.form.markAllAsTouched();
    const errors = this.form.errors;
    if (errors) {
      this.problem.set(String(Object.values(errors)[0]));
      return;
    }
    if (this.form.invalid) {
      this.problem.set('Check the fields marked above.');
      return;
    }
    this.problem.set('');
    const id = await this.store.create(
      'challenges',
      newChallengeFields(this.form.getRawValue(), () => crypto.randomUUID(), this.today),
    );
    this.form.markAsPristine();
    await this.router.navigate(['/goals/challenges', id]);
  }
}

import { ChangeDetectionStrategy, Component, computed, inject, input, signal } from '@angular/core';
import { FormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { Router, RouterLink } from '@angular/router';

import { booksFinishedIn } from '@shared/challenges/books-finished-in';
import { challengeProgress } from '@shared/challenges/challenge-progress';
import type { PromptState } from '@shared/challenges/prompt-challenge-progress';
import type { WeekState } from '@shared/challenges/weekly-challenge-progress';
import type { Challenge } from '@shared/sync/schema/collections';

import { JournalStore } from '../../../core/data/journal-store';
import { UnsavedWork } from '../../../core/pwa/unsaved-work';
import { notBlank } from '../../../ui/field-errors';
import { AddLine } from '../../../ui/add-line/add-line';
import { TextField } from '../../../ui/text-field/text-field';
import { goalRecord } from '../../../core/read-model/goal-rows';
import { OneAtATime } from '../../../core/tasks/one-at-a-time';
import { celebrateOnce } from '../celebrate-once';
import { ChallengeCelebration } from '../challenge-celebration/challenge-celebration';
import { KIND_LABELS, progressLine, progressPercent } from '../../../ui/challenge-labels';
import { periodLine } from '../challenge-period';
import { undoableDelete } from '../../../ui/undoable-delete';
import { ReaderDatePipe } from '../../../ui/reader-date';
import { ReaderSettings } from '../../../core/settings/reader-settings';

type Prompt = NonNullable<Challenge['prompts']>[number];

const WEEK_STATES: Readonly<Record<WeekState, string>> = { met: 'Met', missed: 'Missed', upcoming: 'To come', before: 'Before the challenge' };
const PROMPT_STATES: Readonly<Record<PromptState, string>> = { done: 'Done', planned: 'Planned', open: 'Open' };

/** How many TBR books to suggest for each open letter. */
const SUGGESTIONS_PER_LETTER = 3;

/** One challenge: its progress, the books that counted, and the view its kind calls for. */
@Component({
  selector: 'll-challenge-page',
  imports: [AddLine, ReaderDatePipe, ReactiveFormsModule, RouterLink, MatButtonModule, MatIconModule, MatProgressBarModule, ChallengeCelebration, TextField],
  templateUrl: './challenge-page.html',
  styleUrl: './challenge-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ChallengePage {
  private readonly dates = inject(ReaderSettings);
  /** The challenge's id, from the route. */
  readonly id = input.required<string>();

  private readonly store = inject(JournalStore);
  private readonly promptUpdates = new OneAtATime();
  private readonly router = inject(Router);
  private readonly deleteWithUndo = undoableDelete();
  private readonly record = goalRecord();
  protected readonly loaded = computed(() => this.record.rows() !== null);
  protected readonly today = this.record.today;

  protected readonly challenge = computed(() => this.record.rows()?.challenges.find((row) => row.id === this.id()));
  protected readonly progress = computed(() => {
    const challenge = this.challenge();
    return challenge ? challengeProgress(challenge, { library: this.record.library(), today: this.today }) : null;
  });
  protected readonly line = computed(() => {
    const progress = this.progress();
    return progress ? progressLine(progress) : '';
  });
  protected readonly percent = computed(() => {
    const progress = this.progress();
    return progress ? progressPercent(progress) : 0;
  });
  protected readonly period = computed(() => periodLine(this.challenge() ?? {}, this.dates));
  protected readonly finished = computed(() => this.progress()?.progress.finished ?? false);

  private readonly celebration = celebrateOnce(
    computed(() => {
      const challenge = this.challenge();
      return challenge ? [{ challenge, finished: this.finished() }] : [];
    }),
  );
  protected readonly celebrating = computed(() => this.celebration.showing().has(this.id()));

  /** When each book was finished inside the challenge's period (its latest finish there). */
  private readonly finishDay = computed(() => {
    const challenge = this.challenge();
    const period = { start: challenge?.periodStart ?? '0001-01-01', end: challenge?.periodEnd ?? '9999-12-31' };
    return new Map(booksFinishedIn(this.record.finished(), period).map((book) => [book.id, book.finishedOn]));
  });
  /** The books that counted, in the order the challenge counted them. */
  protected readonly counted = computed(() =>
    [...new Set(this.progress()?.progress.counted ?? [])].map((id) => ({ id, title: this.title(id), finishedOn: this.finishDay().get(id) })),
  );

  protected readonly letters = computed(() => {
    const progress = this.progress();
    if (progress?.kind !== 'alphabet') return [];
    return progress.progress.letters.map((entry) => ({
      letter: entry.letter,
      book: entry.bookId ? { id: entry.bookId, title: this.title(entry.bookId) } : null,
      suggestions: (progress.progress.suggestions[entry.letter] ?? []).slice(0, SUGGESTIONS_PER_LETTER).map((id) => ({ id, title: this.title(id) })),
    }));
  });
  protected readonly openLetters = computed(() => {
    const progress = this.progress();
    return progress?.kind === 'alphabet' ? progress.progress.open : [];
  });

  protected readonly weeks = computed(() => {
    const progress = this.progress();
    if (progress?.kind !== 'weekly') return [];
    return progress.progress.weeks.map((week) => ({ ...week, titles: week.bookIds.map((id) => this.title(id)).join(', ') }));
  });
  protected readonly weekCounts = computed(() => {
    const counts: Record<WeekState, number> = { met: 0, missed: 0, upcoming: 0, before: 0 };
    for (const week of this.weeks()) counts[week.state]++;
    return counts;
  });

  protected readonly prompts = computed(() => {
    const progress = this.progress();
    return progress?.kind === 'prompts' ? progress.progress.prompts : [];
  });
  /** Every book of the library, by title, to answer a prompt with. */
  protected readonly libraryBooks = computed(() => [...(this.record.rows()?.books ?? [])].sort((a, b) => (a.title ?? '').localeCompare(b.title ?? '')));
  protected readonly renaming = signal(false);
  protected readonly renameForm = inject(FormBuilder).nonNullable.group({
    name: ['', [Validators.required, notBlank, Validators.maxLength(200)]],
  });

  protected readonly kindLabels = KIND_LABELS;
  protected readonly weekStates = WEEK_STATES;
  protected readonly promptStates = PROMPT_STATES;

  constructor() {
    inject(UnsavedWork).trackForm(this.renameForm);
  }

  protected startRename(): void {
    this.renameForm.reset({ name: this.challenge()?.name ?? '' });
    this.renaming.set(true);
  }

  protected cancelRename(): void {
    this.renameForm.reset();
    this.renaming.set(false);
  }

  /** Writes only the name; the challenge's books and progress stay as they are. */
  protected async saveName(): Promise<void> {
    if (this.renameForm.invalid) {
      this.renameForm.markAllAsTouched();
      return;
    }
    await this.store.write('challenges', this.id(), { name: this.renameForm.getRawValue().name.trim() });
    this.renameForm.markAsPristine();
    this.renaming.set(false);
  }

  protected closeCelebration(): void {
    this.celebration.close(this.id());
  }

  protected choosePromptBook(promptId: string, bookId: string): Promise<void> {
    return this.updatePrompts((prompts) => prompts.map((prompt) => (prompt.id === promptId ? { ...prompt, bookId: bookId || null } : prompt)));
  }

  protected async addPrompt(text: string): Promise<void> {
    await this.updatePrompts((prompts) => [...prompts, { id: crypto.randomUUID(), text, bookId: null }]);
  }

  protected removePrompt(promptId: string): Promise<void> {
    return this.updatePrompts((prompts) => prompts.filter((prompt) => prompt.id !== promptId));
  }

  /** Removes the challenge (a tombstone, so it syncs), with a way back. */
  protected async remove(): Promise<void> {
    const id = this.id();
    const name = this.challenge()?.name ?? 'The challenge';
    await this.deleteWithUndo('challenges', id, `${name} deleted.`);
    await this.router.navigate(['/goals/challenges']);
  }

  /**
   * Changes the prompts as stored now (not as last shown), one change at a time. The list is
   * written as a whole: across devices the later edit of the list wins, as for tags.
   */
  private updatePrompts(change: (prompts: Prompt[]) => Prompt[]): Promise<void> {
    const id = this.id();
    return this.promptUpdates.run(async () => {
      const stored = await this.store.get('challenges', id);
      await this.store.write('challenges', id, { prompts: change([...(stored?.prompts ?? [])]) });
    });
  }

  private title(bookId: string): string {
    return this.record.bookById().get(bookId)?.title || 'A book not on this device yet';
  }
}

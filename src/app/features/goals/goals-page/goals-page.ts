import { ChangeDetectionStrategy, Component, computed, inject, input, signal } from '@angular/core';
import { ReactiveFormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatCheckboxModule } from '@angular/material/checkbox';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { RouterLink } from '@angular/router';

import { booksFinishedIn } from '@shared/challenges/books-finished-in';
import { challengeProgress } from '@shared/challenges/challenge-progress';
import { monthlyAmounts, yearPeriod } from '@shared/goals/amounts-in';
import { type GoalUnit } from '@shared/goals/goal-unit';
import { yearGoalPacing } from '@shared/goals/year-goal-pacing';
import { deterministicId } from '@shared/sync/deterministic-id';
import type { YearPlan } from '@shared/sync/schema/collections';

import { JournalStore } from '../../../core/data/journal-store';
import { KIND_LABELS, progressLine, progressPercent } from '../../../ui/challenge-labels';
import { goalAmount, goalFigure, signedFigure, UNIT_LABELS } from '../../../ui/goal-figures';
import { goalRecord } from '../../../core/read-model/goal-rows';
import { OneAtATime } from '../../../core/tasks/one-at-a-time';
import { targetsByUnit } from '../targets-form';
import { planTargets } from '../plan-targets';
import { TargetFields } from '../target-fields/target-fields';
import { AddLine } from '../../../ui/add-line/add-line';
import { ReaderDatePipe } from '../../../ui/reader-date';
import { YearNav } from '../../../ui/year-nav/year-nav';
import { PaceBar } from '../pace-bar/pace-bar';

type OtherGoal = NonNullable<YearPlan['otherGoals']>[number];

/** Largest yearly targets the schema takes, by unit. */
const MAX_TARGETS: Readonly<Record<GoalUnit, number>> = { books: 10_000, pages: 10_000_000, minutes: 1_000_000 };

/**
 * A year of reading goals: targets in books, pages and minutes with their pace, the months,
 * the best book, other goals as a checklist, notes, and the challenges running that year.
 */
@Component({
  selector: 'll-goals-page',
  imports: [
    AddLine,
    ReaderDatePipe,
    ReactiveFormsModule,
    RouterLink,
    MatButtonModule,
    MatCheckboxModule,
    MatFormFieldModule,
    MatIconModule,
    MatInputModule,
    MatProgressBarModule,
    PaceBar,
    TargetFields,
    YearNav,
  ],
  templateUrl: './goals-page.html',
  styleUrl: './goals-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class GoalsPage {
  /** The year from the route ('2026'); the current year when absent. */
  readonly year = input<string>();

  private readonly store = inject(JournalStore);
  private readonly listUpdates = new OneAtATime();
  private readonly record = goalRecord();
  protected readonly today = this.record.today;
  protected readonly loaded = computed(() => this.record.rows() !== null);

  /** The year shown, or null for a route that names no year we keep. */
  protected readonly shownYear = computed(() => {
    const text = this.year();
    if (text === undefined) return Number(this.today.slice(0, 4));
    return /^\d{4}$/.test(text) && Number(text) >= 1900 && Number(text) <= 3000 ? Number(text) : null;
  });
  private readonly planId = computed(() => deterministicId('year-plan', String(this.shownYear())));
  protected readonly plan = computed(() => this.record.rows()?.yearPlans.find((plan) => plan.id === this.planId()));
  private readonly targets = computed(() => targetsByUnit(this.plan()));
  protected readonly hasTargets = computed(() => Object.keys(this.targets()).length > 0);

  protected readonly pacing = computed(() => {
    const year = this.shownYear();
    if (year === null) return [];
    return yearGoalPacing({ targets: this.targets(), year, today: this.today, finished: this.record.finished(), log: this.record.log() });
  });

  protected readonly months = computed(() => {
    const year = this.shownYear();
    if (year === null) return [];
    const plans = new Map((this.record.rows()?.monthPlans ?? []).map((plan) => [plan.id, plan]));
    return monthlyAmounts(year, this.record.finished(), this.record.log()).map((amounts, index) => {
      const month = `${year}-${String(index + 1).padStart(2, '0')}`;
      const booksTarget = plans.get(deterministicId('month-plan', month))?.booksTarget ?? null;
      return { month, number: String(index + 1).padStart(2, '0'), first: `${month}-01`, amounts, booksTarget, now: this.today.startsWith(month) };
    });
  });

  /** Books finished in the year, for the best book (and the one chosen, if it is another). */
  protected readonly bestCandidates = computed(() => {
    const year = this.shownYear();
    if (year === null) return [];
    const ids = booksFinishedIn(this.record.finished(), yearPeriod(year)).map((book) => book.id);
    const best = this.plan()?.bestBookId;
    if (best && !ids.includes(best)) ids.push(best);
    return ids.map((id) => ({ id, title: this.record.bookById().get(id)?.title ?? 'A book not on this device yet' }));
  });
  protected readonly bestBook = computed(() => {
    const id = this.plan()?.bestBookId;
    return id ? this.record.bookById().get(id) : undefined;
  });

  protected readonly otherGoals = computed<readonly OtherGoal[]>(() => this.plan()?.otherGoals ?? []);

  protected readonly challenges = computed(() => {
    const year = this.shownYear();
    if (year === null) return [];
    const { start, end } = yearPeriod(year);
    return (this.record.rows()?.challenges ?? [])
      .filter((challenge) => (challenge.periodStart ?? '') <= end && (challenge.periodEnd ?? '') >= start)
      .flatMap((challenge) => {
        const progress = challengeProgress(challenge, { library: this.record.library(), today: this.today });
        return progress ? [{ challenge, progress, line: progressLine(progress), percent: progressPercent(progress) }] : [];
      })
      .sort((a, b) => (a.challenge.name ?? '').localeCompare(b.challenge.name ?? ''));
  });

  protected readonly unitLabels = UNIT_LABELS;
  protected readonly kindLabels = KIND_LABELS;
  protected readonly maxTargets = MAX_TARGETS;
  protected readonly goalAmount = goalAmount;
  protected readonly goalFigure = goalFigure;
  protected readonly signedFigure = signedFigure;

  protected readonly editingTargets = signal(false);
  protected readonly notesSaved = signal(false);
  protected readonly targetsEditor = planTargets({
    max: MAX_TARGETS,
    plan: this.plan,
    key: this.shownYear,
    write: (targets) => this.writePlan(targets),
    refilled: () => this.editingTargets.set(false),
  });

  protected async saveTargets(): Promise<void> {
    if (await this.targetsEditor.save()) this.editingTargets.set(false);
  }

  protected cancelTargets(): void {
    this.targetsEditor.cancel();
    this.editingTargets.set(false);
  }

  protected chooseBest(bookId: string): Promise<void> {
    return this.writePlan({ bestBookId: bookId || null });
  }

  protected async addGoal(text: string): Promise<void> {
    await this.updateGoals((goals) => [...goals, { id: crypto.randomUUID(), text, done: false }]);
  }

  protected checkGoal(goal: OtherGoal, done: boolean): Promise<void> {
    return this.updateGoals((goals) => goals.map((entry) => (entry.id === goal.id ? { ...entry, done } : entry)));
  }

  protected removeGoal(goal: OtherGoal): Promise<void> {
    return this.updateGoals((goals) => goals.filter((entry) => entry.id !== goal.id));
  }

  /** Changes the checklist as stored now (not as last shown), one change at a time. */
  private updateGoals(change: (goals: OtherGoal[]) => OtherGoal[]): Promise<void> {
    const id = this.planId();
    return this.listUpdates.run(async () => {
      const stored = await this.store.get('yearPlans', id);
      await this.writePlan({ otherGoals: change([...(stored?.otherGoals ?? [])]) });
    });
  }

  protected async saveNotes(notes: string): Promise<void> {
    await this.writePlan({ notes: notes.trim() || null });
    this.notesSaved.set(true);
  }

  /** The year's one row (a name-based id), so two devices planning offline settle on one row. */
  private writePlan(patch: Partial<Omit<YearPlan, 'id'>>): Promise<void> {
    const year = this.shownYear()!;
    return this.store.write('yearPlans', deterministicId('year-plan', String(year)), { year, deleted: false, ...patch });
  }
}

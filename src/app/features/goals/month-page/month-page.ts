import { ChangeDetectionStrategy, Component, computed, effect, inject, input, signal } from '@angular/core';
import { ReactiveFormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { Title } from '@angular/platform-browser';
import { RouterLink } from '@angular/router';

import { booksFinishedIn } from '@shared/challenges/books-finished-in';
import { amountsInLog, monthPeriod } from '@shared/goals/amounts-in';
import { type GoalUnit } from '@shared/goals/goal-unit';
import { monthAccount } from '@shared/goals/month-account';
import { monthProgress } from '@shared/goals/month-progress';
import { deterministicId } from '@shared/sync/deterministic-id';
import type { MonthPlan } from '@shared/sync/schema/collections';

import { JournalStore } from '../../../core/data/journal-store';
import { liveQuerySignal } from '../../../core/data/live-query';
import { TIME_ZONE } from '../../../core/time/time-zone';
import { goalAmount, goalFigure, UNIT_LABELS } from '../../../ui/goal-figures';
import { goalRecord } from '../../../core/read-model/goal-rows';
import { MonthHeatmap } from '../month-heatmap/month-heatmap';
import { PaceBar } from '../pace-bar/pace-bar';
import { targetsByUnit } from '../targets-form';
import { planTargets } from '../plan-targets';
import { TargetFields } from '../target-fields/target-fields';
import { ReaderDatePipe } from '../../../ui/reader-date';
import { ReaderSettings } from '../../../core/settings/reader-settings';
import { NO_STATUS_CHANGES_OR_QUOTES, statusChangesAndQuotes } from '../goals-data';

/** Largest monthly targets the schema takes, by unit. */
const MAX_TARGETS: Readonly<Record<GoalUnit, number>> = { books: 1_000, pages: 1_000_000, minutes: 50_000 };

/**
 * One month as Lamplight reckons it from the journal: its sessions, minutes, days and quotes kept,
 * the pace against the reader's plan, the books started, finished and set aside, and the
 * reader's own notes (with a favourite of the month, if they like).
 */
@Component({
  selector: 'll-month-page',
  imports: [
    ReaderDatePipe,
    ReactiveFormsModule,
    RouterLink,
    MatButtonModule,
    MatFormFieldModule,
    MatIconModule,
    MatInputModule,
    MonthHeatmap,
    PaceBar,
    TargetFields,
  ],
  templateUrl: './month-page.html',
  styleUrl: './month-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class MonthPage {
  /** From the route: '2026'. */
  readonly year = input.required<string>();
  /** From the route: '03'. */
  readonly month = input.required<string>();

  private readonly store = inject(JournalStore);
  private readonly record = goalRecord();
  protected readonly loaded = computed(() => this.record.rows() !== null);

  /** 'YYYY-MM', or null for a route that names no real month. */
  protected readonly key = computed(() => {
    const year = this.year();
    const month = this.month().padStart(2, '0');
    const valid = /^\d{4}$/.test(year) && Number(year) >= 1900 && Number(year) <= 3000 && /^(0[1-9]|1[0-2])$/.test(month);
    return valid ? `${year}-${month}` : null;
  });
  protected readonly period = computed(() => {
    const key = this.key();
    return key ? monthPeriod(Number(key.slice(0, 4)), Number(key.slice(5))) : null;
  });
  protected readonly previous = computed(() => this.shift(-1));
  protected readonly next = computed(() => this.shift(1));

  private readonly planId = computed(() => deterministicId('month-plan', this.key() ?? ''));
  protected readonly plan = computed(() => this.record.rows()?.monthPlans.find((plan) => plan.id === this.planId()));
  protected readonly amounts = computed(() => {
    const period = this.period();
    return period ? amountsInLog(period, this.record.finished(), this.record.log()) : { books: 0, pages: 0, minutes: 0 };
  });
  protected readonly progress = computed(() => monthProgress({ targets: targetsByUnit(this.plan()), actuals: this.amounts() }));

  /** The books finished this month, earliest first, with their rows. */
  protected readonly books = computed(() => {
    const period = this.period();
    if (!period) return [];
    return booksFinishedIn(this.record.finished(), period).map((finished) => ({
      id: finished.id,
      finishedOn: finished.finishedOn,
      title: this.record.bookById().get(finished.id)?.title ?? finished.title,
    }));
  });
  private readonly timeZone = inject(TIME_ZONE);
  /** Status changes and quotes: what the month's account reads besides the goal rows. */
  private readonly journalExtras = liveQuerySignal(statusChangesAndQuotes, NO_STATUS_CHANGES_OR_QUOTES);
  protected readonly account = computed(() =>
    monthAccount({
      month: this.key() ?? '0000-01',
      today: this.record.today,
      timeZone: this.timeZone,
      sessions: this.record.rows()?.sessions ?? [],
      readings: this.record.rows()?.readings ?? [],
      statusChanges: this.journalExtras().bookStatusChanges,
      quotes: this.journalExtras().quotes,
    }),
  );
  private readonly titled = (ids: readonly string[]) => ids.map((id) => ({ id, title: this.record.bookById().get(id)?.title || 'Untitled' }));
  protected readonly started = computed(() => this.titled(this.account().started));
  protected readonly abandoned = computed(() => this.titled(this.account().abandoned));

  /** Books to choose a favourite from: this month's, and the chosen ones even if they moved. */
  protected readonly choices = computed(() => {
    const list = this.books().map((book) => ({ id: book.id, title: book.title }));
    for (const id of [this.plan()?.favouriteBookId]) {
      if (id && !list.some((book) => book.id === id)) list.push({ id, title: this.record.bookById().get(id)?.title ?? 'A book not on this device yet' });
    }
    return list;
  });

  protected readonly unitLabels = UNIT_LABELS;
  protected readonly maxTargets = MAX_TARGETS;
  protected readonly goalAmount = goalAmount;
  protected readonly goalFigure = goalFigure;
  protected readonly log = this.record.log;

  protected readonly reflectionSaved = signal(false);
  protected readonly targetsEditor = planTargets({ max: MAX_TARGETS, plan: this.plan, key: this.key, write: (targets) => this.writePlan(targets) });

  constructor() {
    const title = inject(Title);
    const dates = inject(ReaderSettings);
    effect(() => {
      const key = this.key();
      if (key) title.setTitle(`${dates.format(key, 'month')} · Lamplight`);
    });
  }

  protected choose(field: 'favouriteBookId', bookId: string): Promise<void> {
    return this.writePlan({ [field]: bookId || null });
  }

  protected async saveReflection(text: string): Promise<void> {
    await this.writePlan({ reflection: text.trim() || null });
    this.reflectionSaved.set(true);
  }

  /** The month's one row (a name-based id), so two devices planning offline settle on one row. */
  private writePlan(patch: Partial<Omit<MonthPlan, 'id'>>): Promise<void> {
    const month = this.key()!;
    return this.store.write('monthPlans', deterministicId('month-plan', month), { month, deleted: false, ...patch });
  }

  private shift(by: number): { year: string; month: string; first: string } | null {
    const key = this.key();
    if (!key) return null;
    const index = Number(key.slice(0, 4)) * 12 + Number(key.slice(5)) - 1 + by;
    const year = String(Math.floor(index / 12));
    const month = String((index % 12) + 1).padStart(2, '0');
    return Number(year) < 1900 || Number(year) > 3000 ? null : { year, month, first: `${year}-${month}-01` };
  }
}

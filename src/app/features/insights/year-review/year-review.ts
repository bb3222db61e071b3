import { ChangeDetectionStrategy, Component, computed, ElementRef, inject, input, signal, viewChild } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { RouterLink } from '@angular/router';

import { MONTH_NAMES } from '@shared/calendar/month-names';
import { formatSplit } from '@shared/insights/format-split';
import { yearReview } from '@shared/insights/year-review';
import { deterministicId } from '@shared/sync/deterministic-id';

import { Auth } from '../../../core/auth/auth';
import { goalAmount } from '../../../ui/goal-figures';
import { InsightsChart } from '../insights-chart/insights-chart';
import { formatsChart } from '../insights-figures';
import { insightsYear } from '../insights-year';
import { YearHeatmap } from '../year-heatmap/year-heatmap';
import { saveAsPng } from './save-as-png';

/**
 * The reader's year on one card: the totals, the best and highest rated books, the busiest
 * month, formats and every day of reading, savable as a PNG image to keep or share.
 */
@Component({
  selector: 'll-year-review',
  imports: [RouterLink, MatButtonModule, MatIconModule, InsightsChart, YearHeatmap],
  templateUrl: './year-review.html',
  styleUrl: './year-review.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class YearReview {
  /** The year from the route ('2026'). */
  readonly year = input<string>();

  private readonly data = insightsYear(this.year);
  private readonly card = viewChild<ElementRef<HTMLElement>>('card');
  protected readonly loaded = this.data.loaded;
  protected readonly shownYear = this.data.year;
  protected readonly log = this.data.record.log;
  private readonly auth = inject(Auth);
  protected readonly readerName = computed(() => this.auth.user()?.displayName ?? null);
  protected readonly saving = signal(false);
  protected readonly saveMessage = signal<string | null>(null);

  protected readonly review = computed(() => {
    const year = this.shownYear() ?? 0;
    const record = this.data.record;
    const planId = deterministicId('year-plan', String(year));
    const bestBookId = record.rows()?.yearPlans.find((plan) => plan.id === planId)?.bestBookId;
    return yearReview({ year, today: record.today, finished: record.finished(), books: record.bookById(), log: this.log(), bestBookId });
  });
  protected readonly formats = computed(() => formatsChart(formatSplit(this.data.books()), this.shownYear() ?? 0));
  protected readonly busiestMonth = computed(() => {
    const month = this.review().busiestMonth;
    return month ? MONTH_NAMES[Number(month.month.slice(5, 7)) - 1] : null;
  });
  protected readonly hours = computed(() => Math.round(this.review().minutes / 60).toLocaleString('en'));
  protected readonly goalAmount = goalAmount;

  protected async save(): Promise<void> {
    const card = this.card()?.nativeElement;
    if (!card || this.saving()) return;
    this.saving.set(true);
    this.saveMessage.set(null);
    const fileName = `lamplight-${this.shownYear()}-in-review.png`;
    try {
      await saveAsPng(card, fileName);
      this.saveMessage.set(`Saved as ${fileName} in your downloads. It stays on this device until you share it.`);
    } catch (error) {
      this.saveMessage.set(`The image could not be made (${error instanceof Error ? error.message : 'unknown reason'}). Nothing else changed; try again.`);
    } finally {
      this.saving.set(false);
    }
  }
}

import { ChangeDetectionStrategy, Component, computed, inject, input, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatButtonToggleModule } from '@angular/material/button-toggle';
import { MatIconModule } from '@angular/material/icon';
import { RouterLink } from '@angular/router';

import { monthlyAmounts } from '@shared/goals/amounts-in';
import { GOAL_UNITS, type GoalUnit } from '@shared/goals/goal-unit';
import { formatSplit } from '@shared/insights/format-split';
import { monthlyPace } from '@shared/insights/monthly-pace';
import { ratingSpread } from '@shared/insights/rating-spread';
import { topTerms } from '@shared/insights/top-terms';

import { ReaderSettings } from '../../../core/settings/reader-settings';
import { TIME_ZONE } from '../../../core/time/time-zone';
import { UNIT_LABELS } from '../../../ui/goal-figures';
import { InsightsChart } from '../insights-chart/insights-chart';
import { formatsChart, monthlyChart, paceChart, ratingsChart, termsChart } from '../insights-figures';
import { insightsYear } from '../insights-year';
import { YearHeatmap } from '../year-heatmap/year-heatmap';
import { YearNav } from '../../../ui/year-nav/year-nav';

/** How many genres and tags the charts name; the rest are counted in the summary. */
const TOP_TERMS = 8;

/**
 * A year of reading in pictures: month by month, every day, formats, ratings, genres and tags,
 * and pace, each chart with its text alternative. All from this device's journal.
 */
@Component({
  selector: 'll-insights-page',
  imports: [RouterLink, MatButtonModule, MatButtonToggleModule, MatIconModule, InsightsChart, YearHeatmap, YearNav],
  templateUrl: './insights-page.html',
  styleUrl: './insights-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class InsightsPage {
  /** The year from the route ('2026'); the current year when absent. */
  readonly year = input<string>();

  private readonly timeZone = inject(TIME_ZONE);
  private readonly dates = inject(ReaderSettings);
  private readonly data = insightsYear(this.year);
  protected readonly loaded = this.data.loaded;
  protected readonly shownYear = this.data.year;
  protected readonly log = this.data.record.log;
  protected readonly units = GOAL_UNITS;
  protected readonly unitLabels = UNIT_LABELS;
  protected readonly unit = signal<GoalUnit>('books');

  protected readonly monthly = computed(() => {
    const year = this.shownYear() ?? 0;
    return monthlyChart(monthlyAmounts(year, this.data.record.finished(), this.log()), this.unit(), year, this.dates.locale());
  });
  /** The year's breakdowns, a card each: formats, ratings, and the most frequent genres and tags. */
  protected readonly breakdowns = computed(() => {
    const year = this.shownYear() ?? 0;
    const books = this.data.books();
    const terms = (kind: 'genres' | 'tags') =>
      termsChart(
        topTerms(
          books.map((book) => book[kind]),
          TOP_TERMS,
        ),
        kind,
        year,
      );
    return [
      { id: 'formats', heading: 'Formats', of: 'format', model: formatsChart(formatSplit(books), year) },
      { id: 'ratings', heading: 'Ratings', of: 'rating', model: ratingsChart(ratingSpread(books.map((book) => book.rating)), year) },
      { id: 'genres', heading: 'Genres', of: 'genre', model: terms('genres') },
      { id: 'tags', heading: 'Tags', of: 'tag', model: terms('tags') },
    ];
  });
  protected readonly pace = computed(() => {
    const year = this.shownYear() ?? 0;
    return paceChart(monthlyPace(this.data.record.rows()?.sessions ?? [], year, this.timeZone), year, this.dates.locale());
  });
}

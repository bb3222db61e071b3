import { ChangeDetectionStrategy, Component, computed, inject, LOCALE_ID } from '@angular/core';

import { localDay } from '@shared/calendar/local-day';
import { dailyLog } from '@shared/reading-log/daily-log';
import { dayIndex } from '@shared/reading-log/day-index';
import { streaks } from '@shared/reading-log/streaks';
import { yearHeatmap, type HeatmapCell } from '@shared/reading-log/year-heatmap';
import type { Book, Session } from '@shared/sync/schema/collections';

import { liveQuerySignal } from '../../../core/data/live-query';
import { CLOCK } from '../../../core/time/clock';
import { TIME_ZONE } from '../../../core/time/time-zone';
import { logSessions } from '../../sessions/reading-sessions';

/** One month of the year, for the heatmap's labels and its text alternative. */
interface MonthTotal {
  readonly name: string;
  /** The heatmap column (week) of its first day, from 1. */
  readonly column: number;
  readonly days: number;
  readonly minutes: number;
}

/** Monday first, as ISO 8601 weeks: 1970-01-01 (day 0) was a Thursday. */
const weekday = (day: string) => (dayIndex(day) + 3) % 7;

/**
 * The daily reading log: minutes and pages today, the current and longest streak, and a heatmap
 * of the year, one cell per day in columns of weeks. Days are the reader's local days.
 */
@Component({
  selector: 'll-reading-log',
  templateUrl: './reading-log.html',
  styleUrl: './reading-log.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ReadingLog {
  private readonly timeZone = inject(TIME_ZONE);
  private readonly clock = inject(CLOCK);
  private readonly locale = inject(LOCALE_ID);

  private readonly data = liveQuerySignal(
    async (db) => ({
      sessions: (await db.rows('sessions').toArray()) as Session[],
      books: (await db.rows('books').toArray()) as Book[],
    }),
    { sessions: [] as Session[], books: [] as Book[] },
  );
  private readonly log = computed(() => dailyLog(logSessions(this.data().sessions, this.data().books), this.timeZone));

  protected readonly today = computed(() => {
    const day = localDay(new Date(this.clock.now()).toISOString(), this.timeZone);
    const entry = this.log().find((e) => e.day === day);
    return { day, minutes: Math.round(entry?.minutes ?? 0), pages: Math.round(entry?.pages ?? 0) };
  });
  protected readonly streaks = computed(() => streaks(this.log().map((e) => e.day), this.today().day));
  protected readonly year = computed(() => Number(this.today().day.slice(0, 4)));
  protected readonly cells = computed(() => yearHeatmap(this.log(), this.year()));
  /** Empty cells before 1 January, so each column is one Monday-to-Sunday week. */
  protected readonly leading = computed(() => Array.from({ length: weekday(this.cells()[0]!.day) }, (_, i) => i));
  protected readonly weeks = computed(() => Math.ceil((this.leading().length + this.cells().length) / 7));

  protected readonly months = computed<MonthTotal[]>(() => {
    const names = new Intl.DateTimeFormat(this.locale, { month: 'long', timeZone: 'UTC' });
    const lead = this.leading().length;
    return Array.from({ length: 12 }, (_, month) => {
      const prefix = `${this.cells()[0]!.day.slice(0, 5)}${String(month + 1).padStart(2, '0')}`;
      const first = this.cells().findIndex((cell) => cell.day.startsWith(prefix));
      const days = this.cells().filter((cell) => cell.day.startsWith(prefix));
      return {
        name: names.format(new Date(Date.UTC(2000, month, 1))),
        column: Math.floor((lead + first) / 7) + 1,
        days: days.filter((cell) => cell.minutes > 0).length,
        minutes: Math.round(days.reduce((sum, cell) => sum + cell.minutes, 0)),
      };
    });
  });

  /** The heatmap in one sentence, for screen readers. */
  protected readonly summary = computed(() => {
    const days = this.cells().filter((cell) => cell.minutes > 0).length;
    const minutes = Math.round(this.cells().reduce((sum, cell) => sum + cell.minutes, 0));
    if (days === 0) return `Reading in ${this.year()}: no reading yet`;
    return `Reading in ${this.year()}: ${days} ${days === 1 ? 'day' : 'days'}, ${minutes} minutes in all. Month totals follow.`;
  });

  protected cellTitle(cell: HeatmapCell): string {
    return `${cell.day}: ${Math.round(cell.minutes)} min`;
  }

  protected plural(count: number, word: string): string {
    return `${count} ${count === 1 ? word : `${word}s`}`;
  }
}

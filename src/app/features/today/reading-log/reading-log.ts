import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';

import { localDay } from '@shared/calendar/local-day';
import { dailyLog } from '@shared/reading-log/daily-log';
import { streaks } from '@shared/reading-log/streaks';

import { liveQuerySignal } from '../../../core/data/live-query';
import { CLOCK } from '../../../core/time/clock';
import { TIME_ZONE } from '../../../core/time/time-zone';
import { YearHeatmap } from '../../insights';
import { logSessions } from '../../../core/read-model/reading-sessions';
import { allSessionsAndBooks, NO_SESSIONS } from '../today-data';

/**
 * The daily reading log: minutes and pages today, the current and longest streak, and a heatmap
 * of the year (`ll-year-heatmap`). Days are the reader's local days.
 */

@Component({
  selector: 'll-reading-log',
  imports: [YearHeatmap],
  templateUrl: './reading-log.html',
  styleUrl: './reading-log.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ReadingLog {
  private readonly timeZone = inject(TIME_ZONE);
  private readonly clock = inject(CLOCK);

  private readonly data = liveQuerySignal(allSessionsAndBooks, NO_SESSIONS);
  /** The journal has answered (the heatmap renders only then, after Today's first screen). */
  protected readonly loaded = computed(() => this.data() !== NO_SESSIONS);
  protected readonly log = computed(() => dailyLog(logSessions(this.data().sessions, this.data().books), this.timeZone));

  protected readonly today = computed(() => {
    const day = localDay(new Date(this.clock.now()).toISOString(), this.timeZone);
    const entry = this.log().find((e) => e.day === day);
    return { day, minutes: Math.round(entry?.minutes ?? 0), pages: Math.round(entry?.pages ?? 0) };
  });
  protected readonly streaks = computed(() =>
    streaks(
      this.log().map((e) => e.day),
      this.today().day,
    ),
  );
  protected readonly year = computed(() => Number(this.today().day.slice(0, 4)));

  protected plural(count: number, word: string): string {
    return `${count} ${count === 1 ? word : `${word}s`}`;
  }
}

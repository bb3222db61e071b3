import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { RouterLink } from '@angular/router';

import { challengeProgress } from '@shared/challenges/challenge-progress';

import { goalRecord } from '../../../core/read-model/goal-rows';
import { celebrateOnce } from '../celebrate-once';
import { ChallengeCelebration } from '../challenge-celebration/challenge-celebration';
import { KIND_LABELS, progressLine, progressPercent } from '../../../ui/challenge-labels';
import { periodLine } from '../challenge-period';
import { ReaderSettings } from '../../../core/settings/reader-settings';

/** Every challenge, running ones first, with its progress. */
@Component({
  selector: 'll-challenges-list',
  imports: [RouterLink, MatButtonModule, MatIconModule, MatProgressBarModule, ChallengeCelebration],
  templateUrl: './challenges-list.html',
  styleUrl: './challenges-list.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ChallengesList {
  private readonly dates = inject(ReaderSettings);
  private readonly record = goalRecord();
  protected readonly loaded = computed(() => this.record.rows() !== null);
  protected readonly today = this.record.today;

  protected readonly rows = computed(() =>
    (this.record.rows()?.challenges ?? [])
      .map((challenge) => {
        const progress = challengeProgress(challenge, { library: this.record.library(), today: this.today });
        const running = (challenge.periodStart ?? '') <= this.today && this.today <= (challenge.periodEnd ?? '');
        return {
          challenge,
          progress,
          running,
          finished: progress?.progress.finished ?? false,
          line: progress ? progressLine(progress) : '',
          percent: progress ? progressPercent(progress) : 0,
          period: periodLine(challenge, this.dates),
        };
      })
      // Running ones first, then the latest to start; names settle ties.
      .sort(
        (a, b) =>
          Number(b.running) - Number(a.running) ||
          (b.challenge.periodStart ?? '').localeCompare(a.challenge.periodStart ?? '') ||
          (a.challenge.name ?? '').localeCompare(b.challenge.name ?? ''),
      ),
  );
  private readonly celebration = celebrateOnce(this.rows);
  protected readonly celebrating = computed(() => this.rows().filter((row) => this.celebration.showing().has(row.challenge.id)));
  protected readonly close = this.celebration.close;
  protected readonly kindLabels = KIND_LABELS;
}

import { ChangeDetectionStrategy, Component, inject, input, output, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';

import type { TextVersion } from '@shared/api/text-history';
import { ReaderSettings } from '../../../core/settings/reader-settings';
import { TextHistoryApi } from './text-history-api';

/**
 * A page's earlier versions (the last 30 days, one per ten minutes of editing, kept by the
 * server) and a way back to one. Restoring is an ordinary edit of the page, so it syncs and can
 * itself be undone from the history.
 */
@Component({
  selector: 'll-page-history',
  imports: [MatButtonModule, MatIconModule],
  templateUrl: './page-history.html',
  styleUrl: './page-history.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PageHistory {
  private readonly api = inject(TextHistoryApi);
  private readonly dates = inject(ReaderSettings);

  /** The page whose history this is. */
  readonly pageId = input.required<string>();
  /** The reader chose to bring a version back. */
  readonly restore = output<string>();

  protected readonly state = signal<'closed' | 'loading' | 'open' | 'offline'>('closed');
  protected readonly versions = signal<readonly TextVersion[]>([]);
  protected readonly chosen = signal<TextVersion | null>(null);

  protected async open(): Promise<void> {
    this.state.set('loading');
    this.chosen.set(null);
    try {
      const answer = await this.api.pageVersions(this.pageId());
      this.versions.set(answer.versions);
      this.state.set('open');
    } catch {
      this.state.set('offline');
    }
  }

  protected close(): void {
    this.state.set('closed');
  }

  protected restoreChosen(): void {
    const version = this.chosen();
    if (!version) return;
    this.restore.emit(version.text);
    this.state.set('closed');
  }

  protected when(version: TextVersion): string {
    return this.dates.format(version.savedAt, 'dayTime');
  }
}

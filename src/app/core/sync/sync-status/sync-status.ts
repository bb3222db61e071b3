import { ChangeDetectionStrategy, Component, computed, inject, viewChild } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { MatMenu, MatMenuItem, MatMenuTrigger } from '@angular/material/menu';

import { MONTH_NAMES } from '@shared/calendar/month-names';

import { CLOCK } from '../../time/clock';
import { SyncEngine } from '../sync-engine';
import { SyncDetails } from './sync-details';
import { deferredMenu, type MenuTriggerLike } from '../../../ui/deferred-menu';

// Written out rather than with date-fns, whose format and locale (~5 KB gzip) the shell would load first.
const twoDigits = (n: number) => String(n).padStart(2, '0');
/** 'HH:mm' in local time. */
const hoursMinutes = (at: Date) => `${twoDigits(at.getHours())}:${twoDigits(at.getMinutes())}`;
const sameLocalDay = (a: Date, b: Date) => a.toDateString() === b.toDateString();

/** The shell's calm line about where the reader's words are: here, waiting, syncing, synced. */
@Component({
  selector: 'll-sync-status',
  imports: [MatButtonModule, MatIconModule, MatMenu, MatMenuItem, MatMenuTrigger, SyncDetails],
  templateUrl: './sync-status.html',
  styleUrl: './sync-status.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SyncStatus {
  protected readonly engine = inject(SyncEngine);
  private readonly clock = inject(CLOCK);

  /** The icon and the short label shown in the bar. */
  protected readonly summary = computed(() => {
    const pending = this.engine.pending();
    const waiting = `${pending} ${pending === 1 ? 'change' : 'changes'} waiting`;
    const rejected = this.engine.rejected().length;
    switch (this.engine.phase()) {
      case 'needs-sign-in':
        return { icon: 'key', label: 'Sign in to sync' };
      case 'offline':
        return { icon: 'cloud_off', label: pending > 0 ? `Offline · ${waiting}` : 'Offline · saved here' };
      case 'syncing': {
        const progress = this.engine.pullProgress();
        if (!progress) return { icon: 'sync', label: 'Syncing…' };
        return { icon: 'sync', label: `Syncing ${progress.rows.toLocaleString()} of about ${progress.aboutTotal!.toLocaleString()}` };
      }
      case 'retrying':
        return { icon: 'schedule', label: pending > 0 ? waiting : 'Will retry' };
      case 'idle': {
        if (pending > 0) return { icon: 'cloud_upload', label: waiting };
        if (rejected > 0) return { icon: 'report', label: `${rejected} ${rejected === 1 ? 'change' : 'changes'} refused` };
        const last = this.engine.lastSyncedAt();
        if (!last) return { icon: 'save', label: 'Saved on this device' };
        // A time alone for today; with the day otherwise, so yesterday's sync does not read as today's.
        const at = new Date(last);
        const when = sameLocalDay(at, new Date(this.clock.now()))
          ? hoursMinutes(at)
          : `${at.getDate()} ${MONTH_NAMES[at.getMonth()].slice(0, 3)}, ${hoursMinutes(at)}`;
        return { icon: 'cloud_done', label: `Synced ${when}` };
      }
    }
  });

  private readonly detailsTrigger = viewChild<MenuTriggerLike>('detailsTrigger');
  protected readonly openDetails = deferredMenu(this.detailsTrigger);

  protected syncNow(): void {
    void this.engine.syncNow();
  }
}

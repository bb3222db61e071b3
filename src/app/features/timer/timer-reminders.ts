import { computed, effect, inject, Injectable, signal, untracked } from '@angular/core';

import { browserStorage } from '../../core/device/browser-storage';
import { NOTIFIER } from './notifier';
import { ReadingTimer } from './reading-timer';

const MINUTE = 60_000;
/** Suggest a break after this much reading without one (the common 20-20-20 rule of thumb). */
export const BREAK_EVERY_MS = 20 * MINUTE;
/** A pause at least this long counts as the break (20 seconds of looking away, in that rule). */
export const BREAK_LENGTH_MS = 20_000;
const NOTIFY_KEY = 'lamplight.timerNotify';

/**
 * The timer's gentle reminders, app-wide while a timer runs: a notification when the target is
 * reached (on the device that runs the timer, when the reader turned it on and the browser
 * allows it; the timer page says so in any case), and a break suggestion after 20 minutes of
 * reading without a pause of 20 seconds or more.
 */
@Injectable({ providedIn: 'root' })
export class TimerReminders {
  private readonly timer = inject(ReadingTimer);
  private readonly notifier = inject(NOTIFIER);
  private readonly notifyState = signal(browserStorage.read<boolean>(NOTIFY_KEY) ?? false);
  private readonly permissionState = signal(this.notifier.permission());
  /** Elapsed time at the last break (a long pause, or the reader saying thanks). */
  private readonly breakFrom = signal(0);

  /** The reader wants a notification when the target is reached (remembered on this device). */
  readonly notifyWanted = this.notifyState.asReadonly();
  /** What the browser allows. */
  readonly permission = this.permissionState.asReadonly();
  /** A notification will actually be shown. */
  readonly notifies = computed(() => this.notifyState() && this.permissionState() === 'granted');
  /** The active timer's target in minutes, if any. */
  readonly target = computed(() => this.timer.active()?.targetMinutes ?? null);
  /** Whole minutes still to read to the target (rounded up), or `null` without one. */
  readonly minutesToGo = computed(() => {
    const target = this.target();
    return target ? Math.max(0, Math.ceil((target * MINUTE - this.timer.elapsedMs()) / MINUTE)) : null;
  });
  readonly targetReached = computed(() => this.minutesToGo() === 0);
  /** Time for a break: 20 minutes read since the last one, and still reading. */
  readonly breakDue = computed(() => this.timer.active()?.state === 'running' && this.timer.elapsedMs() - this.breakFrom() >= BREAK_EVERY_MS);

  constructor() {
    let run: string | null = null;
    let lastElapsed = 0;
    let lastPausedMs = 0;
    effect(() => {
      const timer = this.timer.active();
      const elapsed = this.timer.elapsedMs();
      untracked(() => {
        const key = timer ? `${timer.deviceId}|${timer.startedAt}` : null;
        if (key !== run) {
          // A new run, or this app just opened on one: no news for what already happened.
          run = key;
          lastElapsed = elapsed;
          lastPausedMs = timer?.pausedMs ?? 0;
          this.breakFrom.set(Math.floor(elapsed / BREAK_EVERY_MS) * BREAK_EVERY_MS);
          return;
        }
        if (!timer) return;
        if ((timer.pausedMs ?? 0) - lastPausedMs >= BREAK_LENGTH_MS) this.breakFrom.set(elapsed);
        lastPausedMs = timer.pausedMs ?? 0;
        const target = (timer.targetMinutes ?? 0) * MINUTE;
        if (target && lastElapsed < target && elapsed >= target && !this.timer.runningElsewhere() && this.notifies()) {
          const title = this.timer.book()?.title;
          void this.notifier.show('Reading target reached', `You have read for ${timer.targetMinutes} minutes${title ? ` of ${title}` : ''}.`);
        }
        lastElapsed = elapsed;
      });
    });
  }

  /**
   * Turns the target notification on or off. Permission is asked only here, when the reader
   * turns it on and the browser has not been answered yet.
   */
  async setNotify(on: boolean): Promise<void> {
    this.notifyState.set(on);
    browserStorage.write(NOTIFY_KEY, on);
    const permission = this.notifier.permission();
    this.permissionState.set(on && permission === 'default' ? await this.notifier.requestPermission() : permission);
  }

  /** The reader took the suggested break (or waved it away): count from now. */
  dismissBreak(): void {
    this.breakFrom.set(this.timer.elapsedMs());
  }
}

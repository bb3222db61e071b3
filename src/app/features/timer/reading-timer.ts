import { computed, effect, inject, Injectable, signal, type Signal } from '@angular/core';

import { MAX_SESSION_HOURS } from '@shared/reading/session-problems';
import { pauseTimer, resumeTimer, sessionFromTimer, startTimer, timerElapsedMs } from '@shared/reading/timer-clock';
import { deterministicId } from '@shared/sync/deterministic-id';
import type { Session, Timer } from '@shared/sync/schema/collections';

import { JournalStore, type RowWrite } from '../../core/data/journal-store';
import { liveQuerySignal } from '../../core/data/live-query';
import { deviceId } from '../../core/device/device-id';
import { thisDeviceName } from '../../core/device/device-name';
import { latestSession } from './book-progress';
import { NO_TIMER, TIMER_ROW_ID, timerAndBook } from './timer-data';
import { CLOCK } from '../../core/time/clock';

export { TIMER_ROW_ID } from './timer-data';

/** What `start` did: started, or refused because another timer runs (`current`). */
export type StartOutcome = { readonly started: true; readonly stoppedSessionId: string | null } | { readonly started: false; readonly current: Timer };

/** The timer is running or paused (not idle, not deleted). */
export function isActive(timer: Timer | undefined | null): timer is Timer {
  return !!timer && !timer.deleted && (timer.state === 'running' || timer.state === 'paused');
}

/**
 * The id of the session a timer run leaves behind, named after the run (the device that started
 * it and when), so two devices stopping the same run offline write to one session, not two.
 */
export function sessionIdOf(timer: Pick<Timer, 'deviceId' | 'startedAt'>): string {
  return deterministicId('timer-session', `${timer.deviceId ?? ''}|${timer.startedAt ?? ''}`);
}

const MAX_SESSION_MS = MAX_SESSION_HOURS * 3600_000;

/**
 * The reader's reading timer. It is stored, not counted: each action writes the timer row
 * (start, pauses) and the elapsed time is always computed from those timestamps, so a reload,
 * a closed tab, a sleeping device or a day offline lose nothing, and other devices see it
 * through sync. One timer per reader.
 */
@Injectable({ providedIn: 'root' })
export class ReadingTimer {
  private readonly store = inject(JournalStore);
  private readonly clock = inject(CLOCK);
  private readonly live = liveQuerySignal(timerAndBook, NO_TIMER);
  private readonly nowMs = signal(this.clock.now());

  /** The stored timer row, live (from this tab, other tabs and sync). */
  readonly timer: Signal<Timer | undefined> = computed(() => this.live().timer);
  /** The timer when it is running or paused, else `null`. */
  readonly active = computed(() => (isActive(this.timer()) ? this.timer()! : null));
  /** The book the active timer is for. */
  readonly book = computed(() => (this.active() ? this.live().book : undefined));
  /** The row has been read from this device at least once. */
  readonly loaded = computed(() => this.live().loaded);
  /** Now, refreshed every second while a timer is active: for display only, never stored. */
  readonly now = this.nowMs.asReadonly();
  /** Time read so far, pauses left out, computed from the stored timestamps. */
  readonly elapsedMs = computed(() => {
    const timer = this.active();
    return timer ? timerElapsedMs(timer, this.nowMs()) : 0;
  });
  /** The active timer was started on another device (it can still be stopped here). */
  readonly runningElsewhere = computed(() => {
    const timer = this.active();
    return !!timer && timer.deviceId !== deviceId();
  });

  constructor() {
    effect((onCleanup) => {
      const timer = this.active();
      this.nowMs.set(this.clock.now());
      if (!timer) return;
      onCleanup(this.clock.every(1000, () => this.nowMs.set(this.clock.now())));
    });
  }

  /**
   * Starts a timer for a book. While another one is active it refuses and returns it, unless
   * `replace` is set: then the current one is stopped into a session first, in the same write.
   * The start position is where the reader's latest session of the book ended.
   */
  async start(bookId: string, options: { targetMinutes?: number | null; replace?: boolean } = {}): Promise<StartOutcome> {
    const current = await this.readActive();
    if (current && !options.replace) return { started: false, current };
    const deviceName = await thisDeviceName();
    const now = this.clock.now();
    const writes: RowWrite[] = [];
    let stoppedSessionId: string | null = null;
    if (current) {
      const stopped = await this.sessionWrite(current, now);
      writes.push(stopped);
      stoppedSessionId = stopped.rowId;
    }
    const sessions = await this.sessionsOf(bookId);
    const startPosition = latestSession(sessions, bookId, { having: 'toPosition' })?.toPosition ?? null;
    // Only the new run's fields: writing "idle" and then "running" under one clock would send
    // two values of one field with the same clock.
    const patch = startTimer(now, { bookId, deviceId: deviceId(), deviceName, targetMinutes: options.targetMinutes, startPosition });
    writes.push({ collection: 'timers', rowId: TIMER_ROW_ID, patch });
    await this.store.writeAll(writes);
    return { started: true, stoppedSessionId };
  }

  /** Pauses a running timer (only when it started; a paused one does not count). */
  async pause(): Promise<void> {
    const timer = await this.readActive();
    if (timer) await this.store.write('timers', TIMER_ROW_ID, pauseTimer(timer, this.clock.now()));
  }

  /** Resumes a paused timer. */
  async resume(): Promise<void> {
    const timer = await this.readActive();
    if (timer) await this.store.write('timers', TIMER_ROW_ID, resumeTimer(timer, this.clock.now()));
  }

  /** Sets or clears the target ("read for 30 minutes") of the active timer. */
  async setTarget(minutes: number | null): Promise<void> {
    if (await this.readActive()) await this.store.write('timers', TIMER_ROW_ID, { targetMinutes: minutes });
  }

  /**
   * Stops the active timer: writes its session and sets the timer idle in one transaction, and
   * returns the session's id (for the stop form), or `null` when no timer was active.
   */
  async stop(): Promise<string | null> {
    const timer = await this.readActive();
    if (!timer) return null;
    const session = await this.sessionWrite(timer, this.clock.now());
    await this.store.writeAll([session, { collection: 'timers', rowId: TIMER_ROW_ID, patch: { state: 'idle', pausedAt: null } }]);
    return session.rowId;
  }

  /** Throws the active timer away: idle again, no session. */
  async discard(): Promise<void> {
    if (await this.readActive()) await this.store.write('timers', TIMER_ROW_ID, { state: 'idle', pausedAt: null });
  }

  /** Reads the row afresh rather than trusting the signal, which may lag a write by a moment. */
  private async readActive(): Promise<Timer | null> {
    const timer = await this.store.get('timers', TIMER_ROW_ID);
    return isActive(timer) ? timer : null;
  }

  private async sessionsOf(bookId: string): Promise<Session[]> {
    return (await this.store.list('sessions')).filter((s) => s.bookId === bookId);
  }

  /**
   * The session of a timer stopped at `now`: from its timestamps, in the book's format, starting
   * where the reader's previous session of the book ended. A run over 20 hours was a timer left
   * running; it is kept as 20 hours, the longest session there can be.
   */
  private async sessionWrite(timer: Timer, now: number): Promise<RowWrite & { rowId: string }> {
    const book = timer.bookId ? await this.store.get('books', timer.bookId) : undefined;
    const rowId = sessionIdOf(timer);
    const previous = timer.bookId ? latestSession(await this.sessionsOf(timer.bookId), timer.bookId, { exceptId: rowId, having: 'toPosition' }) : undefined;
    const fromTimer = sessionFromTimer(timer, now);
    const started = Date.parse(fromTimer.startedAt!);
    const tooLong = Date.parse(fromTimer.endedAt!) - started > MAX_SESSION_MS;
    const session: Partial<Session> = {
      ...fromTimer,
      format: book?.format ?? null,
      fromPosition: previous?.toPosition ?? timer.startPosition ?? null,
      ...(tooLong
        ? { endedAt: new Date(started + MAX_SESSION_MS).toISOString(), activeMinutes: Math.min(fromTimer.activeMinutes ?? 0, MAX_SESSION_HOURS * 60) }
        : {}),
      deleted: false,
    };
    return { collection: 'sessions', rowId, patch: session };
  }
}

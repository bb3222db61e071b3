import { HttpClient, HttpErrorResponse } from '@angular/common/http';
import { computed, DestroyRef, effect, inject, Injectable, linkedSignal, signal } from '@angular/core';
import { takeUntilDestroyed } from '@angular/core/rxjs-interop';
import { debounceTime, firstValueFrom } from 'rxjs';

import type { HealthAnswer } from '@shared/api/health';
import { dateLooksWrong } from '@shared/sync/device-clock';
import { runSyncCycle, type PullProgress } from '@shared/sync/sync-cycle';

import { Auth } from '../auth/auth';
import { isUnreachable } from '../http/api-error-message';
import type { JournalDb } from '../data/journal-db';
import { JournalStore } from '../data/journal-store';
import { liveQuerySignal } from '../data/live-query';
import { liveQueryFor } from '../data/live-query-for';
import { LiveQueryPace } from '../data/live-query-pace';
import { LocalJournal } from '../data/local-journal';
import { FIRST_SCREEN_SETTLED } from '../tasks/first-screen';
import { SerialJob, withTabLock } from '../tasks/serial-job';
import { DexieSyncPorts } from './dexie-sync-ports';
import { SyncEvents } from './sync-events';

/** What the engine is doing right now. */
export type SyncPhase = 'idle' | 'syncing' | 'offline' | 'needs-sign-in' | 'retrying';

/** A local write syncs this long after the last keystroke-sized edit. */
const WRITE_DEBOUNCE_MS = 1500;
/** While online and visible, look for other devices' changes this often. */
const PERIODIC_MS = 60_000;

/**
 * Keeps this device and the server in step: runs the shared sync cycle at start, when the
 * browser comes online, shortly after local writes, every minute while visible, and on demand.
 * Only one tab syncs at a time (Web Locks). Failures back off with jitter; a refused sign-in
 * pauses sync and leaves the outbox untouched.
 */
@Injectable({ providedIn: 'root' })
export class SyncEngine {
  private readonly http = inject(HttpClient);
  private readonly auth = inject(Auth);
  private readonly journal = inject(LocalJournal);
  private readonly pace = inject(LiveQueryPace);

  private readonly phaseState = signal<SyncPhase>('idle');
  private readonly lastError = signal<string | null>(null);
  private readonly clockNoticeState = signal<string | null>(null);
  private readonly progressState = signal<PullProgress | null>(null);
  private readonly roundsState = signal(0);
  /** Rounds one at a time; a trigger mid-sync goes round once more afterwards. */
  private readonly job = new SerialJob(() => this.cycle());
  /** Bulk writes under way ({@link holdWhile}): no round starts until they end. */
  private holds = 0;
  private readonly holding = signal(false);
  /**
   * Not re-counted while a bulk write holds sync: counting reads the whole outbox, and doing it
   * after each of an import's batches (each waiting for the count before it) slowed the import
   * as the outbox grew. Counted again when the hold ends.
   */
  private readonly counted = liveQueryFor<boolean, number | null>(this.holding, (db, holding) => (holding ? null : db.outbox.count()));

  /** Changes saved here that the server has not confirmed (as of the last count: see {@link counted}). */
  readonly pending = linkedSignal<number | null | undefined, number>({
    source: this.counted,
    computation: (count, previous) => count ?? previous?.value ?? 0,
  }).asReadonly();
  /** Changes the server refused for good, newest first. */
  readonly rejected = liveQuerySignal((db) => db.rejected.reverse().sortBy('rejectedAt'), []);
  /** When this device last finished a pull (in any tab). */
  readonly lastSyncedAt = liveQuerySignal(async (db) => (await db.meta.get('lastSyncedAt'))?.value ?? null, null);
  readonly phase = computed<SyncPhase>(() => (this.auth.needsSignIn() ? 'needs-sign-in' : this.phaseState()));
  readonly error = this.lastError.asReadonly();
  /** Said once per device: its date is far from the server's (sync corrects for it meanwhile). */
  readonly clockNotice = this.clockNoticeState.asReadonly();
  /** A pull of several pages under way: rows so far and about how many in all; null otherwise. */
  readonly pullProgress = this.progressState.asReadonly();
  /** Sync rounds over since the app started, whatever their outcome (the first one ends a new device's first sync). */
  readonly roundsOver = this.roundsState.asReadonly();

  constructor() {
    const destroyRef = inject(DestroyRef);
    // A reader signed in (or the app opened with one): sync once the first screen is up (it reads the
    // local journal, not the server).
    const firstScreen = inject(FIRST_SCREEN_SETTLED);
    effect(() => {
      if (firstScreen() && this.journal.db() && !this.auth.needsSignIn()) this.job.schedule(0);
    });
    inject(SyncEvents).connect(() => void this.syncNow()); // another device pushed: pull now
    // While offline, writes and the minute timer leave the backoff's probe alone (no retry storm).
    inject(JournalStore)
      .localWrites.pipe(debounceTime(WRITE_DEBOUNCE_MS), takeUntilDestroyed(destroyRef))
      .subscribe(() => {
        if (this.phaseState() !== 'offline') this.job.schedule(0);
      });
    const online = () => {
      this.job.succeeded();
      if (this.phaseState() === 'offline') this.phaseState.set('idle'); // the browser says so: no probe needed
      this.job.schedule(0);
    };
    const offline = () => {
      this.phaseState.set('offline'); // only the backoff's probe tries until the browser says it is back
      this.job.retryLater();
    };
    globalThis.addEventListener?.('online', online);
    globalThis.addEventListener?.('offline', offline);
    const periodic = setInterval(() => {
      const phase = this.phaseState();
      if (globalThis.document?.visibilityState !== 'hidden' && phase !== 'syncing' && phase !== 'offline') this.job.schedule(0);
    }, PERIODIC_MS);
    destroyRef.onDestroy(() => {
      clearInterval(periodic);
      this.job.stop();
      globalThis.removeEventListener?.('online', online);
      globalThis.removeEventListener?.('offline', offline);
    });
  }

  /**
   * Runs `work` with sync rounds held back, then syncs: a bulk import's batches otherwise race
   * pushes (and pulls) of the batches before them for the same IndexedDB stores and the main
   * thread. What was written stays in the outbox meanwhile, as offline.
   */
  async holdWhile<T>(work: () => Promise<T>): Promise<T> {
    this.holds++;
    this.holding.set(true);
    try {
      return await work();
    } finally {
      if (--this.holds === 0) {
        this.holding.set(false);
        this.job.schedule(0);
      }
    }
  }

  /** "Sync now": runs at once, forgetting any backoff. */
  syncNow(): Promise<void> {
    return this.job.runNow();
  }

  private async cycle(): Promise<void> {
    const db = this.journal.db();
    if (!db || this.auth.needsSignIn() || this.holds > 0) return;
    this.job.cancelTimer();
    const wasOffline = this.phaseState() === 'offline';
    this.phaseState.set('syncing');
    try {
      // Back from offline: a cheap probe first, so a still-missing network costs one small request.
      if (wasOffline) await firstValueFrom(this.http.get<HealthAnswer>('/api/health'));
      // Pages are fetched while the last one is stored; progress shows only while more pages are to come,
      // and meanwhile the screens re-read what arrived once per window (1 s, growing to 4 s) rather than after each page.
      const onPulled = (progress: PullProgress) => {
        const more = progress.aboutTotal !== null && progress.aboutTotal > progress.rows;
        this.progressState.set(more ? progress : null);
        if (!more) return this.pace.stop(); // the last page: re-run at once
        this.pace.pageStored(); // (after the first page nothing is paced yet: its queries re-ran already)
        this.pace.start();
      };
      const ran = await withTabLock(`lamplight-sync-${db.userId}`, () => runSyncCycle(new DexieSyncPorts(db, this.http), { prefetch: true, onPulled }));
      await this.noticeWrongDate(db);
      this.job.succeeded();
      this.lastError.set(null);
      this.phaseState.set('idle');
      if (!ran) this.job.lookAgainSoon(); // another tab holds the lock
    } catch (error) {
      this.progressState.set(null); // the next cycle resumes from the stored cursor and says so again
      this.phaseState.set(this.describeFailure(error));
      if (this.phaseState() !== 'needs-sign-in') this.job.retryLater();
    } finally {
      this.pace.stop();
      this.roundsState.update((rounds) => rounds + 1);
    }
  }

  /** The reader has seen the notice about their device's date: do not say it again on this device. */
  async clockNoticeSeen(): Promise<void> {
    const db = this.journal.db();
    if (!this.clockNoticeState() || !db) return;
    this.clockNoticeState.set(null);
    await db.meta.put({ key: 'clockWarned', value: new Date().toISOString() });
  }

  /** Tells the reader, until they have seen it once, that their device's date looks wrong (sync corrects for it meanwhile). */
  private async noticeWrongDate(db: JournalDb): Promise<void> {
    const offset = Number((await db.meta.get('clockOffset'))?.value ?? 0) || 0;
    if (!dateLooksWrong(offset) || (await db.meta.get('clockWarned'))) return;
    const days = Math.round(Math.abs(offset) / 86_400_000);
    this.clockNoticeState.set(
      `This device's date looks about ${days} ${days === 1 ? 'day' : 'days'} ${offset < 0 ? 'ahead' : 'behind'}. Your changes still sync; setting the date right keeps their order exact.`,
    );
  }

  private describeFailure(error: unknown): SyncPhase {
    if (isUnreachable(error)) {
      this.lastError.set(null);
      return 'offline';
    }
    if (error instanceof HttpErrorResponse) {
      if (error.status === 401 || error.status === 403) return 'needs-sign-in';
      this.lastError.set(`The server answered ${error.status}; trying again shortly`);
      return 'retrying';
    }
    this.lastError.set(error instanceof Error ? error.message : 'Sync failed; trying again shortly');
    return 'retrying';
  }
}

import { inject, Injectable } from '@angular/core';
import { liveQuery } from 'dexie';
import {
  asyncScheduler,
  BehaviorSubject,
  concatMap,
  defer,
  distinctUntilChanged,
  from,
  merge,
  type Observable,
  share,
  startWith,
  Subject,
  switchMap,
  take,
  throttle,
  timer,
} from 'rxjs';

import { JournalStore } from './journal-store';

/** While paced, live queries re-run at most this often at first (plus after this tab's own writes)… */
export const PACED_MS = 1000;
/** …and each window is {@link PACED_MS} longer than the one before, up to this. */
export const PACED_MAX_MS = 4000;

/**
 * How often live queries re-run. Normally after every transaction that touched what they read;
 * while a long pull stores page after page ({@link start} … {@link stop}), once per window at
 * most, the windows growing from {@link PACED_MS} to {@link PACED_MAX_MS}: re-reading whole
 * tables and re-rendering after each page cost more than storing the pages, and each re-run
 * costs more as the tables grow (issue 17). The first page shows at once, what arrives later
 * within a few seconds (the sync's progress bar moves with every page meanwhile).
 */
@Injectable({ providedIn: 'root' })
export class LiveQueryPace {
  private readonly pacedState = new BehaviorSubject(false);
  private readonly stored = new Subject<void>();
  /** Windows begun since pacing started. */
  private windows = 0;

  /** Whether live queries are paced now. */
  readonly paced: Observable<boolean> = this.pacedState.pipe(distinctUntilChanged());
  /**
   * When paced queries re-run: the first stored page at once, then at most once per window (the
   * last page of a window at its end), and right after this tab's own writes.
   */
  readonly ticks: Observable<void> = merge(
    this.stored.pipe(throttle(() => timer(this.nextWindow(), asyncScheduler), { leading: true, trailing: true })),
    inject(JournalStore).localWrites,
  ).pipe(share());

  /** A long pull is storing pages: from now on, re-run on ticks. */
  start(): void {
    if (!this.pacedState.value) this.windows = 0;
    this.pacedState.next(true);
  }

  /** A page was stored. */
  pageStored(): void {
    this.stored.next();
  }

  /** The pull is over (or failed): back to re-running after every change, at once. */
  stop(): void {
    this.pacedState.next(false);
  }

  private nextWindow(): number {
    return Math.min(PACED_MS * ++this.windows, PACED_MAX_MS);
  }
}

/**
 * A Dexie live query that follows {@link LiveQueryPace}: live while not paced; while paced, run
 * once per tick (and once at once if it starts paced); live again, and so run at once, when the
 * pace stops.
 */
export function pacedLiveQuery<T>(pace: LiveQueryPace, query: () => Promise<T> | T): Observable<T> {
  return defer(() => {
    let first = true;
    return pace.paced.pipe(
      switchMap((paced) => {
        const fresh = first;
        first = false;
        if (!paced) return from(liveQuery(query));
        // Already showing a live answer when pacing began: wait for the next tick.
        return (fresh ? pace.ticks.pipe(startWith(undefined)) : pace.ticks).pipe(concatMap(() => from(liveQuery(query)).pipe(take(1))));
      }),
    );
  });
}

import { retryDelayMs } from '@shared/sync/sync-cycle';

/**
 * A background job run one round at a time (sync, cover uploads): rounds start on a timer or on
 * demand; a trigger that arrives mid-round runs one more round afterwards rather than a second
 * one beside it; failures back off with jitter (`retryDelayMs`) until a round succeeds.
 */
export class SerialJob {
  private timer: ReturnType<typeof setTimeout> | undefined;
  private running: Promise<void> | null = null;
  private again = false;
  private stopped = false;
  private attempt = 0;

  constructor(private readonly round: () => Promise<void>) {}

  /** Runs a round after `delayMs`, replacing any round already waiting on the timer. */
  schedule(delayMs: number): void {
    if (this.stopped) return;
    clearTimeout(this.timer);
    this.timer = setTimeout(() => void this.run(), delayMs);
  }

  /** Runs a round now; if one is running, resolves with it and goes round once more afterwards. */
  run(): Promise<void> {
    if (this.running) {
      this.again = true;
      return this.running;
    }
    this.running = this.round().finally(() => {
      this.running = null;
      if (this.again) {
        this.again = false;
        this.schedule(0);
      }
    });
    return this.running;
  }

  /** Runs a round now with the backoff forgotten ("Sync now", back online). */
  runNow(): Promise<void> {
    this.succeeded();
    return this.run();
  }

  /** Forgets the waiting round (a round is starting, or nothing can run until an event says so). */
  cancelTimer(): void {
    clearTimeout(this.timer);
  }

  /** A round went through: the next failure waits the shortest time again. */
  succeeded(): void {
    this.attempt = 0;
  }

  /** A round failed: try again after the next, longer, jittered delay. */
  retryLater(): void {
    this.schedule(retryDelayMs(this.attempt++));
  }

  /** Another tab did the work this time: look again soon, without counting it as a failure. */
  lookAgainSoon(): void {
    this.schedule(retryDelayMs(0));
  }

  /** No more rounds (the service is destroyed). */
  stop(): void {
    this.stopped = true;
    clearTimeout(this.timer);
  }
}

/**
 * Runs `work` only if no other tab of this browser holds the lock `name` (Web Locks); resolves
 * whether it ran. Without Web Locks (old browsers, some test runners) it just runs.
 */
export async function withTabLock(name: string, work: () => Promise<unknown>): Promise<boolean> {
  const locks = globalThis.navigator?.locks;
  if (!locks) {
    await work();
    return true;
  }
  return (await locks.request(name, { ifAvailable: true }, async (lock) => {
    if (!lock) return false;
    await work();
    return true;
  })) as boolean;
}

import { DestroyRef, inject, Injectable, InjectionToken, signal } from '@angular/core';

import { browserStorage } from '../../core/device/browser-storage';

/** The Screen Wake Lock API (`navigator.wakeLock`), or null where the browser has none. Specs provide a fake. */
export const WAKE_LOCK = new InjectionToken<Pick<WakeLock, 'request'> | null>('WAKE_LOCK', {
  providedIn: 'root',
  factory: () => (globalThis.navigator && 'wakeLock' in navigator ? navigator.wakeLock : null),
});

const WANTED_KEY = 'lamplight.timerKeepAwake';

/**
 * Keeps the screen on while the timer page is open, when the reader asks. The browser lets the
 * lock go whenever the page is hidden (W3C Screen Wake Lock API), so it is taken again when the
 * page is visible; it is let go when the reader turns it off, stops the timer or leaves the page.
 * Provide it in the component that uses it.
 */
@Injectable()
export class ScreenAwake {
  private readonly api = inject(WAKE_LOCK);
  private sentinel: WakeLockSentinel | null = null;
  private acquiring: Promise<void> | null = null;
  /** Whether a timer is active; the lock is only held while one is. */
  private active = false;
  private readonly wantedState = signal(browserStorage.read<boolean>(WANTED_KEY) ?? false);
  private readonly heldState = signal(false);
  private readonly problemState = signal('');

  /** This browser can keep the screen on. */
  readonly supported = this.api !== null;
  /** The reader asked for the screen to stay on (remembered on this device). */
  readonly wanted = this.wantedState.asReadonly();
  /** The screen is being kept on now. */
  readonly held = this.heldState.asReadonly();
  /** Why the browser would not keep it on, in the reader's words. */
  readonly problem = this.problemState.asReadonly();

  constructor() {
    const visible = () => {
      if (document.visibilityState === 'visible' && this.active && this.wantedState()) void this.acquire();
    };
    document.addEventListener('visibilitychange', visible);
    inject(DestroyRef).onDestroy(() => {
      document.removeEventListener('visibilitychange', visible);
      void this.release();
    });
  }

  /** The reader's choice. */
  async setWanted(wanted: boolean): Promise<void> {
    this.wantedState.set(wanted);
    browserStorage.write(WANTED_KEY, wanted);
    await this.follow(this.active);
  }

  /** Takes or lets go of the lock as the timer starts and stops. */
  async follow(timerActive: boolean): Promise<void> {
    this.active = timerActive;
    if (timerActive && this.wantedState()) await this.acquire();
    else await this.release();
  }

  private acquire(): Promise<void> {
    this.acquiring ??= this.request().finally(() => (this.acquiring = null));
    return this.acquiring;
  }

  private async request(): Promise<void> {
    if (!this.api || (this.sentinel && !this.sentinel.released)) return;
    try {
      const sentinel = await this.api.request('screen');
      if (!this.active || !this.wantedState()) {
        await sentinel.release(); // turned off or stopped while the browser answered
        return;
      }
      sentinel.addEventListener('release', () => {
        if (this.sentinel === sentinel) this.heldState.set(false);
      });
      this.sentinel = sentinel;
      this.heldState.set(true);
      this.problemState.set('');
    } catch {
      // Refused: battery saver, a hidden page, or a policy.
      this.heldState.set(false);
      this.problemState.set('Your browser would not keep the screen on just now.');
    }
  }

  private async release(): Promise<void> {
    const sentinel = this.sentinel;
    this.sentinel = null;
    this.heldState.set(false);
    if (sentinel && !sentinel.released) await sentinel.release().catch(() => undefined);
  }
}

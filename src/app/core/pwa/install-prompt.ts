import { Injectable, signal } from '@angular/core';

/** Chromium's install prompt event (not in TypeScript's DOM types). */
interface BeforeInstallPromptEvent extends Event {
  prompt(): Promise<void>;
  readonly userChoice: Promise<{ outcome: 'accepted' | 'dismissed' }>;
}

/** How this device can install Lamplight to its home screen, if at all. */
export type InstallOption = 'prompt' | 'ios-how-to' | 'installed' | 'none';

const standalone = () =>
  globalThis.matchMedia?.('(display-mode: standalone)').matches === true ||
  (globalThis.navigator as (Navigator & { standalone?: boolean }) | undefined)?.standalone === true;

/** iPhone and iPad Safari have no install prompt; iPadOS reports itself as a Mac with touch. */
const ios = () => {
  const nav = globalThis.navigator;
  if (!nav) return false;
  return /iPad|iPhone|iPod/.test(nav.userAgent) || (nav.userAgent.includes('Macintosh') && nav.maxTouchPoints > 1);
};

/**
 * Offers "Install" where the browser allows it: keeps the `beforeinstallprompt` event to show
 * the browser's prompt on request, and on iOS Safari offers a short how-to instead. Nothing is
 * offered once the app runs installed (`display-mode: standalone`).
 */
@Injectable({ providedIn: 'root' })
export class InstallPrompt {
  private deferred: BeforeInstallPromptEvent | null = null;
  private readonly state = signal<InstallOption>(standalone() ? 'installed' : ios() ? 'ios-how-to' : 'none');
  readonly option = this.state.asReadonly();

  constructor() {
    globalThis.addEventListener?.('beforeinstallprompt', (event: Event) => {
      event.preventDefault(); // we offer it from the menu instead of the browser's own banner
      this.deferred = event as BeforeInstallPromptEvent;
      if (!standalone()) this.state.set('prompt');
    });
    globalThis.addEventListener?.('appinstalled', () => {
      this.deferred = null;
      this.state.set('installed');
    });
  }

  /** Shows the browser's install prompt; resolves whether the reader accepted. */
  async install(): Promise<boolean> {
    const event = this.deferred;
    if (!event) return false;
    this.deferred = null;
    await event.prompt();
    const { outcome } = await event.userChoice;
    this.state.set(outcome === 'accepted' ? 'installed' : 'none');
    return outcome === 'accepted';
  }
}

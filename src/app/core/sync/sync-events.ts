import { DestroyRef, DOCUMENT, effect, inject, Injectable, InjectionToken, signal } from '@angular/core';
import { createParser } from 'eventsource-parser';

import { retryDelayMs } from '@shared/sync/sync-cycle';

import { Auth } from '../auth/auth';
import { LocalJournal } from '../data/local-journal';
import { browserStorage } from '../device/browser-storage';
import { FIRST_SCREEN_SETTLED } from '../tasks/first-screen';

/** How the stream is fetched; specs hand in their own server. */
export const EVENT_STREAM_FETCH = new InjectionToken<typeof fetch>('fetch for the live sync stream', {
  providedIn: 'root',
  factory: () => globalThis.fetch.bind(globalThis),
});

/** Where the last poke's id is kept (then `.` and the reader's id). */
const EVENT_ID_KEY = 'lamplight.syncEventId';

/** A server without live updates (older, or behind a proxy that refuses streams): look again this much later. */
const NOT_OFFERED_PAUSE_MS = 10 * 60_000;

/**
 * Live updates: while this device is online, visible and signed in, it keeps one stream open to
 * `GET /api/sync/events` and calls back whenever another device of the reader pushed, so the
 * engine pulls within a second instead of at its next minute.
 *
 * The stream is read with `fetch`, not `EventSource`: EventSource cannot send the bearer header,
 * and a token in the URL would end up in proxy and server logs. The service worker is bypassed
 * (`ngsw-bypass`): it has nothing to cache here. After a drop or the server ending the stream (it
 * does when the access token expires) it reconnects with backoff and `Last-Event-ID`, and the
 * server pokes at once if anything changed meanwhile. Hidden or offline, it closes: the engine
 * syncs on `online` anyway, and a visible page reconnects and catches up through the event id.
 */
@Injectable({ providedIn: 'root' })
export class SyncEvents {
  private readonly auth = inject(Auth);
  private readonly journal = inject(LocalJournal);
  private readonly fetch = inject(EVENT_STREAM_FETCH);
  private readonly document = inject(DOCUMENT);
  private readonly firstScreen = inject(FIRST_SCREEN_SETTLED);

  private readonly online = signal(globalThis.navigator?.onLine ?? true);
  private readonly visible = signal(this.document.visibilityState !== 'hidden');
  private readonly poke = signal<(() => void) | null>(null);
  private readonly openState = signal(false);
  private abort: AbortController | null = null;
  /**
   * The last poke's id, kept across visits (per reader): reopening the app then gets no poke on
   * connect unless something changed since, so a start pulls once (its own round) instead of twice.
   * Safe to skip that poke: every start syncs anyway.
   */
  private get lastEventId(): string | undefined {
    const userId = this.auth.user()?.id;
    return (userId && browserStorage.read<string>(`${EVENT_ID_KEY}.${userId}`)) || undefined;
  }
  private set lastEventId(id: string) {
    const userId = this.auth.user()?.id;
    if (userId) browserStorage.write(`${EVENT_ID_KEY}.${userId}`, id);
  }

  /** Whether a stream is open right now. */
  readonly open = this.openState.asReadonly();

  constructor() {
    const setOnline = () => this.online.set(true);
    const setOffline = () => this.online.set(false);
    const setVisibility = () => this.visible.set(this.document.visibilityState !== 'hidden');
    globalThis.addEventListener?.('online', setOnline);
    globalThis.addEventListener?.('offline', setOffline);
    this.document.addEventListener('visibilitychange', setVisibility);
    effect(() => {
      const wanted = this.poke() !== null && this.firstScreen() && !!this.journal.db() && !this.auth.needsSignIn() && this.online() && this.visible();
      if (wanted && !this.abort) this.start();
      if (!wanted) this.stop();
    });
    inject(DestroyRef).onDestroy(() => {
      this.stop();
      globalThis.removeEventListener?.('online', setOnline);
      globalThis.removeEventListener?.('offline', setOffline);
      this.document.removeEventListener('visibilitychange', setVisibility);
    });
  }

  /** Starts listening; `onPoke` runs for every change another device pushed. */
  connect(onPoke: () => void): void {
    this.poke.set(onPoke);
  }

  private start(): void {
    const abort = new AbortController();
    this.abort = abort;
    void this.keepOpen(abort.signal);
  }

  private stop(): void {
    this.abort?.abort();
    this.abort = null;
    this.openState.set(false);
  }

  /** Opens, reads until the stream ends, waits, opens again — until stopped. */
  private async keepOpen(signal: AbortSignal): Promise<void> {
    let attempt = 0;
    while (!signal.aborted) {
      const outcome = await this.readOnce(signal).catch(() => 'failed' as const);
      this.openState.set(false);
      // A stream that was open (then ended, say at token expiry) reconnects promptly.
      attempt = outcome === 'ended' ? 0 : attempt + 1;
      await pause(outcome === 'not-offered' ? NOT_OFFERED_PAUSE_MS : retryDelayMs(attempt), signal);
    }
  }

  /** One connection, until it ends. */
  private async readOnce(signal: AbortSignal): Promise<'ended' | 'failed' | 'not-offered'> {
    const token = await this.auth.freshAccessToken();
    if (!token || signal.aborted) return 'failed';
    const headers: Record<string, string> = { accept: 'text/event-stream', authorization: `Bearer ${token}`, 'ngsw-bypass': 'true' };
    const lastEventId = this.lastEventId;
    if (lastEventId !== undefined) headers['last-event-id'] = lastEventId;
    const res = await this.fetch('/api/sync/events', { headers, signal, cache: 'no-store' });
    if (res.status === 401) {
      await this.auth.refresh(token).catch(() => null); // an expired token: the next attempt uses the new one
      return 'failed';
    }
    if (res.status === 404 || res.status === 405) return 'not-offered';
    if (!res.ok || !res.body) return 'failed';
    this.openState.set(true);
    const parser = createParser({
      onEvent: (event) => {
        if (event.id !== undefined) this.lastEventId = event.id;
        if (event.event === 'sync') this.poke()?.();
      },
    });
    const reader = res.body.pipeThrough(new TextDecoderStream()).getReader();
    for (;;) {
      const { done, value } = await reader.read();
      if (done) return 'ended';
      parser.feed(value);
    }
  }
}

/** Waits `ms`, or less if `signal` aborts first. */
function pause(ms: number, signal: AbortSignal): Promise<void> {
  return new Promise((resolve) => {
    const timer = setTimeout(resolve, ms);
    signal.addEventListener('abort', () => (clearTimeout(timer), resolve()), { once: true });
  });
}

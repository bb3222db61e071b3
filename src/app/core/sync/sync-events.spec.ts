import { provideHttpClient, withInterceptors } from '@angular/common/http';
import { provideHttpClientTesting } from '@angular/common/http/testing';
import { signal } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import Dexie from 'dexie';

import { authInterceptor } from '../auth/auth-interceptor';
import { forgetSession, READER, rememberSession } from '../auth/testing/session-fixtures';
import { journalDbName } from '../data/journal-db';
import { LocalJournal } from '../data/local-journal';
import { FIRST_SCREEN_SETTLED } from '../tasks/first-screen';
import { EVENT_STREAM_FETCH, SyncEvents } from './sync-events';
import { until } from './testing/sync-backend';

/** One request to the stream and the server's end of it. */
interface Opened {
  readonly headers: Record<string, string>;
  readonly signal: AbortSignal;
  send(text: string): void;
  end(): void;
}

/**
 * The live-update client against a stand-in for `GET /api/sync/events` that speaks the
 * event-stream format of the WHATWG HTML standard, §9.2 (the server side is specced against the
 * real server in spec/server/sync-events.spec.ts).
 */
describe('SyncEvents', () => {
  let userId: string;
  let opened: Opened[];
  let pokes: number;

  beforeEach(async () => {
    userId = `events-${crypto.randomUUID()}`;
    rememberSession({ user: { ...READER, id: userId } });
    opened = [];
    pokes = 0;
    const server: typeof fetch = async (_url, init) => {
      let controller!: ReadableStreamDefaultController<Uint8Array>;
      const body = new ReadableStream<Uint8Array>({ start: (c) => void (controller = c) });
      const encoder = new TextEncoder();
      opened.push({
        headers: init?.headers as Record<string, string>,
        signal: init!.signal!,
        send: (text) => controller.enqueue(encoder.encode(text)),
        end: () => controller.close(),
      });
      return new Response(body, { status: 200, headers: { 'content-type': 'text/event-stream' } });
    };
    await configure(server);
  });

  /** A fresh app (as on a new visit) whose stream requests go to `server`. */
  async function configure(server: typeof fetch): Promise<void> {
    TestBed.configureTestingModule({
      providers: [
        provideHttpClient(withInterceptors([authInterceptor])),
        provideHttpClientTesting(),
        { provide: EVENT_STREAM_FETCH, useValue: server },
        { provide: FIRST_SCREEN_SETTLED, useValue: signal(true) },
      ],
    });
    await TestBed.inject(LocalJournal).db()!.open();
  }

  afterEach(async () => {
    TestBed.resetTestingModule();
    await Dexie.delete(journalDbName(userId));
    localStorage.removeItem(`lamplight.syncEventId.${userId}`);
    forgetSession();
  });

  function connected(): SyncEvents {
    const events = TestBed.inject(SyncEvents);
    events.connect(() => pokes++);
    TestBed.tick();
    return events;
  }

  it('opens one stream with the bearer token past the service worker, and pokes on sync events only', async () => {
    const events = connected();
    await until(() => opened.length === 1 && events.open(), 'the stream is open');
    expect(opened[0]!.headers['authorization']).toMatch(/^Bearer /);
    expect(opened[0]!.headers['ngsw-bypass']).toBe('true');
    expect(opened[0]!.headers['last-event-id']).toBeUndefined();

    opened[0]!.send('retry: 3000\n\n: heartbeat 2026-12-04T10:00:00.000Z\n\n');
    opened[0]!.send('event: sync\nid: 41\ndata: {"seq":41}\n\n');
    await until(() => pokes === 1, 'one poke');
    opened[0]!.send(': heartbeat\n\nevent: sync\nid: 4');
    opened[0]!.send('2\ndata: {"seq":42}\n\n'); // an event split across chunks
    await until(() => pokes === 2, 'a second poke');
    expect(opened.length).toBe(1);
  });

  it('reconnects after the server ends the stream, sending the last event id', async () => {
    connected();
    await until(() => opened.length === 1, 'the stream is open');
    opened[0]!.send('event: sync\nid: 7\ndata: {"seq":7}\n\n');
    await until(() => pokes === 1, 'the poke');
    opened[0]!.end(); // as at token expiry
    await until(() => opened.length === 2, 'a second stream');
    expect(opened[1]!.headers['last-event-id']).toBe('7');
  });

  it('sends the last event id of an earlier visit, so a start with nothing new is not poked', async () => {
    connected();
    await until(() => opened.length === 1, 'the stream is open');
    opened[0]!.send('event: sync\nid: 9\ndata: {"seq":9}\n\n');
    await until(() => pokes === 1, 'the poke');
    const server = TestBed.inject(EVENT_STREAM_FETCH);
    TestBed.resetTestingModule(); // the app closed
    await configure(server);
    connected();
    await until(() => opened.length === 2, 'the next visit opens its stream');
    expect(opened[1]!.headers['last-event-id']).toBe('9');
  });

  it('closes while offline and opens again when back online', async () => {
    const events = connected();
    await until(() => opened.length === 1 && events.open(), 'the stream is open');
    window.dispatchEvent(new Event('offline'));
    TestBed.tick();
    expect(opened[0]!.signal.aborted).toBeTrue();
    expect(events.open()).toBeFalse();
    window.dispatchEvent(new Event('online'));
    TestBed.tick();
    await until(() => opened.length === 2 && events.open(), 'a new stream');
  });

  it('closes while the page is hidden and opens again when it is shown', async () => {
    const events = connected();
    await until(() => opened.length === 1, 'the stream is open');
    const visibility = (state: DocumentVisibilityState) => {
      Object.defineProperty(document, 'visibilityState', { configurable: true, get: () => state });
      document.dispatchEvent(new Event('visibilitychange'));
      TestBed.tick();
    };
    try {
      visibility('hidden');
      expect(opened[0]!.signal.aborted).toBeTrue();
      visibility('visible');
      await until(() => opened.length === 2 && events.open(), 'a new stream');
    } finally {
      delete (document as { visibilityState?: unknown }).visibilityState;
    }
  });

  it('does not open anything before the engine connects', async () => {
    const events = TestBed.inject(SyncEvents);
    TestBed.tick();
    await new Promise((resolve) => setTimeout(resolve, 50));
    expect(opened.length).toBe(0);
    events.connect(() => pokes++);
    TestBed.tick();
    await until(() => opened.length === 1, 'the stream is open');
  });
});

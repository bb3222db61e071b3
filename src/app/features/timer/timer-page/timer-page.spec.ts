import { TestBed, type ComponentFixture } from '@angular/core/testing';
import { MatDialog } from '@angular/material/dialog';

import type { Session } from '@shared/sync/schema/collections';

import { openTestJournal, type TestJournal } from '../../../core/testing/test-journal';
import { JournalStore } from '../../../core/data/journal-store';
import { UnsavedWork } from '../../../core/pwa/unsaved-work';
import { QuoteCapture } from '../../quotes';
import { CLOCK } from '../../../core/time/clock';
import { NOTIFIER } from '../notifier';
import { ReadingTimer, TIMER_ROW_ID } from '../reading-timer';
import { WAKE_LOCK } from '../screen-awake';
import { FakeClock } from '../testing/fake-clock';
import { FakeNotifier } from '../testing/fake-notifier';
import { FakeWakeLock } from '../testing/fake-wake-lock';
import { until } from '../testing/until';
import { TimerPage } from './timer-page';

const MINUTE = 60_000;
/** Local HH:mm, from the browser's own formatter rather than our code. */
const hhmm = (iso: string) => new Intl.DateTimeFormat('en-GB', { hour: '2-digit', minute: '2-digit', hourCycle: 'h23' }).format(new Date(iso));

describe('TimerPage', () => {
  let journal: TestJournal;
  let clock: FakeClock;
  let wakeLock: FakeWakeLock;
  let store: JournalStore;
  let timer: ReadingTimer;
  let fixture: ComponentFixture<TimerPage>;

  beforeEach(() => {
    localStorage.removeItem('lamplight.timerKeepAwake');
    clock = new FakeClock(Date.parse('2026-03-08T20:14:00Z'));
    wakeLock = new FakeWakeLock();
    journal = openTestJournal([
      { provide: CLOCK, useValue: clock },
      { provide: NOTIFIER, useValue: new FakeNotifier('default') },
      { provide: WAKE_LOCK, useValue: wakeLock },
    ]);
    store = journal.store;
    timer = TestBed.inject(ReadingTimer);
  });

  afterEach(async () => {
    TestBed.inject(MatDialog).closeAll();
    await journal.close();
    localStorage.removeItem('lamplight.timerKeepAwake');
  });

  const text = () => (fixture.nativeElement as HTMLElement).textContent!.replace(/\s+/g, ' ');
  const button = (name: string) =>
    Array.from((fixture.nativeElement as HTMLElement).querySelectorAll<HTMLButtonElement>('button')).find((b) => b.textContent!.trim().endsWith(name));
  const shown = (what: string) => until(() => (fixture.detectChanges(), text().includes(what)), `“${what}” on the page`);

  async function runningOn(fields: Record<string, unknown> = {}): Promise<string> {
    const bookId = await store.create('books', { title: 'The Cartographer of Tides', format: 'print', status: 'reading', pageCount: 320 });
    await store.create('sessions', { bookId, startedAt: '2026-03-07T20:00:00.000Z', endedAt: '2026-03-07T20:30:00.000Z', toPosition: 88 });
    if (Object.keys(fields).length) await store.write('timers', TIMER_ROW_ID, { state: 'running', bookId, pausedMs: 0, deleted: false, ...fields });
    else await timer.start(bookId);
    fixture = TestBed.createComponent(TimerPage);
    await shown('The Cartographer of Tides');
    return bookId;
  }

  it('shows the elapsed time large, from the stored start, with the book and where the reader is in it', async () => {
    await runningOn();
    clock.advance(25 * MINUTE + 3000);
    await shown('25:03');
    const elapsed = (fixture.nativeElement as HTMLElement).querySelector('[role="timer"]')!;
    expect(elapsed.textContent).toContain('25:03');
    expect(getComputedStyle(elapsed).fontVariantNumeric).toBe('tabular-nums');
    expect(text()).toContain('Page 88 of 320');
    expect((fixture.nativeElement as HTMLElement).querySelector('mat-progress-bar')?.getAttribute('aria-valuenow')).toBe('28'); // 88 / 320 = 27.5 %, rounded
  });

  it('pauses and resumes; a paused timer says so and stops counting', async () => {
    await runningOn();
    clock.advance(5 * MINUTE);
    button('Pause')!.click();
    await shown('Paused');
    clock.advance(10 * MINUTE);
    await shown('05:00');
    button('Resume')!.click();
    await until(() => (fixture.detectChanges(), !!button('Pause')));
    clock.advance(MINUTE);
    await shown('06:00');
    expect(text()).not.toContain('Paused');
  });

  it('stops into a saved session and opens the stop form, holding off app reloads while it is open', async () => {
    await runningOn();
    clock.advance(25 * MINUTE);
    const unsaved = TestBed.inject(UnsavedWork);
    button('Stop')!.click();
    await until(() => !!document.querySelector('ll-stop-dialog h2')?.textContent?.includes('You read for 25 minutes'), 'the stop form');
    expect(unsaved.present()).toBeTrue();
    const sessions = (await store.list('sessions')) as Session[];
    expect(sessions.find((s) => s.source === 'timer')?.activeMinutes).toBe(25);

    Array.from(document.querySelectorAll<HTMLButtonElement>('ll-stop-dialog button'))
      .find((b) => b.textContent!.trim() === 'Skip')!
      .click();
    await until(() => !unsaved.present(), 'the stop form to close');
    await shown('No timer is running');
    await shown('Last session');
    expect(text()).toContain('The Cartographer of Tides · 25 minutes');
  });

  it('says when another device runs the timer, since when, and can stop it here', async () => {
    await runningOn({ startedAt: '2026-03-08T19:54:00.000Z', deviceId: 'the-laptop', deviceName: 'Firefox on Windows' });
    await shown(`Running on another device (Firefox on Windows) since ${hhmm('2026-03-08T19:54:00.000Z')}`);
    expect(button('Pause')).toBeUndefined();
    expect(button('Stop')).toBeDefined();
    expect(button('Discard')).toBeDefined();
    await shown('20:00');
  });

  it('keeps the screen on when asked, takes the lock again when the page is visible again, and lets go on stop', async () => {
    await runningOn();
    const toggle = () => (fixture.nativeElement as HTMLElement).querySelector<HTMLButtonElement>('mat-slide-toggle button[role="switch"]:not([disabled])');
    const keepOn = Array.from((fixture.nativeElement as HTMLElement).querySelectorAll('mat-slide-toggle')).find((t) =>
      t.textContent!.includes('Keep the screen on'),
    )!;
    expect(toggle()).not.toBeNull();
    keepOn.querySelector<HTMLButtonElement>('button')!.click();
    await until(() => wakeLock.held === 1, 'the wake lock');

    await wakeLock.sentinels[0]!.release(); // the browser lets go when the page is hidden…
    document.dispatchEvent(new Event('visibilitychange')); // …and it is visible again
    await until(() => wakeLock.held === 1 && wakeLock.sentinels.length === 2, 'the lock taken again');

    button('Stop')!.click();
    await until(() => wakeLock.held === 0, 'the lock let go');
    await until(() => document.querySelector<HTMLInputElement>('ll-stop-dialog input')?.value === '88', 'the stop form, loaded');
  });

  it('suggests a calm break after 20 minutes, marked as common practice rather than medical advice', async () => {
    await runningOn();
    clock.advance(19 * MINUTE);
    await shown('19:00');
    expect(text()).not.toContain('Rest your eyes');
    clock.advance(MINUTE);
    await shown('Rest your eyes for a moment?');
    expect(text()).toContain('common practice, not medical advice');
    button('Thanks')!.click();
    await until(() => (fixture.detectChanges(), !text().includes('Rest your eyes')), 'the suggestion to go');
  });

  it('captures a quote in one tap, with the page prefilled from where the reader is', async () => {
    const quotes = TestBed.inject(QuoteCapture);
    const open = spyOn(quotes, 'open');
    const bookId = await runningOn();
    button('Capture a quote')!.click();
    expect(open).toHaveBeenCalledWith({ bookId, page: 88 });
  });

  it('sets a target and counts down to it, saying so in the page when it is reached', async () => {
    await runningOn();
    const select = (fixture.nativeElement as HTMLElement).querySelector<HTMLSelectElement>('select')!;
    select.value = '10';
    select.dispatchEvent(new Event('change'));
    await shown('10 minutes to go');
    clock.advance(10 * MINUTE);
    await shown('You have read your 10 minutes.');
    expect(text()).toContain('You have read your 10 minutes.');
  });
});

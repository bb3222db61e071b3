import { TestBed } from '@angular/core/testing';

import { openTestJournal, type TestJournal } from '../../core/testing/test-journal';
import { JournalStore } from '../../core/data/journal-store';
import { CLOCK } from '../../core/time/clock';
import { NOTIFIER } from './notifier';
import { ReadingTimer, TIMER_ROW_ID } from './reading-timer';
import { TimerReminders } from './timer-reminders';
import { FakeClock } from './testing/fake-clock';
import { FakeNotifier } from './testing/fake-notifier';
import { until } from './testing/until';

const MINUTE = 60_000;

describe('TimerReminders', () => {
  let journal: TestJournal;
  let clock: FakeClock;
  let notifier: FakeNotifier;
  let timer: ReadingTimer;
  let reminders: TimerReminders;
  let store: JournalStore;

  beforeEach(() => {
    localStorage.removeItem('lamplight.timerNotify');
    clock = new FakeClock();
    notifier = new FakeNotifier('default', 'granted');
    journal = openTestJournal([
      { provide: CLOCK, useValue: clock },
      { provide: NOTIFIER, useValue: notifier },
    ]);
    store = journal.store;
    timer = TestBed.inject(ReadingTimer);
    reminders = TestBed.inject(TimerReminders);
  });

  afterEach(async () => {
    await journal.close();
    localStorage.removeItem('lamplight.timerNotify');
  });

  /** Moves the fake clock on a minute at a time, letting effects run in between. */
  function read(minutes: number): void {
    for (let i = 0; i < minutes; i++) {
      clock.advance(MINUTE);
      TestBed.tick();
    }
  }

  async function startReading(targetMinutes?: number): Promise<void> {
    const bookId = await store.create('books', { title: 'Small Rain', format: 'print', status: 'reading' });
    await timer.start(bookId, { targetMinutes });
    await until(() => timer.active() !== null);
    TestBed.tick();
  }

  it('asks for permission only when the reader turns the notification on', async () => {
    expect(notifier.asked).toBe(0);
    await reminders.setNotify(true);
    expect(notifier.asked).toBe(1);
    expect(reminders.notifies()).toBeTrue();
    await reminders.setNotify(false);
    await reminders.setNotify(true); // already answered: not asked again
    expect(notifier.asked).toBe(1);
  });

  it('notifies once when the target is reached, and counts the minutes to go', async () => {
    await reminders.setNotify(true);
    await startReading(30);
    read(12);
    expect(reminders.minutesToGo()).toBe(18);
    expect(reminders.targetReached()).toBeFalse();
    read(18);
    expect(reminders.targetReached()).toBeTrue();
    read(5);
    expect(notifier.shown).toEqual([{ title: 'Reading target reached', body: 'You have read for 30 minutes of Small Rain.' }]);
  });

  it('shows no notification when the reader did not turn it on, or the browser refused (the page says it instead)', async () => {
    await startReading(10);
    read(11);
    expect(reminders.targetReached()).toBeTrue();

    notifier.current = 'denied';
    await reminders.setNotify(true);
    expect(reminders.notifies()).toBeFalse();
    await timer.stop();
    await until(() => timer.active() === null);
    await startReading(10);
    read(11);
    expect(reminders.targetReached()).toBeTrue();
    expect(notifier.shown).toEqual([]);
  });

  it('does not notify for a timer another device runs (that device does)', async () => {
    await reminders.setNotify(true);
    const bookId = await store.create('books', { title: 'Small Rain' });
    await store.write('timers', TIMER_ROW_ID, {
      state: 'running',
      bookId,
      startedAt: new Date(clock.now()).toISOString(),
      pausedMs: 0,
      deviceId: 'the-laptop',
      targetMinutes: 5,
      deleted: false,
    });
    await until(() => timer.active() !== null);
    TestBed.tick();
    read(6);
    expect(reminders.targetReached()).toBeTrue();
    expect(notifier.shown).toEqual([]);
  });

  it('suggests a break after 20 minutes of reading, and again 20 minutes after the reader took one', async () => {
    await startReading();
    read(19);
    expect(reminders.breakDue()).toBeFalse();
    read(1);
    expect(reminders.breakDue()).toBeTrue();
    reminders.dismissBreak();
    expect(reminders.breakDue()).toBeFalse();
    read(20);
    expect(reminders.breakDue()).toBeTrue();
  });

  it('counts a pause of 20 seconds or more as the break, and a shorter one not', async () => {
    await startReading();
    read(15);
    await timer.pause();
    clock.advance(5_000);
    await timer.resume();
    await until(() => timer.active()?.pausedMs === 5_000);
    read(5);
    expect(reminders.breakDue()).toBeTrue(); // five seconds was no break

    reminders.dismissBreak();
    read(10);
    await timer.pause();
    clock.advance(60_000);
    await timer.resume();
    await until(() => timer.active()?.pausedMs === 65_000);
    TestBed.tick();
    read(15);
    expect(reminders.breakDue()).toBeFalse(); // 15 minutes since the one-minute pause
    read(5);
    expect(reminders.breakDue()).toBeTrue();
  });
});

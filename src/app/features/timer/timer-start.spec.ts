import { TestBed, type ComponentFixture } from '@angular/core/testing';
import { MatDialog } from '@angular/material/dialog';
import { provideRouter, Router } from '@angular/router';

import type { Session, Timer } from '@shared/sync/schema/collections';

import { openTestJournal, type TestJournal } from '../../core/testing/test-journal';
import { JournalStore } from '../../core/data/journal-store';
import { CLOCK } from '../../core/time/clock';
import { ReadingTimer, TIMER_ROW_ID } from './reading-timer';
import { FakeClock } from './testing/fake-clock';
import { until } from './testing/until';
import { TimerStartButton } from './timer-start-button/timer-start-button';

const MINUTE = 60_000;

describe('Starting the timer from a start button', () => {
  let journal: TestJournal;
  let clock: FakeClock;
  let store: JournalStore;

  beforeEach(() => {
    clock = new FakeClock();
    journal = openTestJournal([provideRouter([{ path: 'timer', children: [] }]), { provide: CLOCK, useValue: clock }]);
    store = journal.store;
  });

  afterEach(async () => {
    TestBed.inject(MatDialog).closeAll();
    await journal.close();
  });

  function startButton(bookId: string, title: string, compact = false): ComponentFixture<TimerStartButton> {
    const fixture = TestBed.createComponent(TimerStartButton);
    fixture.componentRef.setInput('bookId', bookId);
    fixture.componentRef.setInput('title', title);
    fixture.componentRef.setInput('compact', compact);
    fixture.detectChanges();
    return fixture;
  }
  const row = async () => (await store.get('timers', TIMER_ROW_ID)) as Timer | undefined;
  const dialogButton = (name: string) =>
    Array.from(document.querySelectorAll<HTMLButtonElement>('ll-confirm-dialog button')).find((b) => b.textContent!.trim() === name);

  it('names the book on the compact button, starts the timer and opens the timer page', async () => {
    const bookId = await store.create('books', { title: 'Small Rain' });
    const fixture = startButton(bookId, 'Small Rain', true);
    const button = (fixture.nativeElement as HTMLElement).querySelector('button')!;
    expect(button.getAttribute('aria-label')).toBe('Start the timer for Small Rain');
    button.click();
    await until(() => TestBed.inject(Router).url === '/timer', 'the timer page');
    expect((await row())?.bookId).toBe(bookId);
    await until(() => (fixture.detectChanges(), !!(fixture.nativeElement as HTMLElement).querySelector('a[aria-label="Open the timer for Small Rain"]')));
  });

  it('asks before replacing another book’s timer, and saying yes keeps the first one’s time as a session', async () => {
    const first = await store.create('books', { title: 'The Cartographer of Tides' });
    const second = await store.create('books', { title: 'Small Rain' });
    await TestBed.inject(ReadingTimer).start(first);
    clock.advance(12 * MINUTE);

    const fixture = startButton(second, 'Small Rain');
    (fixture.nativeElement as HTMLElement).querySelector('button')!.click();
    await until(() => !!dialogButton('Keep the current one'), 'the question');
    expect(document.querySelector('ll-confirm-dialog')!.textContent).toContain('You are timing The Cartographer of Tides.');
    dialogButton('Keep the current one')!.click();
    await until(() => !document.querySelector('ll-confirm-dialog'), 'the dialog to close');
    expect((await row())?.bookId).toBe(first);

    (fixture.nativeElement as HTMLElement).querySelector('button')!.click();
    await until(() => !!dialogButton('Stop it and start'), 'the question again');
    dialogButton('Stop it and start')!.click();
    await until(() => TestBed.inject(Router).url === '/timer', 'the timer page');
    expect((await row())?.bookId).toBe(second);
    const sessions = (await store.list('sessions')) as Session[];
    expect(sessions.map((s) => [s.bookId, s.activeMinutes])).toEqual([[first, 12]]);
  });
});

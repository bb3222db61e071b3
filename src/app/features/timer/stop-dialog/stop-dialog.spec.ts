import { TestBed } from '@angular/core/testing';
import { MatDialog } from '@angular/material/dialog';
import { firstValueFrom } from 'rxjs';

import type { Book, Session } from '@shared/sync/schema/collections';

import { openTestJournal, type TestJournal } from '../../../core/testing/test-journal';
import { JournalStore } from '../../../core/data/journal-store';
import { CLOCK } from '../../../core/time/clock';
import { ReadingTimer } from '../reading-timer';
import { FakeClock } from '../testing/fake-clock';
import { until } from '../testing/until';
import { StopDialog, type StopDialogData } from './stop-dialog';

const MINUTE = 60_000;

describe('StopDialog', () => {
  let journal: TestJournal;
  let clock: FakeClock;
  let store: JournalStore;

  beforeEach(() => {
    clock = new FakeClock(Date.parse('2026-03-08T20:14:00Z'));
    journal = openTestJournal([{ provide: CLOCK, useValue: clock }]);
    store = journal.store;
  });

  afterEach(async () => {
    TestBed.inject(MatDialog).closeAll();
    await journal.close();
  });

  /** Times 25 minutes of a book and stops, as the timer page does, then opens the form. */
  async function stopped(book: Record<string, unknown>, previous?: Partial<Session>, minutes = 25) {
    const bookId = await store.create('books', { title: 'The Orchard Under Snow', ...book });
    if (previous) await store.create('sessions', { bookId, startedAt: '2026-03-07T20:00:00.000Z', endedAt: '2026-03-07T20:30:00.000Z', ...previous });
    const timer = TestBed.inject(ReadingTimer);
    await timer.start(bookId);
    clock.advance(minutes * MINUTE);
    const sessionId = (await timer.stop())!;
    const ref = TestBed.inject(MatDialog).open<StopDialog, StopDialogData, boolean>(StopDialog, { data: { sessionId } });
    const closed = firstValueFrom(ref.afterClosed());
    TestBed.tick();
    headingsSeen.push(document.querySelector('ll-stop-dialog h2')?.textContent ?? '');
    await until(() => (TestBed.tick(), !!document.querySelector('ll-stop-dialog input')), 'the form');
    await until(() => (TestBed.tick(), field('toPosition')?.value !== '' || !previous), 'the prefill');
    return { bookId, sessionId, closed };
  }

  const headingsSeen: string[] = [];
  const field = (name: string) => document.querySelector<HTMLInputElement & HTMLSelectElement>(`ll-stop-dialog [formcontrolname="${name}"]`);
  const dialogText = () => document.querySelector('ll-stop-dialog')?.textContent?.replace(/\s+/g, ' ') ?? '';
  const click = (name: string) =>
    Array.from(document.querySelectorAll<HTMLButtonElement>('ll-stop-dialog button'))
      .find((b) => b.textContent!.trim() === name)!
      .click();
  const type = (name: string, value: string) => {
    const input = field(name)!;
    input.value = value;
    input.dispatchEvent(new Event(input.tagName === 'SELECT' ? 'change' : 'input'));
  };
  /** Chooses in the select of the field labelled `label` (a choice field has no form control name of its own). */
  const choose = (label: string, value: string) => {
    const select = Array.from(document.querySelectorAll('ll-stop-dialog mat-form-field'))
      .find((f) => f.querySelector('mat-label')?.textContent?.trim() === label)!
      .querySelector('select')!;
    select.value = value;
    select.dispatchEvent(new Event('change'));
  };
  const outboxFor = async (rowId: string) => (await journal.db.outbox.toArray()).filter((c) => c.rowId === rowId);

  it('opens prefilled from the previous session, writes only what changed, and marks a TBR book as reading', async () => {
    const { bookId, sessionId, closed } = await stopped({ format: 'audiobook', audioMinutes: 665, status: 'tbr' }, { toPosition: 120, playbackSpeed: 1.25 });
    expect(dialogText()).toContain('You listened for 25 minutes');
    expect(field('toPosition')!.value).toBe('120');
    expect(field('playbackSpeed')!.value).toBe('1.25');
    expect(field('ebookLocation')).toBeNull(); // an audiobook has no ebook location
    const before = (await outboxFor(sessionId)).length;

    type('toPosition', '150');
    choose('How did it feel?', 'calm');
    click('Save');

    expect(await closed).toBeTrue();
    const session = (await store.get('sessions', sessionId)) as Session;
    expect(session).toEqual(jasmine.objectContaining({ toPosition: 150, playbackSpeed: 1.25, mood: 'calm', fromPosition: 120, activeMinutes: 25 }));
    const written = (await outboxFor(sessionId)).slice(before).map((c) => c.field);
    expect(written.sort()).toEqual(['mood', 'playbackSpeed', 'toPosition']); // the prefilled speed is new to this session
    expect(((await store.get('books', bookId)) as Book).status).toBe('reading');
  });

  it('shows a message under the field for a page past the end, and saves nothing', async () => {
    const { sessionId } = await stopped({ format: 'print', pageCount: 320, status: 'reading' }, { toPosition: 88 });
    type('toPosition', '400');
    click('Save');
    await until(() => (TestBed.tick(), dialogText().includes('The book has 320 pages')), 'the message');
    expect(((await store.get('sessions', sessionId)) as Session).toPosition ?? null).toBeNull();
  });

  it('asks “Mark it finished?” when the position is the end of the book, and marks it when told', async () => {
    const { bookId, closed } = await stopped({ format: 'ebook', pageCount: 410, status: 'paused' }, { toPosition: 90 });
    expect(field('ebookLocation')).not.toBeNull();
    type('toPosition', '100');
    click('Save');
    await until(() => (TestBed.tick(), dialogText().includes('Mark it finished?')), 'the question');
    click('Mark it finished');
    expect(await closed).toBeTrue();
    const book = (await store.get('books', bookId)) as Book;
    expect(book.status).toBe('finished');
    const history = (await store.list('bookStatusChanges')).filter((change) => change.bookId === bookId).map((change) => change.status);
    expect(history).toEqual(jasmine.arrayWithExactContents(['reading', 'finished']));
  });

  it('loses nothing when skipped: the session was saved before the form opened', async () => {
    const { sessionId, closed } = await stopped({ format: 'print', pageCount: 320, status: 'reading' });
    click('Skip');
    expect(await closed).toBeFalse();
    expect(((await store.get('sessions', sessionId)) as Session).activeMinutes).toBe(25);
  });

  it('says "1 minute" for a one-minute session, never "less than a minute", even while it loads', async () => {
    headingsSeen.length = 0;
    const { sessionId, closed } = await stopped({ format: 'print', pageCount: 320, status: 'reading' }, { toPosition: 40 }, 1);
    await until(() => (TestBed.tick(), dialogText().includes('You read for 1 minute')), 'the heading');
    expect(headingsSeen.join(' ')).not.toContain('less than a minute');
    expect(dialogText()).not.toContain('under a minute');
    click('Skip');
    expect(await closed).toBeFalse();
    expect(((await store.get('sessions', sessionId)) as Session).deleted ?? false).toBeFalse();
  });

  it('discards a session under a minute on Skip, and says so before and after', async () => {
    const { sessionId, closed } = await stopped({ format: 'print', pageCount: 320, status: 'reading' }, undefined, 0.5);
    await until(() => (TestBed.tick(), dialogText().includes('under a minute')), 'the warning');
    expect(dialogText()).toContain('You read for less than a minute');
    click('Skip');
    expect(await closed).toBeFalse();
    for (let tries = 0; tries < 100 && !((await store.get('sessions', sessionId)) as Session).deleted; tries++)
      await new Promise((resolve) => setTimeout(resolve, 20));
    expect(((await store.get('sessions', sessionId)) as Session).deleted).toBeTrue();
    expect(document.querySelector('mat-snack-bar-container')?.textContent).toContain('the session was not kept');
  });

  it('keeps a session under a minute when the reader saves it', async () => {
    const { sessionId, closed } = await stopped({ format: 'print', pageCount: 320, status: 'reading' }, undefined, 0.5);
    await until(() => (TestBed.tick(), dialogText().includes('under a minute')), 'the form to load');
    type('toPosition', '12');
    click('Save');
    expect(await closed).toBeTrue();
    const session = (await store.get('sessions', sessionId)) as Session;
    expect(session.deleted ?? false).toBeFalse();
    expect(session.toPosition).toBe(12);
  });
});

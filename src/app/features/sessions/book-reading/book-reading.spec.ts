import { type ComponentFixture, TestBed } from '@angular/core/testing';

import type { Book, Session } from '@shared/sync/schema/collections';

import { JournalStore } from '../../../core/data/journal-store';
import { readerAt, clearOverlays } from '../../../core/testing/reader-moment';
import { BookReading } from './book-reading';
import { waitFor, openTestJournal, type TestJournal } from '../../../core/testing/test-journal';
import { addSession } from '../../../core/testing/seed';

/** Real IndexedDB; the reader is in Los Angeles on 8 March 2026 at 13:00 PDT. */
describe('BookReading', () => {
  const NOW = Date.parse('2026-03-08T20:00:00Z');
  let fixture: ComponentFixture<BookReading>;
  let store: JournalStore;
  let journal: TestJournal;

  const element = (): HTMLElement => fixture.nativeElement;
  const text = () => element().textContent?.replace(/\s+/g, ' ') ?? '';
  const items = () => [...element().querySelectorAll('li.session')];

  const until = (check: () => unknown, what: string) => waitFor(fixture, check, what);

  const session = (bookId: string, startedAt: string, minutes: number, from: number, to: number, extra: Partial<Session> = {}) =>
    addSession(store, bookId, startedAt, minutes, from, to, { source: 'manual', ...extra });

  async function show(bookId: string): Promise<void> {
    const book = (await store.get('books', bookId)) as Book;
    fixture = TestBed.createComponent(BookReading);
    fixture.componentRef.setInput('book', book);
  }

  beforeEach(async () => {
    journal = openTestJournal(readerAt(NOW));
    store = journal.store;
  });

  afterEach(async () => {
    clearOverlays();
    await journal.close();
  });

  it('shows progress in pages, time left and a finish date from typical speeds, and the sessions newest first', async () => {
    const bookId = await store.create('books', { title: 'The Salt Road', format: 'print', pageCount: 300, status: 'reading' });
    await session(bookId, '2026-03-07T02:00:00Z', 40, 0, 30, { mood: 'calm' }); // 6 March, 18:00 PST
    await session(bookId, '2026-03-08T03:00:00Z', 30, 30, 60); // 7 March, 19:00 PST
    await show(bookId);
    await until(() => items().length === 2, 'the sessions');

    expect(text()).toContain('Page 60 of 300 · 20 %');
    expect(element().querySelector('mat-progress-bar')?.getAttribute('aria-valuenow')).toBe('20');
    // Brysbaert (2019) 238 wpm at 275 words a page: 240 pages in 277 min (4 h 37 min). 70
    // minutes over 6–8 March is 23.3 a day: 11.9, so 12 days from 8 March, today included.
    expect(text()).toContain('About 4 h 37 min left · you should finish around Mar 19, 2026');
    expect(text()).toContain('From typical reading speeds (Brysbaert 2019)');
    expect(items()[0]!.textContent).toContain('Mar 7, 2026');
    expect(items()[0]!.textContent).toContain('30 min');
    expect(items()[0]!.textContent).toContain('p. 30 → p. 60');
    expect(items()[1]!.textContent).toContain('Mar 6, 2026');
    expect(items()[1]!.textContent).toContain('Calm');
  });

  it('says the pace is the reader’s own once there are three sessions in the format', async () => {
    const bookId = await store.create('books', { title: 'The Salt Road', format: 'print', pageCount: 300, status: 'reading' });
    const otherId = await store.create('books', { title: 'Lantern Weather', format: 'print', pageCount: 120, status: 'finished' });
    await session(otherId, '2026-03-05T02:00:00Z', 60, 0, 40);
    await session(bookId, '2026-03-07T02:00:00Z', 40, 0, 30);
    await session(bookId, '2026-03-08T03:00:00Z', 30, 30, 60);
    await show(bookId);
    await until(() => text().includes('From your pace'), 'the personal pace');
    // Rates 40, 45 and 60 pages an hour: the median 45 leaves 240 pages in 320 minutes.
    expect(text()).toContain('About 5 h 20 min left');
  });

  it('shows a book not started as its length and the time it takes, with no 0 % bar and no finish date', async () => {
    const bookId = await store.create('books', { title: 'The Salt Road', format: 'print', pageCount: 300, status: 'tbr' });
    await show(bookId);
    await until(() => element().querySelector('.not-started'), 'the length');
    // Brysbaert (2019) 238 wpm at 275 words a page: 300 pages in 347 min (5 h 47 min).
    expect(text()).toContain('300 pages · about 5 h 47 min of reading at typical reading speeds (Brysbaert 2019)');
    expect(text()).not.toContain('0 %');
    expect(text()).not.toContain('finish around');
    expect(element().querySelector('mat-progress-bar')).toBeNull();
  });

  it('shows an audiobook in listened minutes', async () => {
    const bookId = await store.create('books', { title: 'Harbour Lights', format: 'audiobook', audioMinutes: 600, status: 'reading' });
    await session(bookId, '2026-03-08T03:00:00Z', 60, 0, 90, { format: 'audiobook', playbackSpeed: 1.5 });
    await show(bookId);
    await until(() => items().length === 1, 'the session');
    expect(text()).toContain('1 h 30 min of 10 h 0 min · 15 %');
    expect(items()[0]!.textContent).toContain('0 min → 1 h 30 min');
  });

  it('deletes a session by tombstone, and Undo brings it back', async () => {
    const bookId = await store.create('books', { title: 'The Salt Road', format: 'print', pageCount: 300, status: 'reading' });
    const sessionId = await session(bookId, '2026-03-08T03:00:00Z', 30, 30, 60);
    await show(bookId);
    await until(() => items().length === 1, 'the session');

    items()[0]!.querySelectorAll('button')[0]!.click();
    await until(() => items().length === 0, 'the session to go');
    expect(((await store.get('sessions', sessionId)) as Session).deleted).toBeTrue();
    expect(text()).toContain('No sessions yet');

    let undo: HTMLButtonElement | undefined;
    await until(
      () => (undo = [...document.querySelectorAll<HTMLButtonElement>('.cdk-overlay-container button')].find((b) => b.textContent?.includes('Undo'))),
      'Undo',
    );
    undo!.click();
    await until(() => items().length === 1, 'the session to come back');
  });

  it('has no forecast for a finished book, and asks for a length it does not know', async () => {
    const bookId = await store.create('books', { title: 'No Length', format: 'print', status: 'finished' });
    await show(bookId);
    await until(() => text().includes('No sessions yet'), 'the empty list');
    expect(text()).toContain("Add the book's length to see how far you are.");
    expect(text()).not.toContain('left');
  });
});

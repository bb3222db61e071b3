import { Component } from '@angular/core';
import { type ComponentFixture, TestBed } from '@angular/core/testing';
import { provideRouter, Router } from '@angular/router';

import type { Book, Session } from '@shared/sync/schema/collections';

import { type JournalDb } from '../../../core/data/journal-db';
import { JournalStore } from '../../../core/data/journal-store';
import { readerAt, clearOverlays } from '../../../core/testing/reader-moment';
import { SessionEditor } from './session-editor';
import { outboxMark, outboxSince, waitFor, openTestJournal, type TestJournal } from '../../../core/testing/test-journal';

@Component({ template: '' })
class BookPageStub {}

/** Real IndexedDB through Dexie; the reader is in Los Angeles, and it is 8 March 2026, 13:00 PDT. */
describe('SessionEditor', () => {
  const NOW = Date.parse('2026-03-08T20:00:00Z');
  let fixture: ComponentFixture<SessionEditor>;
  let store: JournalStore;
  let journal: TestJournal;

  const db = (): JournalDb => journal.db;
  const element = (): HTMLElement => fixture.nativeElement;
  const input = (label: string): HTMLInputElement => {
    const found = [...element().querySelectorAll('mat-form-field')].find((field) => field.querySelector('mat-label')?.textContent?.trim() === label);
    if (!found) throw new Error(`no field ${label}`);
    return found.querySelector('input, textarea, select')!;
  };
  const type = (label: string, value: string) => {
    const field = input(label);
    field.value = value;
    field.dispatchEvent(new Event(field.tagName === 'SELECT' ? 'change' : 'input'));
  };
  const alertText = () => element().querySelector('[role="alert"]')?.textContent ?? '';
  const sessions = async () => (await db().rows('sessions').toArray()) as Session[];

  const until = (check: () => unknown, what: string) => waitFor(fixture, check, what);

  async function open(bookId: string, sessionId?: string): Promise<void> {
    fixture = TestBed.createComponent(SessionEditor);
    fixture.componentRef.setInput('id', bookId);
    if (sessionId) fixture.componentRef.setInput('sessionId', sessionId);
    await until(() => input('Started').value !== '', 'the form to load');
  }

  async function save(): Promise<void> {
    element().querySelector<HTMLButtonElement>('button[type="submit"]')!.click();
    await fixture.whenStable();
  }

  const addBook = (fields: Partial<Book> = {}) => store.create('books', { title: 'The Salt Road', format: 'print', pageCount: 300, status: 'tbr', ...fields });

  beforeEach(async () => {
    journal = openTestJournal([provideRouter([{ path: 'library/:id', component: BookPageStub }]), ...readerAt(NOW)]);
    store = journal.store;
  });

  afterEach(async () => {
    clearOverlays();
    await journal.close();
  });

  it('starts a new session as the half hour just gone, in the reader’s zone, from where they got to', async () => {
    const bookId = await addBook();
    await store.create('sessions', { bookId, startedAt: '2026-03-07T18:00:00Z', endedAt: '2026-03-07T18:30:00Z', toPosition: 42 });
    await open(bookId);
    // IANA tz database: Los Angeles switched to PDT (UTC−7) at 02:00 on 8 March 2026.
    expect(input('Started').value).toBe('2026-03-08T12:30');
    expect(input('Ended').value).toBe('2026-03-08T13:00');
    expect(input('Minutes reading').value).toBe('30');
    expect(input('From page').value).toBe('42');
    expect(element().textContent).toContain('America/Los_Angeles');
  });

  it('saves a manual session in UTC, moves a TBR book to Reading and returns to the book', async () => {
    const bookId = await addBook();
    await open(bookId);
    type('Started', '2026-03-07T23:30');
    type('Ended', '2026-03-08T00:15');
    type('From page', '0');
    type('To page', '25');
    type('How it felt', 'absorbed');
    type('Note', 'By the window');
    await save();
    await until(() => TestBed.inject(Router).url === `/library/${bookId}`, 'the book page');

    const [saved] = await sessions();
    expect(saved).toEqual(
      jasmine.objectContaining({
        bookId,
        format: 'print',
        source: 'manual',
        startedAt: '2026-03-08T07:30:00.000Z', // 23:30 PST (UTC−8)
        endedAt: '2026-03-08T08:15:00.000Z',
        activeMinutes: 45, // followed the span, as the reader never changed it
        fromPosition: 0,
        toPosition: 25,
        mood: 'absorbed',
        note: 'By the window',
      }),
    );
    expect(((await store.get('books', bookId)) as Book).status).toBe('reading');
  });

  it('refuses an overlapping session with its reason and saves nothing', async () => {
    const bookId = await addBook({ status: 'reading' });
    await store.create('sessions', { bookId, startedAt: '2026-03-08T19:00:00Z', endedAt: '2026-03-08T19:45:00Z', activeMinutes: 45 });
    const before = await db().outbox.count();
    await open(bookId);
    await save(); // the default half hour, 19:30–20:00 UTC

    await until(() => alertText().includes('It overlaps another session (19:00–19:45 UTC)'), 'the reason');
    expect(input('Started').getAttribute('aria-invalid')).toBe('true');
    expect((await sessions()).length).toBe(1);
    expect(await db().outbox.count()).toBe(before);
  });

  it('refuses a 21-hour session, and one in the future, each with its reason', async () => {
    const bookId = await addBook();
    await open(bookId);
    type('Started', '2026-03-07T12:00');
    type('Ended', '2026-03-08T09:00'); // 21 hours with the hour lost to DST: 20 hours
    await save();
    expect(alertText()).toBe('');
    await until(() => TestBed.inject(Router).url === `/library/${bookId}`, 'the book page');
    expect((await sessions()).length).toBe(1);

    await open(bookId);
    type('Started', '2026-03-06T08:00');
    type('Ended', '2026-03-07T05:00'); // 21 hours, no DST between
    await save();
    await until(() => alertText().includes('A session cannot last more than 20 hours'), 'the 20-hour reason');

    type('Started', '2026-03-08T13:30');
    type('Ended', '2026-03-08T14:00'); // half an hour from now
    await save();
    await until(() => alertText().includes('The session ends in the future'), 'the future reason');
    expect((await sessions()).length).toBe(1);
  });

  it('refuses negative minutes and a position past the end of the book, per field', async () => {
    const bookId = await addBook();
    await open(bookId);
    type('Minutes reading', '-5');
    type('To page', '320');
    await save();
    await until(() => alertText().includes('The book has 300 pages'), 'the reasons');
    expect(alertText()).toContain('Minutes cannot be negative');
    expect(element().querySelectorAll('mat-error').length).toBe(2);
    expect((await sessions()).length).toBe(0);
  });

  it('saves only the fields the reader changed when editing', async () => {
    const bookId = await addBook({ status: 'reading' });
    const sessionId = await store.create('sessions', {
      bookId,
      format: 'print',
      startedAt: '2026-03-08T17:00:12.345Z',
      endedAt: '2026-03-08T17:40:00.000Z',
      activeMinutes: 35,
      fromPosition: 10,
      toPosition: 30,
      source: 'timer',
    });
    const mark = await outboxMark(db());
    await open(bookId, sessionId);
    expect(input('Minutes reading').value).toBe('35');
    type('Note', 'Ended on the bus');
    type('Ended', '2026-03-08T10:50'); // 17:50 UTC; the 35 minutes are the reader's own, kept
    await save();
    await until(() => TestBed.inject(Router).url === `/library/${bookId}`, 'the book page');

    const changes = await outboxSince(db(), mark);
    expect(changes.map((c) => c.field).sort()).toEqual(['endedAt', 'note']);
    const saved = (await store.get('sessions', sessionId)) as Session;
    expect(saved.startedAt).toBe('2026-03-08T17:00:12.345Z');
    expect(saved.activeMinutes).toBe(35);
    expect(saved.source).toBe('timer');
  });

  it('asks whether the book is finished when a session reaches its end, and marks it so', async () => {
    const bookId = await addBook({ status: 'reading' });
    await open(bookId);
    type('From page', '270');
    type('To page', '300');
    await save();

    let finish: HTMLButtonElement | undefined;
    await until(() => {
      finish = [...document.querySelectorAll<HTMLButtonElement>('.cdk-overlay-container button')].find((b) => b.textContent?.trim() === 'Mark finished');
      return finish;
    }, 'the question');
    expect(document.querySelector('.cdk-overlay-container h2')?.textContent).toBe('Mark it finished?');
    finish!.click();
    await until(() => TestBed.inject(Router).url === `/library/${bookId}`, 'the book page');
    expect(((await store.get('books', bookId)) as Book).status).toBe('finished');
  });

  it('leaves the status alone when the reader says not yet', async () => {
    const bookId = await addBook({ status: 'reading', format: 'ebook' });
    await open(bookId);
    type('To (percent)', '100');
    await save();
    let notYet: HTMLButtonElement | undefined;
    await until(() => {
      notYet = [...document.querySelectorAll<HTMLButtonElement>('.cdk-overlay-container button')].find((b) => b.textContent?.trim() === 'Not yet');
      return notYet;
    }, 'the question');
    notYet!.click();
    await until(() => TestBed.inject(Router).url === `/library/${bookId}`, 'the book page');
    expect(((await store.get('books', bookId)) as Book).status).toBe('reading');
  });
});

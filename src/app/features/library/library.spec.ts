import { TestBed } from '@angular/core/testing';

import { openTestJournal, type TestJournal, waitFor } from '../../core/testing/test-journal';
import { Library } from './library';

describe('Library', () => {
  let journal: TestJournal;
  beforeEach(() => {
    journal = openTestJournal();
    localStorage.removeItem('lamplight.libraryView');
  });
  afterEach(() => journal.close());

  it('shows how far into a book being read the reader is (a card’s progress on a phone), and none for a book not started', async () => {
    const reading = await journal.store.create('books', {
      title: 'The Lantern Keeper',
      authors: ['Oda Brenn'],
      format: 'print',
      pageCount: 400,
      status: 'reading',
      deleted: false,
    });
    await journal.store.create('books', { title: 'Waiting Tide', format: 'print', pageCount: 200, status: 'tbr', deleted: false });
    await journal.store.create('sessions', {
      bookId: reading,
      format: 'print',
      startedAt: '2026-03-01T10:00:00.000Z',
      endedAt: '2026-03-01T11:00:00.000Z',
      activeMinutes: 60,
      fromPosition: 0,
      toPosition: 100,
      deleted: false,
    });
    const fixture = TestBed.createComponent(Library);
    const element = fixture.nativeElement as HTMLElement;
    await waitFor(fixture, () => element.querySelector('td.mat-column-progress progress'), 'the progress');

    const bar = element.querySelector<HTMLProgressElement>('td.mat-column-progress progress')!;
    // 100 of 400 pages.
    expect(bar.value).toBe(25);
    expect(bar.getAttribute('aria-label')).toBe('Read of The Lantern Keeper');
    expect(bar.closest('td')?.textContent?.trim()).toBe('25 %');
    expect(element.querySelectorAll('td.mat-column-progress progress').length).toBe(1);
  });

  it('saves the status a reader picks in a row, with its history entry, and shows it in the row', async () => {
    const id = await journal.store.create('books', { title: 'Salt Hours', authors: ['Ivo Trask'], format: 'ebook', status: 'tbr', deleted: false });
    const fixture = TestBed.createComponent(Library);
    const element = fixture.nativeElement as HTMLElement;
    await waitFor(fixture, () => element.querySelector('select[aria-label="Status of Salt Hours"]'), 'the status select');
    const select = element.querySelector<HTMLSelectElement>('select[aria-label="Status of Salt Hours"]')!;

    select.value = 'reading';
    select.dispatchEvent(new Event('change', { bubbles: true }));

    await waitFor(fixture, async () => (await journal.store.get('books', id))?.status === 'reading', 'the saved status');
    const history = (await journal.store.list('bookStatusChanges')).filter((change) => change.bookId === id);
    expect(history.map((change) => change.status)).toEqual(['reading']);
    await waitFor(fixture, () => element.querySelector('select[aria-label="Status of Salt Hours"] option[value="reading"]:checked'), 'the row showing it');
  });
});

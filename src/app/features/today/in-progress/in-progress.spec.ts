import { type ComponentFixture, TestBed } from '@angular/core/testing';

import { JournalStore } from '../../../core/data/journal-store';
import { readerAt } from '../../../core/testing/reader-moment';
import { InProgress } from './in-progress';
import { waitFor, openTestJournal, type TestJournal } from '../../../core/testing/test-journal';

describe('InProgress', () => {
  const NOW = Date.parse('2026-03-08T20:00:00Z'); // 13:00 PDT in Los Angeles
  let fixture: ComponentFixture<InProgress>;
  let store: JournalStore;
  let journal: TestJournal;

  const element = (): HTMLElement => fixture.nativeElement;
  // The words of each line, without its timer button.
  const lines = () =>
    [...element().querySelectorAll('li')].map((li) =>
      [...li.querySelectorAll(':scope > a, :scope > span')]
        .map((part) => part.textContent)
        .join(' ')
        .replace(/\s+/g, ' ')
        .trim(),
    );

  const until = (check: () => unknown, what: string) => waitFor(fixture, check, what);

  beforeEach(async () => {
    journal = openTestJournal(readerAt(NOW));
    store = journal.store;
  });

  afterEach(async () => {
    await journal.close();
  });

  it('lists the books being read with how far and when they should be finished', async () => {
    const bookId = await store.create('books', { title: 'The Salt Road', format: 'print', pageCount: 300, status: 'reading' });
    await store.create('books', { title: 'Harbour Lights', format: 'audiobook', status: 'reading' });
    await store.create('books', { title: 'Waiting Its Turn', format: 'print', pageCount: 200, status: 'tbr' });
    // 7 March, 19:00–20:00 PST: 60 minutes, pages 0 → 60.
    await store.create('sessions', {
      bookId,
      format: 'print',
      startedAt: '2026-03-08T03:00:00Z',
      endedAt: '2026-03-08T04:00:00Z',
      activeMinutes: 60,
      fromPosition: 0,
      toPosition: 60,
    });
    fixture = TestBed.createComponent(InProgress);
    await until(() => lines().length === 2, 'the books');
    // Brysbaert (2019) 238 wpm, 275 words a page: 240 pages in 277 minutes; 60 minutes over
    // 7–8 March is 30 a day: 9.2, so 10 days from 8 March, today included.
    expect(lines()).toEqual(['Harbour Lights · no finish date yet', 'The Salt Road · 20 % · finish around Mar 17, 2026']);
  });

  it('says so when nothing is in progress', async () => {
    fixture = TestBed.createComponent(InProgress);
    await until(() => element().textContent?.includes('Nothing in progress'), 'the empty list');
    expect(element().querySelectorAll('li').length).toBe(0);
  });
});

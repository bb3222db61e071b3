import { type ComponentFixture, TestBed } from '@angular/core/testing';

import { deterministicId } from '@shared/sync/deterministic-id';

import type { JournalStore } from '../../../core/data/journal-store';
import { setUpGoalSpec, textOf, until } from '../../../core/testing/goal-fixtures';
import { BOOK, seedLibrary } from '../../../core/testing/seed';
import { YearReview } from './year-review';

describe('YearReview', () => {
  let store: JournalStore;
  let tearDown: () => Promise<void>;
  let fixture: ComponentFixture<YearReview>;
  const element = (): HTMLElement => fixture.nativeElement;

  beforeEach(async () => {
    ({ store, tearDown } = await setUpGoalSpec());
    await seedLibrary(store);
    await store.write('books', BOOK.orchard, { pageCount: 320, rating: 4.5, genres: ['Orchards'] });
    await store.write('books', BOOK.harrow, { pageCount: 210, rating: 5 });
    await store.write('yearPlans', deterministicId('year-plan', '2026'), { bestBookId: BOOK.orchard });
    // Two print sessions on consecutive Los Angeles days (PDT, UTC−7): 4 and 5 May.
    const session = (startedAt: string, endedAt: string, activeMinutes: number, fromPosition: number, toPosition: number) =>
      store.create('sessions', { bookId: BOOK.harrow, format: 'print', startedAt, endedAt, activeMinutes, fromPosition, toPosition });
    await session('2026-05-04T17:00:00.000Z', '2026-05-04T18:00:00.000Z', 60, 0, 30);
    await session('2026-05-05T17:00:00.000Z', '2026-05-05T18:30:00.000Z', 90, 30, 80);
  });

  afterEach(async () => tearDown());

  it('puts the year on one card: figures, the book of the year, the highest rated and the longest book', async () => {
    fixture = TestBed.createComponent(YearReview);
    fixture.componentRef.setInput('year', '2026');
    await until(fixture, () => element().querySelector('article.card .figures'), 'the card');
    const figures = Array.from(element().querySelectorAll('.figures div')).map(textOf);
    // 30 + 50 pages; 150 minutes = 2.5 hours, shown whole (rounded half up: 3).
    expect(figures).toEqual(['Books finished 3', 'Pages read 80', 'Hours reading 3', 'Days with reading 2', 'Longest run of days 2']);
    const notes = textOf(element().querySelector('.notes'));
    expect(notes).toContain('Book of the year The Quiet Orchard by Ada Okafor');
    // The raw text, as a reader (or a copy) gets it: a space between the title and "by".
    const best = Array.from(element().querySelectorAll('.notes p')).find((p) => p.textContent?.includes('Book of the year'));
    expect(best?.textContent).toContain('The Quiet Orchard by Ada Okafor');
    expect(textOf(element().querySelector('.rated'))).toBe('Harrow Light 5 ★ The Quiet Orchard 4.5 ★');
    expect(notes).toContain('Longest book The Quiet Orchard (320 pages)');
    expect(notes).toContain('Busiest month May (150 minutes)');
    expect(notes).toContain('Most read genre Orchards');
    expect(textOf(element().querySelector('h2'))).toContain('2026 in reading');
  });

  it('says so when a year has nothing yet', async () => {
    fixture = TestBed.createComponent(YearReview);
    fixture.componentRef.setInput('year', '2031');
    await until(fixture, () => element().querySelector('article.card'), 'the card');
    expect(textOf(element().querySelector('article.card'))).toContain('Nothing logged for 2031 yet.');
    expect(element().querySelector('.notes')).toBeNull();
  });
});

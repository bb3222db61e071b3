import { type ComponentFixture, TestBed } from '@angular/core/testing';

import type { JournalStore } from '../../../core/data/journal-store';
import { setUpGoalSpec, textOf, until } from '../../../core/testing/goal-fixtures';
import { BOOK, seedLibrary } from '../../../core/testing/seed';
import { InsightsPage } from './insights-page';

describe('InsightsPage', () => {
  let store: JournalStore;
  let tearDown: () => Promise<void>;
  let fixture: ComponentFixture<InsightsPage>;
  const element = (): HTMLElement => fixture.nativeElement;
  const summary = (heading: string) =>
    textOf(
      Array.from(element().querySelectorAll('section'))
        .find((section) => textOf(section.querySelector('h2')) === heading)
        ?.querySelector('figcaption'),
    );

  beforeEach(async () => {
    ({ store, tearDown } = await setUpGoalSpec());
    // The seeded library (see seed.ts): in Los Angeles, 2026 has Salt and Lanterns (January),
    // The Quiet Orchard (February) and Harrow Light (June) finished; Evening Tide is 2025's.
    await seedLibrary(store);
    await store.write('books', BOOK.harrow, { format: 'audiobook', rating: 4, genres: ['sea stories '] });
    await store.write('books', BOOK.jan, { rating: 5, genres: ['Sea stories', 'Myth'] });
  });

  afterEach(async () => tearDown());

  async function open(year?: string): Promise<void> {
    fixture = TestBed.createComponent(InsightsPage);
    if (year) fixture.componentRef.setInput('year', year);
    // The sections appear once the journal has been read.
    await until(fixture, () => element().querySelector('#monthly-heading'), 'the page');
  }

  it('opens on this year and says each chart in words', async () => {
    await open();
    expect(textOf(element().querySelector('h1'))).toBe('Insights for 2026');
    expect(summary('Month by month')).toBe('3 books in 2026; the most in January: 1 book.');
    expect(summary('Formats')).toBe('3 books finished in 2026: 2 print, 1 audiobook.');
    expect(summary('Ratings')).toBe('2 books rated, 4.5 stars on average (the middle rating: 4.5).');
    expect(summary('Genres')).toBe('Most read genre: Sea stories (2 books), then Myth (1).');
    expect(summary('Pace')).toBe('No timed print sessions with page numbers in 2026 yet.');
    // Every chart and the heatmap have their text: six charts and the year of days.
    expect(element().querySelectorAll('figure figcaption').length).toBe(7);
    expect(element().querySelectorAll('canvas').length).withContext('tags and pace have nothing to draw').toBe(4);
  });

  it('switches the months to minutes', async () => {
    await store.create('sessions', {
      bookId: BOOK.harrow,
      format: 'print',
      startedAt: '2026-05-04T17:00:00.000Z',
      endedAt: '2026-05-04T17:40:00.000Z',
      activeMinutes: 40,
      fromPosition: 0,
      toPosition: 30,
    });
    await open();
    const minutes = Array.from(element().querySelectorAll<HTMLButtonElement>('mat-button-toggle button')).find((button) => textOf(button) === 'Minutes')!;
    minutes.click();
    await until(fixture, () => summary('Month by month').includes('minutes'), 'minutes');
    expect(summary('Month by month')).toBe('40 minutes in 2026; the most in May: 40 minutes.');
    // 30 pages in 40 minutes = 45 pages an hour.
    expect(summary('Pace')).toBe('45 pages an hour across 2026, all in May.');
  });

  it('counts a book re-read this year in this year, and its first reading in its own year', async () => {
    // Evening Tide was finished on 31 December 2025 (seed.ts); a reading dated 10 April 2026 is a re-read.
    await store.write('readings', '00000000-0000-4000-8000-0000000000b1', { bookId: BOOK.eve, startedOn: '2025-12-01', finishedOn: '2025-12-31', deleted: false });
    await store.write('readings', '00000000-0000-4000-8000-0000000000b2', { bookId: BOOK.eve, startedOn: '2026-04-01', finishedOn: '2026-04-10', deleted: false });
    await open();
    await until(fixture, () => summary('Month by month').startsWith('4 books'), 'the re-read');
    expect(summary('Month by month')).toBe('4 books in 2026; the most in January: 1 book.');

    await open('2025');
    await until(fixture, () => summary('Month by month').includes('December'), '2025');
    expect(summary('Month by month')).toBe('1 book in 2025; the most in December: 1 book.');
  });

  it('shows an earlier year, and refuses a route that is no year', async () => {
    await open('2025');
    expect(textOf(element().querySelector('h1'))).toBe('Insights for 2025');
    await until(fixture, () => summary('Month by month').includes('December'), '2025');
    expect(summary('Month by month')).toBe('1 book in 2025; the most in December: 1 book.');

    const wrong = TestBed.createComponent(InsightsPage);
    wrong.componentRef.setInput('year', 'soon');
    await wrong.whenStable();
    expect(textOf(wrong.nativeElement)).toContain('That is not a year we keep.');
  });
});

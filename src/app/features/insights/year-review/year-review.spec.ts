import { type ComponentFixture, TestBed } from '@angular/core/testing';

import { deterministicId } from '@shared/sync/deterministic-id';

import type { JournalStore } from '../../../core/data/journal-store';
import { setUpGoalSpec, textOf, until } from '../../../core/testing/goal-fixtures';
import { BOOK, seedLibrary } from '../../../core/testing/seed';
import { YearReview } from './year-review';

describe('YearReview (the year’s shelf)', () => {
  let store: JournalStore;
  let tearDown: () => Promise<void>;
  let fixture: ComponentFixture<YearReview>;
  const element = (): HTMLElement => fixture.nativeElement;

  beforeEach(async () => {
    ({ store, tearDown } = await setUpGoalSpec());
    await seedLibrary(store);
    await store.write('books', BOOK.orchard, { pageCount: 320, rating: 4.5, genres: ['Orchards'] });
    await store.write('books', BOOK.harrow, { pageCount: 210, rating: 5, format: 'ebook' });
    await store.write('yearPlans', deterministicId('year-plan', '2026'), { bestBookId: BOOK.orchard });
    // Two print sessions on consecutive Los Angeles days (PDT, UTC−7): 4 and 5 May.
    const session = (startedAt: string, endedAt: string, activeMinutes: number, fromPosition: number, toPosition: number) =>
      store.create('sessions', { bookId: BOOK.harrow, format: 'print', startedAt, endedAt, activeMinutes, fromPosition, toPosition });
    await session('2026-05-04T17:00:00.000Z', '2026-05-04T18:00:00.000Z', 60, 0, 30);
    await session('2026-05-05T17:00:00.000Z', '2026-05-05T18:30:00.000Z', 90, 30, 80);
  });

  afterEach(async () => tearDown());

  it('stands each book finished in the year as a spine, in the order finished, taller for a longer book', async () => {
    fixture = TestBed.createComponent(YearReview);
    fixture.componentRef.setInput('year', '2026');
    await until(fixture, () => element().querySelector('ul.shelf button.spine'), 'the shelf');
    const shelf = element().querySelector('ul.shelf')!;
    const spines = Array.from(shelf.querySelectorAll<HTMLButtonElement>('button.spine'));

    expect(shelf.getAttribute('aria-label')).toBe('Books finished in 2026, in the order finished');
    // Finished in Los Angeles: 10 January, 28 February (06:30 UTC on 1 March), 20 June (its reading).
    expect(spines.map((spine) => spine.getAttribute('aria-label'))).toEqual([
      'Salt and Lanterns by Ada Okafor · print · finished 10 January',
      'The Quiet Orchard by Ada Okafor, 320 pages · print · finished 28 February',
      'Harrow Light by Lio Penhallow, 210 pages · ebook · finished 20 June',
    ]);
    // Heights (yearShelf): unknown length 60 %; 320 pages 0.3 + 0.7 × 0.32 = 52.4 %; 210 pages 44.7 %.
    expect(spines.map((spine) => parseFloat(spine.style.height).toFixed(1))).toEqual(['60.0', '52.4', '44.7']);
    expect(spines[2]!.classList).toContain('format-ebook');

    spines[1]!.click();
    await fixture.whenStable();
    expect(spines[1]!.getAttribute('aria-pressed')).toBe('true');
    expect(textOf(element().querySelector('.chosen-line'))).toBe('The Quiet Orchard by Ada Okafor, 320 pages · print · finished 28 February');
  });

  it('tells the year in a few sentences, with a space between a title and its author', async () => {
    fixture = TestBed.createComponent(YearReview);
    fixture.componentRef.setInput('year', '2026');
    await until(fixture, () => element().querySelector('.words p'), 'the words');
    const sentences = Array.from(element().querySelectorAll('.words p')).map((p) => p.textContent?.trim());

    expect(sentences).toEqual([
      'Three books stand on your 2026 shelf, from Salt and Lanterns (finished 10 January) to Harrow Light (finished 20 June).',
      'You read on 2 days, 2 of them in a row at best, for 150 minutes in all.',
      'May was your fullest month, with 150 minutes.',
      'Your book of the year: The Quiet Orchard by Ada Okafor.',
      'The tallest spine is The Quiet Orchard, at 320 pages.',
    ]);
    expect(element().querySelector('.figures')).toBeNull();
    expect(textOf(element().querySelector('h2'))).toContain('2026 shelf');
    expect(Array.from(element().querySelectorAll('button')).some((button) => textOf(button)?.includes('Save as image'))).toBeTrue();
  });

  it('says so when a year has nothing yet', async () => {
    fixture = TestBed.createComponent(YearReview);
    fixture.componentRef.setInput('year', '2031');
    await until(fixture, () => element().querySelector('article.card .words p'), 'the card');
    expect(textOf(element().querySelector('article.card'))).toContain('Nothing logged for 2031 yet.');
    expect(element().querySelector('ul.shelf')).toBeNull();
  });
});

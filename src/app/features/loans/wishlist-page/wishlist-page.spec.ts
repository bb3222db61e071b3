import { TestBed, type ComponentFixture } from '@angular/core/testing';

import type { Book } from '@shared/sync/schema/collections';

import { setUpGoalSpec } from '../../../core/testing/goal-fixtures';
import { textOf, until } from '../../../core/testing/test-journal';
import type { JournalStore } from '../../../core/data/journal-store';
import { WishlistPage } from './wishlist-page';

const WANTED = '00000000-0000-4000-8000-00000000e001';
const ALSO = '00000000-0000-4000-8000-00000000e002';

/** The Wishlist screen against a real IndexedDB journal. */
describe('WishlistPage', () => {
  let store: JournalStore;
  let tearDown: () => Promise<void>;
  let fixture: ComponentFixture<WishlistPage>;
  const page = () => fixture.nativeElement as HTMLElement;
  const wanted = () => [...page().querySelectorAll('ul[aria-labelledby="wanted-heading"] > li')].map((row) => textOf(row));

  beforeEach(async () => {
    ({ store, tearDown } = await setUpGoalSpec());
    await store.write('books', WANTED, {
      title: 'Lanterns of the Quiet Canal',
      copy: 'wishlist',
      status: 'tbr',
      wishPriority: 'high',
      wishWhere: 'The shop on Mill Lane',
      deleted: false,
    });
    await store.write('books', ALSO, {
      title: 'Moonlight Accounting',
      copy: 'wishlist',
      status: 'tbr',
      wishPriority: 'low',
      wishPriceNote: 'Wait for the paperback',
      deleted: false,
    });
    fixture = TestBed.createComponent(WishlistPage);
    await until(() => wanted().length === 2, fixture, 10_000);
  }, 20_000);

  afterEach(async () => {
    fixture?.destroy();
    await tearDown();
  });

  it('lists wished-for books by priority with where to get them and the price note', () => {
    expect(wanted()[0]).toContain('Lanterns of the Quiet Canal');
    expect(wanted()[0]).toContain('The shop on Mill Lane');
    expect(wanted()[1]).toContain('Wait for the paperback');
  });

  it('moves a book to the library when bought or borrowed, off the wishlist', async () => {
    page().querySelector<HTMLButtonElement>('button[aria-label="Bought it: Lanterns of the Quiet Canal"]')!.click();
    await until(() => wanted().length === 1, fixture, 10_000);
    page().querySelector<HTMLButtonElement>('button[aria-label="Borrowed it: Moonlight Accounting"]')!.click();
    await until(() => wanted().length === 0, fixture, 10_000);
    const books = (await store.list('books')) as Book[];
    expect(books.find((b) => b.id === WANTED)).toEqual(jasmine.objectContaining({ copy: 'owned', status: 'tbr' }));
    expect(books.find((b) => b.id === ALSO)?.copy).toBe('library');
  });
});

import { TestBed, type ComponentFixture } from '@angular/core/testing';

import type { Favourite } from '@shared/sync/schema/collections';

import { choose, field, textOf, type } from '../../../core/testing/goal-fixtures';
import { openTestJournal, until, type TestJournal } from '../../../core/testing/test-journal';
import { FavouritesPage } from './favourites-page';

const ORCHARD = '00000000-0000-4000-8000-00000000f001';
const ROOTS = '00000000-0000-4000-8000-00000000f101';

/** Favourites against a real IndexedDB journal: what the reader adds and removes is what is stored. */
describe('FavouritesPage', () => {
  let journal: TestJournal;
  let fixture: ComponentFixture<FavouritesPage>;

  const page = () => fixture.nativeElement as HTMLElement;
  const button = (text: string) => [...page().querySelectorAll<HTMLButtonElement>('button')].find((b) => textOf(b) === text)!;
  const rows = () => [...page().querySelectorAll('ul.favourites li:not(.quiet)')].map((row) => textOf(row));
  const stored = async () => (await journal.store.list('favourites')) as Favourite[];
  const startAdding = async () => {
    button('Add a favourite').click();
    await until(() => !!page().querySelector('form'), fixture);
  };
  const saveFavourite = async (count: number) => {
    button('Save favourite').click();
    await until(() => rows().length === count && !page().querySelector('form'), fixture);
  };

  beforeEach(async () => {
    journal = openTestJournal();
    await journal.db.open();
    await journal.store.write('books', ORCHARD, { title: 'The Quiet Orchard', authors: ['Ada Okafor'], format: 'print', status: 'finished', deleted: false });
    await journal.store.write('quotes', ROOTS, { bookId: ORCHARD, text: 'Every orchard keeps a winter in its roots.', deleted: false });
    fixture = TestBed.createComponent(FavouritesPage);
    await until(() => !!page().querySelector('ul.favourites'), fixture);
  });

  afterEach(async () => {
    fixture.destroy();
    await journal.close();
  });

  it('adds a favourite book, author and quote, each with why', async () => {
    expect(rows()).toEqual([]);

    await startAdding();
    await until(() => [...field<HTMLSelectElement>(page(), 'Which book').options].some((o) => o.value === ORCHARD), fixture);
    choose(field<HTMLSelectElement>(page(), 'Which book'), ORCHARD);
    type(field<HTMLTextAreaElement>(page(), 'Why'), 'It made the winter shorter');
    await saveFavourite(1);

    await startAdding();
    choose(field<HTMLSelectElement>(page(), 'A favourite'), 'author');
    await fixture.whenStable();
    type(field(page(), 'Author’s name'), '  Noor Halvorsen ');
    type(field<HTMLTextAreaElement>(page(), 'Why'), 'Sentences like weather');
    await saveFavourite(2);

    await startAdding();
    choose(field<HTMLSelectElement>(page(), 'A favourite'), 'quote');
    await until(() => [...field<HTMLSelectElement>(page(), 'Which quote').options].some((o) => o.value === ROOTS), fixture);
    choose(field<HTMLSelectElement>(page(), 'Which quote'), ROOTS);
    type(field<HTMLTextAreaElement>(page(), 'Why'), 'I think of it every March');
    await saveFavourite(3);

    expect(rows()).toEqual(
      jasmine.arrayWithExactContents([
        'Book The Quiet Orchard It made the winter shorter Remove',
        'Author Noor Halvorsen Sentences like weather Remove',
        'Quote “Every orchard keeps a winter in its roots.” I think of it every March Remove',
      ]),
    );
    const saved = (await stored()).map((f) => ({
      kind: f.kind,
      bookId: f.bookId ?? null,
      quoteId: f.quoteId ?? null,
      authorName: f.authorName ?? null,
      why: f.why,
    }));
    expect(saved).toEqual(
      jasmine.arrayWithExactContents([
        { kind: 'book', bookId: ORCHARD, quoteId: null, authorName: null, why: 'It made the winter shorter' },
        { kind: 'author', bookId: null, quoteId: null, authorName: 'Noor Halvorsen', why: 'Sentences like weather' },
        { kind: 'quote', bookId: null, quoteId: ROOTS, authorName: null, why: 'I think of it every March' },
      ]),
    );
  });

  it('removes one favourite and keeps the others', async () => {
    await journal.store.create('favourites', { kind: 'author', authorName: 'Noor Halvorsen', why: 'Sentences like weather' });
    await journal.store.create('favourites', { kind: 'book', bookId: ORCHARD, why: 'It made the winter shorter' });
    await until(() => rows().length === 2, fixture);

    const authorRow = [...page().querySelectorAll('ul.favourites li')].find((row) => textOf(row).includes('Noor Halvorsen'))!;
    [...authorRow.querySelectorAll<HTMLButtonElement>('button')].find((b) => textOf(b) === 'Remove')!.click();
    await until(() => rows().length === 1, fixture);

    expect(rows()).toEqual(['Book The Quiet Orchard It made the winter shorter Remove']);
    expect((await stored()).map((f) => f.kind)).toEqual(['book']);
  });

  it('asks for the book when none is chosen, and saves nothing', async () => {
    await startAdding();
    type(field<HTMLTextAreaElement>(page(), 'Why'), 'It made the winter shorter');
    button('Save favourite').click();
    await until(() => !!page().querySelector('[role="alert"]'), fixture);
    expect(textOf(page().querySelector('[role="alert"]'))).toBe('Choose the book you love.');
    expect(await stored()).toEqual([]);
  });

  it('says why a why too long is refused, under Why, and saves nothing', async () => {
    await startAdding();
    await until(() => [...field<HTMLSelectElement>(page(), 'Which book').options].some((o) => o.value === ORCHARD), fixture);
    choose(field<HTMLSelectElement>(page(), 'Which book'), ORCHARD);
    type(field<HTMLTextAreaElement>(page(), 'Why'), 'so good '.repeat(251)); // 2,008 characters
    button('Save favourite').click();
    await until(() => !!page().querySelector('[role="alert"]'), fixture);

    const why = field<HTMLTextAreaElement>(page(), 'Why').closest('mat-form-field')!;
    expect(textOf(why.querySelector('mat-error'))).toBe('Use at most 2000 characters');
    expect(textOf(page().querySelector('[role="alert"]'))).toBe('Some fields need attention.');
    expect(await stored()).toEqual([]);
  });
});

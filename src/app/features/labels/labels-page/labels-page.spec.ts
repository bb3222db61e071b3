import { TestBed, type ComponentFixture } from '@angular/core/testing';

import { STARTER_LABELS } from '@shared/journal/starter-labels';
import type { Book, Label } from '@shared/sync/schema/collections';

import { choose, field, textOf, type } from '../../../core/testing/goal-fixtures';
import { queryLibrary, searchText } from '../../library';
import { openTestJournal, until, type TestJournal } from '../../../core/testing/test-journal';
import { LabelChips } from '../../../ui/label-chips/label-chips';
import { LabelsPage } from './labels-page';

const starter = (name: string) => STARTER_LABELS.find((label) => label.name === name)!;
const LEDGER = '00000000-0000-4000-8000-00000000e001';

/** The labels page against a real IndexedDB journal, with a book's chips drawn from the same labels. */
describe('LabelsPage', () => {
  let journal: TestJournal;
  let fixture: ComponentFixture<LabelsPage>;
  let chips: ComponentFixture<LabelChips>;

  const page = () => fixture.nativeElement as HTMLElement;
  const names = () => [...page().querySelectorAll('ul.labels .chip')].map((chip) => textOf(chip));
  const chip = (name: string) => [...page().querySelectorAll<HTMLElement>('ul.labels .chip')].find((c) => textOf(c) === name);
  const button = (name: string) => [...page().querySelectorAll<HTMLButtonElement>('button')].find((b) => (b.getAttribute('aria-label') ?? textOf(b)) === name)!;
  const bookChips = () => [...(chips.nativeElement as HTMLElement).querySelectorAll('li.chip')].map((c) => textOf(c));
  const message = () => textOf(field(page(), 'Label name').closest('mat-form-field')?.querySelector('mat-error'));
  /** The book as the library filters it by one label. */
  const filteredBy = async (labelId: string) => {
    const books = (await journal.store.list('books')) as Book[];
    const index = new Map(books.map((b) => [b.id, searchText(b)]));
    return queryLibrary(books, index, { text: '', status: 'all', labelId, sort: { by: 'title', direction: 'asc' } }).map((b) => b.title);
  };

  beforeEach(async () => {
    journal = openTestJournal();
    await journal.db.open();
    await journal.store.write('books', LEDGER, {
      title: 'The Long Winter Ledger',
      format: 'print',
      status: 'reading',
      labelIds: [starter('Comfort read').id, starter('Page-turner').id],
      deleted: false,
    });
    // The book's chips first: TestBed keeps only the latest fixture in the document, and the page's fields are found through it.
    chips = TestBed.createComponent(LabelChips);
    chips.componentRef.setInput('labelIds', [starter('Comfort read').id, starter('Page-turner').id]);
    fixture = TestBed.createComponent(LabelsPage);
    await until(() => names().length === STARTER_LABELS.length, fixture);
    await until(() => bookChips().length === 2, chips);
  });

  afterEach(async () => {
    chips.destroy();
    fixture.destroy();
    await journal.close();
  });

  it('creates a label with its colour and icon', async () => {
    button('New label').click();
    await until(() => !!page().querySelector('form'), fixture);
    type(field(page(), 'Label name'), ' Sea stories ');
    choose(field<HTMLSelectElement>(page(), 'Colour'), 'teal');
    choose(field<HTMLSelectElement>(page(), 'Icon'), 'flag');
    button('Save label').click();
    await until(() => !!chip('Sea stories') && !page().querySelector('form'), fixture);

    expect(chip('Sea stories')!.dataset['colour']).toBe('teal');
    expect(chip('Sea stories')!.querySelector('mat-icon')?.textContent?.trim()).toBe('flag');
    const own = ((await journal.store.list('labels')) as Label[]).filter((label) => !STARTER_LABELS.some((s) => s.id === label.id));
    expect(own.map(({ name, colour, icon }) => ({ name, colour, icon }))).toEqual([{ name: 'Sea stories', colour: 'teal', icon: 'flag' }]);
  });

  it('refuses a name of spaces only, saying it is required', async () => {
    button('New label').click();
    await until(() => !!page().querySelector('form'), fixture);
    type(field(page(), 'Label name'), '   ');
    button('Save label').click();
    await until(() => message() !== '', fixture);

    expect(message()).toBe('Name is required');
    expect(page().querySelector('form')).not.toBeNull();
    expect(await journal.store.list('labels')).toEqual([]);
  });

  it('renames a starter label in its own row, and the book shows the new name and still filters by it', async () => {
    const comfort = starter('Comfort read');
    button('Change Comfort read').click();
    await until(() => field(page(), 'Label name')?.value === 'Comfort read', fixture);
    type(field(page(), 'Label name'), 'Cosy read');
    button('Save label').click();
    await until(() => !!chip('Cosy read'), fixture);

    expect(names()).not.toContain('Comfort read');
    expect(names().length).toBe(STARTER_LABELS.length);
    expect(await journal.store.get('labels', comfort.id)).toEqual(
      jasmine.objectContaining({ name: 'Cosy read', colour: comfort.colour, icon: comfort.icon, deleted: false }),
    );
    await until(() => bookChips().includes('Cosy read'), chips);
    expect(bookChips()).toEqual(['Cosy read', 'Page-turner']);
    expect(await filteredBy(comfort.id)).toEqual(['The Long Winter Ledger']);
  });

  it('removes a starter label; the book keeps its other labels and opens as before', async () => {
    button('Remove Page-turner').click();
    await until(() => !chip('Page-turner'), fixture);

    expect(names().length).toBe(STARTER_LABELS.length - 1);
    expect(await journal.store.get('labels', starter('Page-turner').id)).toEqual(jasmine.objectContaining({ deleted: true }));
    await until(() => bookChips().length === 1, chips);
    expect(bookChips()).toEqual(['Comfort read']);
    const book = (await journal.store.get('books', LEDGER)) as Book;
    expect(book.labelIds).toEqual([starter('Comfort read').id, starter('Page-turner').id]); // the book itself is untouched
    expect(await filteredBy(starter('Comfort read').id)).toEqual(['The Long Winter Ledger']);
  });
});

import { TestBed } from '@angular/core/testing';

import { Notebooks } from '../notebooks';
import { openTestJournal, textOf, until, type TestJournal } from '../../../core/testing/test-journal';
import { BookNotebooks } from './book-notebooks';

describe('BookNotebooks', () => {
  let journal: TestJournal;
  beforeEach(() => (journal = openTestJournal()));
  afterEach(() => journal.close());

  it('lists the notebooks attached to the book, with links, and none of the others', async () => {
    const notebooks = TestBed.inject(Notebooks);
    const bookId = await journal.store.create('books', { title: 'Wintering Birds' });
    const otherBook = await journal.store.create('books', { title: 'Atlas of Tides' });
    const kept = await notebooks.createNotebook('Feeder log', bookId);
    await notebooks.addPage(kept, null, '2026-03-08');
    await notebooks.removeNotebook(await notebooks.createNotebook('Thrown away', bookId));
    await notebooks.createNotebook('Tides', otherBook);
    await notebooks.createNotebook('Anything', null);

    const fixture = TestBed.createComponent(BookNotebooks);
    fixture.componentRef.setInput('bookId', bookId);
    const element = fixture.nativeElement as HTMLElement;
    await until(() => element.querySelectorAll('li').length > 0, fixture);

    expect(Array.from(element.querySelectorAll('li')).map(textOf)).toEqual(['Feeder log · 1 page']);
    expect(element.querySelector('li a')?.getAttribute('href')).toBe(`/journal/notebooks/${kept}`);
    expect(element.querySelector<HTMLAnchorElement>('.head a')?.getAttribute('href')).toBe(`/journal/notebooks?book=${bookId}`);
  });

  it('says when no notebook is about the book', async () => {
    const bookId = await journal.store.create('books', { title: 'Unwritten' });
    const fixture = TestBed.createComponent(BookNotebooks);
    fixture.componentRef.setInput('bookId', bookId);
    const element = fixture.nativeElement as HTMLElement;
    await until(() => textOf(element).includes('No notebook is about this book yet.'), fixture);
    expect(element.querySelectorAll('ul.notebooks li').length).toBe(0);
  });
});

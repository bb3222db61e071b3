import { TestBed, type ComponentFixture } from '@angular/core/testing';
import { Router } from '@angular/router';

import { Notebooks } from '../notebooks';
import { openTestJournal, textOf, until, type TestJournal } from '../../../core/testing/test-journal';
import { NotebooksPage } from './notebooks-page';

describe('NotebooksPage', () => {
  let journal: TestJournal;
  let navigate: jasmine.Spy;
  let fixture: ComponentFixture<NotebooksPage>;
  let element: HTMLElement;

  beforeEach(() => {
    journal = openTestJournal();
    navigate = spyOn(TestBed.inject(Router), 'navigate').and.resolveTo(true);
  });
  afterEach(() => journal.close());

  const open = () => {
    fixture = TestBed.createComponent(NotebooksPage);
    element = fixture.nativeElement as HTMLElement;
  };
  const titleInput = () => element.querySelector<HTMLInputElement>('.start input')!;
  const bookSelect = () => element.querySelector<HTMLSelectElement>('.start select')!;
  const type = (input: HTMLInputElement, value: string) => {
    input.value = value;
    input.dispatchEvent(new Event('input'));
  };
  const submit = () => element.querySelector<HTMLButtonElement>('.start button[type=submit]')!.click();

  it('shows an empty state, then starts a notebook about a chosen book and opens it', async () => {
    const bookId = await journal.store.create('books', { title: 'Atlas of Tides' });
    open();
    await until(() => textOf(element).includes('No notebooks yet') && bookSelect().options.length === 2, fixture);

    type(titleInput(), '  Tide tables ');
    bookSelect().value = bookId;
    bookSelect().dispatchEvent(new Event('change'));
    submit();
    await until(() => navigate.calls.count() === 1, fixture);

    const [notebook] = await journal.store.list('notebooks');
    expect(notebook).toEqual(jasmine.objectContaining({ title: 'Tide tables', bookId }));
    expect(navigate).toHaveBeenCalledWith(['/journal/notebooks', notebook!.id]);
  });

  it('lists each notebook with its book, page count and last edit', async () => {
    const notebooks = TestBed.inject(Notebooks);
    const bookId = await journal.store.create('books', { title: 'Atlas of Tides' });
    const withBook = await notebooks.createNotebook('Tide tables', bookId);
    await notebooks.createNotebook('Anything at all', null);
    await notebooks.addPage(withBook, null, '2026-03-08');
    await notebooks.addPage(withBook, null, '2026-03-08');
    open();
    await until(() => element.querySelectorAll('li.notebook').length === 2, fixture);

    const items = Array.from(element.querySelectorAll('li.notebook')).map((item) => Array.from(item.querySelectorAll('.title, .book, .facts')).map(textOf));
    // The one edited last comes first.
    expect(items[0]!.slice(0, 2)).toEqual(['Tide tables', 'On Atlas of Tides']);
    expect(items[0]![2]).toMatch(/^2 pages · edited \w{3} \d{1,2}, \d{4}/);
    expect(items[1]!.slice(0, 1)).toEqual(['Anything at all']);
    expect(items[1]![1]).toMatch(/^0 pages · edited /);
    expect(element.querySelector<HTMLAnchorElement>('li.notebook a')?.getAttribute('href')).toBe(`/journal/notebooks/${withBook}`);
  });

  it('says what is wrong with the title, and saves nothing', async () => {
    open();
    await until(() => !!titleInput(), fixture);

    type(titleInput(), '   ');
    submit();
    await until(() => textOf(element.querySelector('mat-error')) === 'A title is required', fixture);
    type(titleInput(), 'x'.repeat(301));
    submit();
    await until(() => textOf(element.querySelector('mat-error')) === 'Use at most 300 characters', fixture);

    expect(await journal.store.list('notebooks')).toEqual([]);
    expect(navigate).not.toHaveBeenCalled();
  });

  it('starts with the book from ?book= chosen', async () => {
    const bookId = await journal.store.create('books', { title: 'Wintering Birds' });
    open();
    fixture.componentRef.setInput('book', bookId);
    await until(() => bookSelect()?.options.length === 2 && bookSelect().value === bookId, fixture);
    expect(bookSelect().selectedOptions[0]?.textContent?.trim()).toBe('Wintering Birds');
  });
});

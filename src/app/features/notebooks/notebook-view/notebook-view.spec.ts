import { TestBed, type ComponentFixture } from '@angular/core/testing';
import { Router } from '@angular/router';

import { STARTER_TEMPLATES } from '@shared/journal/starter-templates';

import { LEAVE_WITHOUT_ASKING } from '../../../core/pwa/unsaved-work-guard';
import { Notebooks } from '../notebooks';
import { openTestJournal, outboxMark, outboxSince, textOf, until, type TestJournal } from '../../../core/testing/test-journal';
import { NotebookView } from './notebook-view';

describe('NotebookView', () => {
  let journal: TestJournal;
  let notebooks: Notebooks;
  let navigate: jasmine.Spy;
  let fixture: ComponentFixture<NotebookView>;
  let element: HTMLElement;
  let notebookId: string;
  let bookId: string;
  let pageIds: string[];

  beforeEach(async () => {
    journal = openTestJournal();
    notebooks = TestBed.inject(Notebooks);
    navigate = spyOn(TestBed.inject(Router), 'navigate').and.resolveTo(true);
    bookId = await journal.store.create('books', { title: 'The Salt Roads' });
    notebookId = await notebooks.createNotebook('Coast reading', bookId);
    pageIds = [];
    for (const title of ['Harbour', 'Dunes', 'Lighthouse']) {
      const id = await notebooks.addPage(notebookId, null, '2026-03-08');
      await journal.store.write('notebookPages', id, { title, body: `Notes on the **${title.toLowerCase()}**.` });
      pageIds.push(id);
    }
    fixture = TestBed.createComponent(NotebookView);
    fixture.componentRef.setInput('id', notebookId);
    element = fixture.nativeElement as HTMLElement;
    await until(() => element.querySelectorAll('li.page').length === 3, fixture);
  });
  afterEach(() => journal.close());

  const titles = () => Array.from(element.querySelectorAll('li.page .page-title')).map(textOf);
  const button = (label: string) => element.querySelector<HTMLButtonElement>(`button[aria-label="${label}"]`)!;
  const buttonNamed = (text: string) => Array.from(element.querySelectorAll('button')).find((b) => textOf(b).endsWith(text))!;

  it('shows the notebook, its book and its pages in order with excerpts without formatting marks', () => {
    expect(textOf(element.querySelector('h1'))).toBe('Coast reading');
    expect(textOf(element.querySelector('.book'))).toBe('On The Salt Roads');
    expect(titles()).toEqual(['Harbour', 'Dunes', 'Lighthouse']);
    expect(textOf(element.querySelector('.excerpt'))).toBe('Notes on the harbour.');
    expect(button('Move up: Harbour').disabled).toBeTrue();
    expect(button('Move down: Lighthouse').disabled).toBeTrue();
  });

  it('keeps headings and items apart in an excerpt, and cuts a long one short', async () => {
    await journal.store.write('notebookPages', pageIds[1]!, { body: `# Dunes\n- marram grass\n- *sand* in everything\n\n${'wind '.repeat(60)}` });
    await until(() => textOf(element.querySelectorAll('.excerpt')[1]).startsWith('Dunes · marram grass · sand in everything · wind'), fixture);
    const excerpt = textOf(element.querySelectorAll('.excerpt')[1]);
    expect(excerpt.length).toBeLessThanOrEqual(160);
    expect(excerpt).toMatch(/wind…$/);
  });

  it('moves a page down and up', async () => {
    button('Move down: Harbour').click();
    await until(() => titles()[1] === 'Harbour', fixture);
    expect(titles()).toEqual(['Dunes', 'Harbour', 'Lighthouse']);
    button('Move up: Lighthouse').click();
    await until(() => titles()[1] === 'Lighthouse', fixture);
    expect(titles()).toEqual(['Dunes', 'Lighthouse', 'Harbour']);
  });

  it('adds a page from a chosen template and opens it', async () => {
    const template = STARTER_TEMPLATES.find((t) => t.name === 'Opening pages')!;
    const select = element.querySelector<HTMLSelectElement>('.add select')!;
    expect(Array.from(select.options).map((o) => o.textContent?.trim())).toEqual(['A blank page', ...STARTER_TEMPLATES.map((t) => t.name)]);
    select.value = template.id;
    select.dispatchEvent(new Event('change'));
    buttonNamed('Add a page').click();
    await until(() => navigate.calls.count() === 1, fixture);

    const pages = await notebooks.pagesOf(notebookId);
    const added = pages.at(-1)!;
    expect(added.title).toBe('Opening pages of The Salt Roads');
    expect(navigate).toHaveBeenCalledWith(['/journal/notebooks', notebookId, 'pages', added.id]);
  });

  it('offers the reader’s own templates first', async () => {
    await notebooks.saveTemplate('Commute', { title: 'On the train', body: '' });
    await until(() => !!element.querySelector('optgroup[label="Your templates"] option'), fixture);
    expect(textOf(element.querySelector('optgroup[label="Your templates"]'))).toBe('Commute');
  });

  it('deletes a page', async () => {
    button('Delete page: Dunes').click();
    await until(() => titles().length === 2, fixture);
    expect(titles()).toEqual(['Harbour', 'Lighthouse']);
  });

  it('renames the notebook and detaches its book, writing only the fields that changed', async () => {
    buttonNamed('Rename or change book').click();
    await until(() => !!element.querySelector('form.details'), fixture);
    const title = element.querySelector<HTMLInputElement>('form.details input')!;
    const book = element.querySelector<HTMLSelectElement>('form.details select')!;
    expect(title.value).toBe('Coast reading');
    expect(book.value).toBe(bookId);

    const mark = await outboxMark(journal.db);
    book.value = '';
    book.dispatchEvent(new Event('change'));
    buttonNamed('Save notebook').click();
    await until(() => !element.querySelector('form.details') && !element.querySelector('.book'), fixture);
    expect((await outboxSince(journal.db, mark)).map((c) => [c.field, c.value])).toEqual([['bookId', null]]);
    const renameMark = await outboxMark(journal.db);

    buttonNamed('Rename or change book').click();
    await until(() => !!element.querySelector('form.details'), fixture);
    const input = element.querySelector<HTMLInputElement>('form.details input')!;
    input.value = 'Shore reading';
    input.dispatchEvent(new Event('input'));
    buttonNamed('Save notebook').click();
    await until(() => textOf(element.querySelector('h1')) === 'Shore reading', fixture);
    expect((await outboxSince(journal.db, renameMark)).map((c) => c.field)).toEqual(['title']);
  });

  it('deletes the notebook with its pages after asking', async () => {
    buttonNamed('Delete notebook…').click();
    await until(() => textOf(element).includes('and its 3 pages, on every device?'), fixture);
    buttonNamed('Delete notebook').click();
    await until(() => navigate.calls.count() === 1, fixture);
    // Deleting is meant: the way out does not ask about half-typed details.
    expect(navigate).toHaveBeenCalledWith(['/journal/notebooks'], { info: LEAVE_WITHOUT_ASKING });
    expect(await notebooks.pagesOf(notebookId)).toEqual([]);
  });
});

import { TestBed } from '@angular/core/testing';

import { STARTER_TEMPLATES } from '@shared/journal/starter-templates';
import type { NotebookPage, PageTemplate } from '@shared/sync/schema/collections';

import { Notebooks } from './notebooks';
import { openTestJournal, outboxMark, outboxSince, type TestJournal } from '../../core/testing/test-journal';
import { Deletions } from '../../core/trash/deletions';

describe('Notebooks (real IndexedDB)', () => {
  let journal: TestJournal;
  let notebooks: Notebooks;

  beforeEach(() => {
    journal = openTestJournal();
    notebooks = TestBed.inject(Notebooks);
  });
  afterEach(() => journal.close());

  const outboxOf = async (rowId: string) => (await journal.db.outbox.toArray()).filter((change) => change.rowId === rowId);

  it('starts a page from a starter template with its placeholders filled for the day and the book', async () => {
    const bookId = await journal.store.create('books', { title: 'The Salt Roads', authors: ['Wren Okafor'] });
    const notebookId = await notebooks.createNotebook('  Coast reading ', bookId);
    const sitting = STARTER_TEMPLATES.find((t) => t.name === 'After a sitting')!;

    const pageId = await notebooks.addPage(notebookId, sitting, '2026-03-08');

    const page = (await journal.store.get('notebookPages', pageId)) as NotebookPage;
    expect((await journal.store.get('notebooks', notebookId))?.title).toBe('Coast reading');
    expect(page.title).toBe('The Salt Roads · Sunday 2026-03-08');
    expect(page.body).toBe(sitting.body);
    expect(page.notebookId).toBe(notebookId);
    expect(page.position).toBe(0);
  });

  it('adds blank pages at the end and moves one with a single position write', async () => {
    const notebookId = await notebooks.createNotebook('Loose thoughts', null);
    const first = await notebooks.addPage(notebookId, null, '2026-03-08');
    const second = await notebooks.addPage(notebookId, null, '2026-03-08');
    const third = await notebooks.addPage(notebookId, null, '2026-03-08');
    expect((await notebooks.pagesOf(notebookId)).map((p) => p.id)).toEqual([first, second, third]);
    expect((await journal.store.get('notebookPages', first))?.title).toBeUndefined(); // blank: nothing written

    const mark = await outboxMark(journal.db);
    await notebooks.movePage(notebookId, third, -1);

    expect((await notebooks.pagesOf(notebookId)).map((p) => p.id)).toEqual([first, third, second]);
    const changes = await outboxSince(journal.db, mark);
    expect(changes.map((c) => [c.rowId, c.field])).toEqual([[third, 'position']]);

    await notebooks.movePage(notebookId, first, -1); // already first: nothing to write
    expect(await outboxSince(journal.db, mark)).toEqual(changes);
  });

  it('deletes a page and brings it back; deletes a notebook together with its pages', async () => {
    const notebookId = await notebooks.createNotebook('Short-lived', null);
    const pageId = await notebooks.addPage(notebookId, null, '2026-03-08');
    await TestBed.inject(Deletions).remove('notebookPages', pageId);
    expect(await notebooks.pagesOf(notebookId)).toEqual([]);
    await TestBed.inject(Deletions).restore('notebookPages', pageId);
    expect((await notebooks.pagesOf(notebookId)).length).toBe(1);

    await notebooks.removeNotebook(notebookId);
    expect((await journal.store.get('notebooks', notebookId))?.deleted).toBeTrue();
    expect((await journal.store.get('notebookPages', pageId))?.deleted).toBeTrue();
  });

  it('saves a page as a template of the reader’s own, renames it (one field) and deletes it', async () => {
    const id = await notebooks.saveTemplate(' Commute ', { title: ' On the train ', body: '## Stops\n- ' });
    expect((await journal.store.get('pageTemplates', id)) as PageTemplate).toEqual(
      jasmine.objectContaining({ name: 'Commute', title: 'On the train', body: '## Stops\n- ', deleted: false }),
    );

    await notebooks.renameTemplate(id, 'Train rides');
    expect((await outboxOf(id)).at(-1)).toEqual(jasmine.objectContaining({ field: 'name', value: 'Train rides' }));
    await TestBed.inject(Deletions).remove('pageTemplates', id);
    expect((await journal.store.get('pageTemplates', id))?.deleted).toBeTrue();
  });

  it('keeps a template’s long book title within the schema’s length', async () => {
    const bookId = await journal.store.create('books', { title: 'W'.repeat(290) });
    const notebookId = await notebooks.createNotebook('Long', bookId);
    const pageId = await notebooks.addPage(notebookId, { id: 't', name: 'T', title: '{{book}} {{book}}', body: '', starter: false }, '2026-03-08');
    expect((await journal.store.get('notebookPages', pageId))?.title?.length).toBe(300);
  });
});

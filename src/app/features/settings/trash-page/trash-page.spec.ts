import { TestBed, type ComponentFixture } from '@angular/core/testing';

import { textOf } from '../../../core/testing/goal-fixtures';
import { openTestJournal, until, type TestJournal } from '../../../core/testing/test-journal';
import { Deletions } from '../../../core/trash/deletions';
import { TrashPage } from './trash-page';

const BOOK = '00000000-0000-4000-8000-0000000f0001';
const SESSIONS = ['00000000-0000-4000-8000-0000000f0101', '00000000-0000-4000-8000-0000000f0102'];
const LABEL = '00000000-0000-4000-8000-0000000f0301';

/** Trash against a real IndexedDB journal. */
describe('TrashPage', () => {
  let journal: TestJournal;
  let fixture: ComponentFixture<TrashPage>;
  const page = () => fixture.nativeElement as HTMLElement;
  const groups = () => [...page().querySelectorAll('section')].map((s) => [textOf(s.querySelector('h2')), [...s.querySelectorAll('li')].map((li) => textOf(li))]);

  beforeEach(async () => {
    journal = openTestJournal();
    await journal.db.open();
    await journal.store.write('books', BOOK, { title: 'The Copper Weir', format: 'print', status: 'reading', deleted: false });
    for (const id of SESSIONS) await journal.store.write('sessions', id, { bookId: BOOK, activeMinutes: 20, deleted: false });
    await journal.store.write('labels', LABEL, { name: 'Rainy day', colour: 'sky', icon: 'spa', deleted: false });
    const deletions = TestBed.inject(Deletions);
    await deletions.remove('books', BOOK);
    await deletions.remove('labels', LABEL);
    fixture = TestBed.createComponent(TrashPage);
    await until(() => page().querySelectorAll('li').length === 2, fixture);
  });

  afterEach(async () => {
    fixture.destroy();
    await journal.close();
  });

  it('groups deleted things by kind, a book with the sessions that went with it', () => {
    const [books, labels] = groups();
    expect(books![0]).toBe('Books');
    expect(books![1]).toEqual([jasmine.stringMatching(/^The Copper Weir Deleted .* With 2 sessions Restore$/)]);
    expect(labels![0]).toBe('Labels');
    expect(page().querySelector('.edited')).toBeNull();
  });

  it('notes a book written to after its delete (a later clock than the delete’s)', async () => {
    await journal.store.write('books', BOOK, { title: 'The Copper Weir, revised' });
    await until(() => !!page().querySelector('.edited'), fixture);
    expect(textOf(page().querySelector('.edited'))).toContain('Edited on another device after it was deleted');
  });

  it('restores a book together with its sessions', async () => {
    page().querySelector<HTMLButtonElement>('button[aria-label="Restore The Copper Weir"]')!.click();
    await until(() => page().querySelectorAll('li').length === 1, fixture);
    expect((await journal.store.get('books', BOOK))?.deleted).toBeFalse();
    for (const id of SESSIONS) expect((await journal.store.get('sessions', id))?.deleted).toBeFalse();
    expect(textOf(page().querySelector('[role="status"]'))).toBe('The Copper Weir is back.');
  });
});

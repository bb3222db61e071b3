import { TestBed } from '@angular/core/testing';

import { formatHlc } from '@shared/sync/hlc';

import { until } from '../testing/sync-backend';
import { rememberOverwritten } from '../overwritten-edits';
import { OverwrittenNote } from './overwritten-note';
import { openTestJournal, type TestJournal } from '../../testing/test-journal';

describe('OverwrittenNote', () => {
  let journal: TestJournal;

  beforeEach(() => {
    journal = openTestJournal();
  });

  afterEach(async () => {
    await journal.close();
  });

  it('shows which edit another device overwrote: the field, what was written here, what it reads now, and the device', async () => {
    const db = journal.db;
    const rowId = crypto.randomUUID();
    const change = {
      id: crypto.randomUUID(),
      collection: 'books',
      rowId,
      field: 'pageCount',
      value: 312,
      hlc: formatHlc({ wall: Date.now(), counter: 0, node: 'me' }),
    };
    await rememberOverwritten(db, [change], [{ id: change.id, by: formatHlc({ wall: Date.now() + 5, counter: 0, node: 'laptop-4f2a9c' }) }]);

    const fixture = TestBed.createComponent(OverwrittenNote);
    fixture.componentRef.setInput('collection', 'books');
    fixture.componentRef.setInput('row', { id: rowId, pageCount: 298 });
    await until(async () => {
      fixture.detectChanges();
      return !!fixture.nativeElement.querySelector('li');
    }, 'the note shows');

    expect(fixture.nativeElement.querySelector('li').textContent.replace(/\s+/g, ' ').trim()).toBe(
      'page count: you wrote “312”; it now reads “298” (device laptop-4).',
    );

    fixture.componentRef.setInput('row', { id: crypto.randomUUID(), pageCount: 298 });
    fixture.detectChanges();
    expect(fixture.nativeElement.querySelector('li')).toBeNull(); // another book: nothing
  });
});

import { ChangeDetectionStrategy, Component, viewChild } from '@angular/core';
import { TestBed } from '@angular/core/testing';

import type { Table } from 'dexie';

import type { LocalRow } from '@shared/sync/local-row';
import { patiently } from '../testing/patience';
import { openTestJournal, type TestJournal } from '../testing/test-journal';
import { MergeableTextarea, type TextTarget } from './mergeable-textarea';

const PAGE_ID = 'page-harbour';

@Component({
  selector: 'll-text-host',
  imports: [MergeableTextarea],
  template: `<textarea [llMergeableText]="target"></textarea>`,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
class TextHost {
  readonly target: TextTarget = { collection: 'notebookPages', rowId: PAGE_ID, field: 'body' };
  readonly text = viewChild.required(MergeableTextarea);
}

describe('MergeableTextarea', () => {
  let journal: TestJournal;

  beforeEach(async () => {
    journal = openTestJournal();
    await journal.store.write('notebookPages', PAGE_ID, { title: 'Harbour', body: 'Gulls.' });
  });
  afterEach(() => journal.close());

  function open(): { text: MergeableTextarea; area: HTMLTextAreaElement } {
    const fixture = TestBed.createComponent(TextHost);
    fixture.detectChanges();
    return { text: fixture.componentInstance.text(), area: (fixture.nativeElement as HTMLElement).querySelector('textarea')! };
  }

  it('is loaded once the stored text has arrived, and what is typed after it is a pending edit', async () => {
    const { text, area } = open();
    await text.whenLoaded();
    expect(area.value).toBe('Gulls.');
    expect(text.pendingEdits()).toBeNull();
    area.value = 'Gulls. Terns.';
    area.dispatchEvent(new Event('input'));
    expect(text.pendingEdits()?.count).toBe(1);
  });

  it('says why when the stored text cannot be read, rather than leaving a save waiting for ever', async () => {
    // The row's read fails, as when the database closes under the page.
    const rows = journal.db.rows.bind(journal.db);
    spyOn(journal.db, 'rows').and.callFake(((collection: string) =>
      collection === 'notebookPages'
        ? ({ get: () => Promise.reject(new Error('The database connection is closing.')) } as unknown as Table<LocalRow, string>)
        : rows(collection)) as typeof journal.db.rows);
    const { text, area } = open();
    area.value = 'Typed while the read failed.';
    area.dispatchEvent(new Event('input'));

    let outcome = 'waiting';
    text.whenLoaded().then(
      () => (outcome = 'loaded'),
      (error: unknown) => (outcome = `refused: ${(error as Error).message}`),
    );
    await patiently('the read to fail', () => outcome !== 'waiting');
    expect(outcome).toBe('refused: The database connection is closing.');
    // Nothing typed is taken as an edit of a text that was never read, and the box keeps it.
    expect(text.pendingEdits()).toBeNull();
    expect(area.value).toBe('Typed while the read failed.');
  });
});

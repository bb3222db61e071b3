import { TestBed, type ComponentFixture } from '@angular/core/testing';
import * as Y from 'yjs';

import { applyPulledTexts, textStatesOf } from '@shared/text/apply-pulled-texts';
import { localTextState } from '@shared/text/local-text';
import { loadTextDoc, textDocName } from '@shared/text/text-doc';
import { encodeTextBytes } from '@shared/text/text-value';

import { patiently } from '../../../core/testing/patience';
import { openTestJournal, textOf, until, type TestJournal } from '../../../core/testing/test-journal';
import { MergeableTextarea } from '../../../core/text/mergeable-textarea';
import { fieldOverlaps } from '../../../ui/testing/field-overlaps';
import { ReadingEditor } from './reading-editor';

describe('ReadingEditor (review and takeaways as mergeable texts)', () => {
  let journal: TestJournal;
  let fixture: ComponentFixture<ReadingEditor>;
  let element: HTMLElement;
  const bookId = crypto.randomUUID();
  const readingId = crypto.randomUUID();

  beforeEach(async () => {
    journal = openTestJournal();
    await journal.store.write('books', bookId, { title: 'The Salt Roads', authors: ['Wren Okafor'], format: 'print', status: 'finished', deleted: false });
    await journal.store.write('readings', readingId, { bookId, startedOn: '2026-03-01', review: 'A slow start.', deleted: false });
    fixture = TestBed.createComponent(ReadingEditor);
    fixture.componentRef.setInput('id', bookId);
    fixture.componentRef.setInput('readingId', readingId);
    element = fixture.nativeElement as HTMLElement;
    await until(() => review().value === 'A slow start.', fixture);
  });
  afterEach(() => journal.close());

  const review = () => element.querySelector<HTMLTextAreaElement>('textarea[formcontrolname=review]')!;

  it('leaves room under every hint, on a phone and on a laptop, so no hint runs into the next field (issue 19)', async () => {
    for (const width of ['360px', '760px']) {
      element.style.display = 'block';
      element.style.width = width;
      await until(() => element.getBoundingClientRect().width === parseInt(width, 10), fixture);
      expect(fieldOverlaps(element, 4)).withContext(width).toEqual([]);
    }
    expect(element.querySelectorAll('mat-hint').length).toBeGreaterThan(0);
  });

  it('keeps the reader’s typing and another device’s edit of the review, and saves the typing as a Yjs update', async () => {
    const area = review();
    area.focus();
    area.value = 'A slow start, then wonderful.';
    area.dispatchEvent(new Event('input'));

    // Another device adds a line at the end; a pull stores it as DexieSyncPorts.apply does.
    const name = textDocName('readings', readingId, 'review');
    const row = (await journal.db.rows('readings').get(readingId))!;
    const remote = loadTextDoc([localTextState(name, { state: textStatesOf(row)['review'], text: row['review'] as string })]);
    remote.getText(name).insert(13, '\nRead it on the train.');
    const pulled = {
      field: 'review',
      value: 'A slow start.\nRead it on the train.',
      hlc: '999999999999999:00000:other',
      state: encodeTextBytes(Y.encodeStateAsUpdate(remote)),
    };
    await journal.db.rows('readings').put(applyPulledTexts('readings', row, [pulled]));
    await until(() => area.value === 'A slow start, then wonderful.\nRead it on the train.', fixture);

    element.querySelector<HTMLFormElement>('form')!.requestSubmit();
    const expected = 'A slow start, then wonderful.\nRead it on the train.';
    await patiently('the review saved', async () => (await journal.store.get('readings', readingId))?.review === expected);
    expect((await journal.store.get('readings', readingId))?.review).toBe(expected);
    const last = (await journal.db.outbox.toArray()).filter((change) => change.field === 'review').at(-1)!;
    expect(Object.keys(last.value as object)).toEqual(['yjs']);
  });

  it('says the reading was not saved when its stored review could not be read, keeping the typing and writing nothing', async () => {
    spyOn(MergeableTextarea.prototype, 'whenLoaded').and.rejectWith(new Error('The database connection is closing.'));
    const before = await journal.db.outbox.count();
    review().value = 'A slow start, then wonderful.';
    review().dispatchEvent(new Event('input'));
    element.querySelector<HTMLFormElement>('form')!.requestSubmit();
    await until(() => textOf(element.querySelector('[role=alert]')) !== '', fixture);
    expect(textOf(element.querySelector('[role=alert]'))).toBe('This reading could not be saved. What was saved before is unchanged.');
    expect(review().value).toBe('A slow start, then wonderful.');
    expect(await journal.db.outbox.count()).toBe(before);
    expect((await journal.store.get('readings', readingId))?.review).toBe('A slow start.');
  });
});

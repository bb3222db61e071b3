import { TestBed, type ComponentFixture } from '@angular/core/testing';

import type { Series } from '@shared/sync/schema/collections';

import { choose, field, textOf, type } from '../../../core/testing/goal-fixtures';
import { openTestJournal, until, type TestJournal } from '../../../core/testing/test-journal';
import { SeriesPage } from './series-page';

const ISLES = '00000000-0000-4000-8000-00000000d001';

/** One series against a real IndexedDB journal: the reader's view of the series is saved, and only what changed. */
describe('SeriesPage', () => {
  let journal: TestJournal;
  let fixture: ComponentFixture<SeriesPage>;

  const page = () => fixture.nativeElement as HTMLElement;
  const save = () => [...page().querySelectorAll<HTMLButtonElement>('button')].find((b) => textOf(b) === 'Save')!.click();
  const status = () => textOf(page().querySelector('form [role="status"]'));
  const messageUnder = (label: string) => textOf(field(page(), label).closest('mat-form-field')?.querySelector('mat-error'));
  const outboxFields = async () => (await journal.db.outbox.toArray()).filter((e) => e.rowId === ISLES).map((e) => e.field);

  beforeEach(async () => {
    journal = openTestJournal();
    await journal.db.open();
    await journal.store.write('series', ISLES, { name: 'The Lantern Isles', deleted: false });
    const inSeries = { format: 'print', seriesId: ISLES, deleted: false } as const;
    await journal.store.write('books', '00000000-0000-4000-8000-00000000d011', { ...inSeries, title: 'Tide of Salt', seriesPosition: 1, status: 'finished' });
    await journal.store.write('books', '00000000-0000-4000-8000-00000000d012', { ...inSeries, title: 'Tide of Glass', seriesPosition: 2, status: 'tbr' });
    await journal.db.outbox.clear(); // so the spec sees only the page's own writes
    fixture = TestBed.createComponent(SeriesPage);
    fixture.componentRef.setInput('id', ISLES);
    await until(() => !!page().querySelector('form') && field(page(), 'Series name').value === 'The Lantern Isles', fixture);
  });

  afterEach(async () => {
    fixture.destroy();
    await journal.close();
  });

  it('saves the planned count, the rating and the review, writing only those fields', async () => {
    expect(textOf(page().querySelector('.progress p'))).toBe('1 of 2 read');
    type(field(page(), 'Books planned'), '5');
    choose(field<HTMLSelectElement>(page(), 'Rating of the series'), '4.5');
    type(field<HTMLTextAreaElement>(page(), 'Review of the series'), '  Better with every tide.  ');
    save();
    await until(() => status() === 'Saved on this device.', fixture);

    expect(await journal.store.get('series', ISLES)).toEqual(
      jasmine.objectContaining({ name: 'The Lantern Isles', plannedCount: 5, rating: 4.5, review: 'Better with every tide.' }),
    );
    expect((await outboxFields()).sort()).toEqual(['plannedCount', 'rating', 'review']);
    await until(() => textOf(page().querySelector('.progress p')) === '1 of 5 read', fixture);
  });

  it('keeps the saved values in the form when the page opens again', async () => {
    await journal.store.write('series', ISLES, { plannedCount: 7, rating: 3.5, review: 'Slow, then wonderful.' });
    fixture.destroy();
    fixture = TestBed.createComponent(SeriesPage);
    fixture.componentRef.setInput('id', ISLES);
    await until(() => (page().querySelector<HTMLInputElement>('input[formcontrolname="plannedCount"]')?.value ?? '') === '7', fixture);
    expect(field<HTMLSelectElement>(page(), 'Rating of the series').value).toBe('3.5');
    expect(field<HTMLTextAreaElement>(page(), 'Review of the series').value).toBe('Slow, then wonderful.');
  });

  it('refuses a planned count outside 1 to 500, with the reason, and writes nothing', async () => {
    for (const planned of ['0', '501', '2.5']) {
      type(field(page(), 'Books planned'), planned);
      save();
      await until(() => messageUnder('Books planned') !== '', fixture);
      expect(messageUnder('Books planned')).withContext(planned).toBe('Use a whole number from 1 to 500');
    }
    expect(await outboxFields()).toEqual([]);
    expect((await journal.store.get('series', ISLES))?.plannedCount).toBeUndefined();
  });

  it('refuses a name of spaces only, saying it is required', async () => {
    type(field(page(), 'Series name'), '   ');
    save();
    await until(() => messageUnder('Series name') !== '', fixture);
    expect(messageUnder('Series name')).toBe('Name is required');
    expect(((await journal.store.get('series', ISLES)) as Series).name).toBe('The Lantern Isles');
    expect(await outboxFields()).toEqual([]);
  });
});

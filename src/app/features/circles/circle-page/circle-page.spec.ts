import { provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed, type ComponentFixture } from '@angular/core/testing';

import { Auth } from '../../../core/auth/auth';
import { field, textOf, type } from '../../../core/testing/goal-fixtures';
import { openTestJournal, until, type TestJournal } from '../../../core/testing/test-journal';
import { CirclePage } from './circle-page';

const CIRCLE = '00000000-0000-4000-8000-00000000c001';
const PICK = '00000000-0000-4000-8000-00000000c011';
const PART = '00000000-0000-4000-8000-00000000c021';
/** The page renders Material forms and Dexie live queries; a loaded machine needs more than the default 5 s. */
const SLOW = 20_000;

/** A host edits a pick and a part of the schedule on this device; the shared schema's reasons show under the fields. */
describe('CirclePage (host editing picks and parts)', () => {
  let journal: TestJournal;
  let fixture: ComponentFixture<CirclePage>;

  const page = () => fixture.nativeElement as HTMLElement;
  const button = (name: string) =>
    [...page().querySelectorAll<HTMLButtonElement>('button')].find((b) => textOf(b) === name || b.getAttribute('aria-label') === name)!;
  const errorUnder = (label: string) => textOf(field(page(), label).closest('mat-form-field')?.querySelector('mat-error'));
  const row = (table: string, id: string) => journal.db.table(table).get(id);

  beforeEach(async () => {
    journal = openTestJournal([provideHttpClientTesting()]);
    const { db } = journal;
    await db.open();
    const me = TestBed.inject(Auth).user()!.id;
    await db.circleMeta.put({ circleId: CIRCLE, role: 'host', members: [{ userId: me, displayName: 'Wren', role: 'host' }] });
    await db.table('circles').put({ id: CIRCLE, circleId: CIRCLE, name: 'The Lantern Readers', _hlc: {} });
    await db
      .table('circlePicks')
      .put({ id: PICK, circleId: CIRCLE, title: 'The Salt Orchard', authors: ['Ines Calloway'], format: 'print', pageCount: 300, _hlc: {} });
    await db
      .table('circleParts')
      .put({ id: PART, circleId: CIRCLE, pickId: PICK, position: 1, label: 'Part one', endKind: 'page', endValue: '120', date: '2031-03-14', _hlc: {} });
    fixture = TestBed.createComponent(CirclePage);
    fixture.componentRef.setInput('id', CIRCLE);
    await until(() => !!button('Edit pick The Salt Orchard'), fixture, 10_000);
  }, SLOW);

  afterEach(async () => {
    fixture.destroy();
    await journal.close();
  });

  it(
    'edits a pick’s title, authors and ISBN, refusing a wrong ISBN with the shared schema’s reason',
    async () => {
      button('Edit pick The Salt Orchard').click();
      await until(() => field(page(), 'Title').value === 'The Salt Orchard', fixture);
      expect(field(page(), 'Authors (commas between)').value).toBe('Ines Calloway');

      type(field(page(), 'ISBN-13 (optional)'), '978-0-306-40615-8'); // the check digit of 978-0-306-40615-? is 7
      button('Save the pick').click();
      await until(() => errorUnder('ISBN-13 (optional)') !== '', fixture);
      expect(errorUnder('ISBN-13 (optional)')).toBe('The ISBN is not a valid ISBN-13 (check digit)');
      expect((await row('circlePicks', PICK)).isbn).toBeUndefined();

      type(field(page(), 'Title'), 'The Salt Orchard, Revised');
      type(field(page(), 'Authors (commas between)'), 'Ines Calloway, Tomas Verhoeven');
      type(field(page(), 'ISBN-13 (optional)'), '978-0-306-40615-7');
      button('Save the pick').click();
      await until(() => textOf(page().querySelector('#pick-form h3')) === 'Add a pick', fixture);

      expect(await row('circlePicks', PICK)).toEqual(
        jasmine.objectContaining({ title: 'The Salt Orchard, Revised', authors: ['Ines Calloway', 'Tomas Verhoeven'], isbn: '9780306406157', pageCount: 300 }),
      );
      const queued = (await journal.db.circleOutbox.toArray()).filter((entry) => entry.rowId === PICK).map((entry) => entry.field);
      // Only what changed goes to the circle (per-field merge).
      expect(queued).toEqual(jasmine.arrayWithExactContents(['title', 'authors', 'isbn']));
    },
    SLOW,
  );

  it(
    'edits where a part ends, its place and link, refusing a javascript: link, then removes it',
    async () => {
      button('Edit Part one').click();
      await until(() => field(page(), 'Ends at').value === 'p. 120', fixture);

      type(field(page(), 'Ends at'), '45%');
      type(field(page(), 'Place (optional)'), 'The reading room');
      type(field(page(), 'Video link (optional)'), 'javascript:alert(1)');
      button('Save the part').click();
      await until(() => errorUnder('Video link (optional)') !== '', fixture);
      expect(errorUnder('Video link (optional)')).toBe('The link must be a web address (http or https)');

      type(field(page(), 'Video link (optional)'), 'http://127.0.0.1/meet');
      button('Save the part').click();
      await until(() => textOf(page().querySelector('#part-form h3')) === 'Add a part to the schedule', fixture);
      expect(await row('circleParts', PART)).toEqual(
        jasmine.objectContaining({ endKind: 'percent', endValue: '45', place: 'The reading room', link: 'http://127.0.0.1/meet', date: '2031-03-14' }),
      );
      await until(() => textOf(page().querySelector('.part')).includes('to 45 %'), fixture);

      button('Remove Part one').click();
      await until(() => page().querySelector('.part') === null, fixture);
      expect((await row('circleParts', PART)).deleted).toBeTrue();
    },
    SLOW,
  );

  it(
    'shows the circle’s cover and offers hosts the cover picker, whose choice is written to the circle',
    async () => {
      expect(page().querySelector('.cover-tool ll-cover-picker')).not.toBeNull();
      expect(page().querySelector('.head ll-book-cover')).toBeNull();
      const coverId = 'a'.repeat(64);

      await journal.db.table('circles').update(CIRCLE, { coverId });
      await until(() => page().querySelector('.head ll-book-cover') !== null, fixture);
      // The picker follows the circle's cover; a change goes out to the circle like any host edit.
      (fixture.componentInstance as unknown as { setCover(id: string | null): Promise<void> }).setCover(null);
      await until(() => page().querySelector('.head ll-book-cover') === null, fixture);
      const queued = (await journal.db.circleOutbox.toArray()).filter((entry) => entry.collection === 'circles');
      expect(queued.map((entry) => [entry.field, entry.value])).toEqual([['coverId', null]]);
    },
    SLOW,
  );

  it(
    'says what the circle sees, keeps progress sharing off until switched on, and adds the pick to the reader’s library',
    async () => {
      expect(textOf(page().querySelector('.privacy'))).toContain('Your journal, library, sessions and notes stay private');
      const toggle = page().querySelector<HTMLButtonElement>('.privacy [role="switch"]')!;
      expect(toggle.getAttribute('aria-checked')).toBe('false');

      button('Add to my library').click();
      await until(() => textOf(page()).includes('In your library'), fixture);
      const books = await journal.db.rows('books').toArray();
      expect(books).toEqual([jasmine.objectContaining({ title: 'The Salt Orchard', authors: ['Ines Calloway'], pageCount: 300 })]);
      const progress = await journal.db.table('circleProgress').toArray();
      expect(progress[0].bookLinks).toEqual({ [PICK]: books[0]!.id });
      expect(progress[0].shareProgress).toBeUndefined();
    },
    SLOW,
  );
});

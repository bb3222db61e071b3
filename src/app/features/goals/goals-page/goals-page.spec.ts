import { type ComponentFixture, TestBed } from '@angular/core/testing';

import { deterministicId } from '@shared/sync/deterministic-id';
import type { YearPlan } from '@shared/sync/schema/collections';

import type { JournalDb } from '../../../core/data/journal-db';
import type { JournalStore } from '../../../core/data/journal-store';
import { choose, field, setUpGoalSpec, textOf, type, until } from '../../../core/testing/goal-fixtures';
import { BOOK, seedLibrary } from '../../../core/testing/seed';
import { outboxMark, outboxSince } from '../../../core/testing/test-journal';
import { GoalsPage } from './goals-page';

describe('GoalsPage', () => {
  let store: JournalStore;
  let db: () => JournalDb;
  let tearDown: () => Promise<void>;
  let fixture: ComponentFixture<GoalsPage>;
  const element = (): HTMLElement => fixture.nativeElement;
  const planId = deterministicId('year-plan', '2026');
  const plan = async () => (await db().rows('yearPlans').get(planId)) as YearPlan | undefined;

  async function open(year?: string): Promise<void> {
    fixture = TestBed.createComponent(GoalsPage);
    if (year !== undefined) fixture.componentRef.setInput('year', year);
    await until(fixture, () => element().querySelector('#months-heading'), 'the page');
  }

  async function setUp(timeZone?: string): Promise<void> {
    ({ store, db, tearDown } = await setUpGoalSpec({ timeZone }));
    await seedLibrary(store);
  }

  afterEach(async () => tearDown());

  describe('for a reader in Los Angeles on 1 July 2026', () => {
    beforeEach(async () => setUp());

    it('sets a yearly goal in books, writing the year’s one row, and paces it', async () => {
      await open();
      expect(textOf(element().querySelector('h1'))).toBe('Goals for 2026');
      // No target until the reader sets one: empty fields, no pace drawn.
      expect(field(element(), 'Books this year').value).toBe('');
      expect(element().querySelector('ll-pace-bar')).toBeNull();
      const before = await db().outbox.count();
      type(field(element(), 'Books this year'), '12');
      element().querySelector<HTMLButtonElement>('.targets-form button[type="submit"]')!.click();
      await until(fixture, () => element().querySelector('li.unit[data-unit="books"]'), 'the pacing of books');

      // Only the fields given: the year, the tombstone and the books target (JournalStore adds no others).
      const changes = (await db().outbox.toArray()).slice(before);
      expect(changes.map((change) => [change.collection, change.rowId, change.field]).sort()).toEqual([
        ['yearPlans', planId, 'booksTarget'],
        ['yearPlans', planId, 'deleted'],
        ['yearPlans', planId, 'year'],
      ]);
      expect((await plan())?.booksTarget).toBe(12);

      // Hand-worked (rules of goalPacing): finished in 2026 in Los Angeles: jan, orchard, harrow = 3
      // (Evening Tide fell on 31 December 2025 there). 181 days gone → 12 × 181 / 365 = 5.95 expected;
      // 9 left over 184 days = 0.34 a week; 1 book (harrow) in the last 28 days → 3 + 184/28 = 9.57.
      const card = element().querySelector('li.unit[data-unit="books"]')!;
      expect(textOf(card.querySelector('.so-far'))).toBe('3 of 12 books');
      expect(textOf(card.querySelector('.message'))).toBe('About 0.3 books a week from now gets you there');
      // Our own picture of the pace: one bar, with the even-pace marker at 5.95 of 12.
      expect(card.querySelector('ll-pace-bar [role="img"]')?.getAttribute('aria-label')).toBe('3 of 12 books read; an even pace would be at 6 today.');
      expect(card.textContent).not.toContain('ahead of an even pace');
      const figures = Array.from(card.querySelectorAll('dd')).map(textOf);
      expect(figures).toEqual(['6', '3', '\u22123', '0.3', '9.6']);
      expect(element().querySelector('li.unit[data-unit="pages"]')).toBeNull();
    });

    it('writes only the target the reader changed', async () => {
      await store.write('yearPlans', planId, { year: 2026, booksTarget: 12, pagesTarget: 3000, deleted: false });
      await open();
      await until(fixture, () => element().querySelector('li.unit[data-unit="pages"]'), 'the pacing of pages');
      const change = Array.from(element().querySelectorAll<HTMLButtonElement>('button')).find((button) => textOf(button) === 'Change targets')!;
      change.click();
      await until(fixture, () => element().querySelector('.targets-form input'), 'the form');
      expect(field(element(), 'Books this year').value).toBe('12');
      const mark = await outboxMark(db());
      type(field(element(), 'Pages this year'), '4000');
      element().querySelector<HTMLButtonElement>('.targets-form button[type="submit"]')!.click();
      await until(fixture, () => !element().querySelector('.targets-form'), 'the form to close');

      const changes = await outboxSince(db(), mark);
      expect(changes.map((entry) => [entry.field, entry.value])).toEqual([['pagesTarget', 4000]]);
    });

    it('refuses a target that is not a whole number, and writes nothing', async () => {
      await open();
      const before = await db().outbox.count();
      type(field(element(), 'Minutes this year'), '12.5');
      element().querySelector<HTMLButtonElement>('.targets-form button[type="submit"]')!.click();
      await until(fixture, () => element().querySelector('mat-error'), 'the error');
      expect(textOf(element().querySelector('mat-error'))).toContain('whole number');
      expect(await db().outbox.count()).toBe(before);
    });

    it('lists the months with what was read in each, linking to their pages', async () => {
      await open();
      await until(fixture, () => textOf(element().querySelector('.months')).includes('1 book'), 'the months');
      const links = Array.from(element().querySelectorAll<HTMLAnchorElement>('.months a'));
      expect(links.length).toBe(12);
      expect(links[0].getAttribute('href')).toBe('/goals/2026/01');
      expect(links[11].getAttribute('href')).toBe('/goals/2026/12');
      expect(textOf(links[0])).toContain('January');
      expect(textOf(links[0])).toContain('1 book ·');
      expect(textOf(links[1])).toContain('1 book ·');
      expect(textOf(links[2])).toContain('0 books');
      expect(element().querySelector('.months li.now')?.textContent).toContain('July');
    });

    it('chooses the best book among the books finished in the year', async () => {
      await open();
      const select = () => element().querySelector<HTMLSelectElement>('#best-heading + label select')!;
      await until(fixture, () => select()?.options.length === 4, 'the choices');
      expect(Array.from(select().options).map((option) => option.text)).toEqual(['Not chosen yet', 'Salt and Lanterns', 'The Quiet Orchard', 'Harrow Light']);
      choose(select(), BOOK.orchard);
      await until(fixture, () => textOf(element().querySelector('#best-heading ~ p a')) === 'The Quiet Orchard', 'the best book');
      expect((await plan())?.bestBookId).toBe(BOOK.orchard);
    });

    it('keeps other goals as a checklist: add, check, remove', async () => {
      await open();
      const add = async (text: string) => {
        type(element().querySelector<HTMLInputElement>('.add-goal input')!, text);
        element().querySelector<HTMLButtonElement>('.add-goal button')!.click();
        await until(fixture, () => textOf(element().querySelector('.checklist')).includes(text), text);
      };
      await add('Read a book in French');
      await add('Finish a long classic');
      expect((await plan())?.otherGoals?.map((goal) => [goal.text, goal.done])).toEqual([
        ['Read a book in French', false],
        ['Finish a long classic', false],
      ]);

      element().querySelector<HTMLInputElement>('.checklist li:first-child input[type="checkbox"]')!.click();
      await until(fixture, () => element().querySelector<HTMLInputElement>('.checklist li:first-child input[type="checkbox"]')!.checked, 'checked');
      element().querySelector<HTMLButtonElement>('button[aria-label="Remove Finish a long classic"]')!.click();
      await until(fixture, () => !textOf(element().querySelector('.checklist')).includes('long classic'), 'the removal');
      expect((await plan())?.otherGoals?.map((goal) => [goal.text, goal.done])).toEqual([['Read a book in French', true]]);
    });

    it('saves notes on the year', async () => {
      await open();
      const notes = element().querySelector<HTMLTextAreaElement>('.notes textarea')!;
      notes.value = 'More poetry this year.';
      notes.dispatchEvent(new Event('change'));
      await until(fixture, () => textOf(element()).includes('Notes saved on this device.'), 'the notes');
      expect((await plan())?.notes).toBe('More poetry this year.');
    });

    it('shows another year from the route, with links to the years either side', async () => {
      await open('2025');
      expect(textOf(element().querySelector('h1'))).toBe('Goals for 2025');
      const years = Array.from(element().querySelectorAll<HTMLAnchorElement>('.years a')).map((link) => link.getAttribute('href'));
      expect(years).toEqual(['/goals/2024', '/goals/2026']);
      // Evening Tide was finished on 31 December 2025 in Los Angeles.
      await until(fixture, () => textOf(element().querySelector('.months li:last-child')).includes('1 book'), 'December');
    });

    it('says so for a year it does not keep', async () => {
      fixture = TestBed.createComponent(GoalsPage);
      fixture.componentRef.setInput('year', 'soon');
      await fixture.whenStable();
      expect(textOf(element().querySelector('h1'))).toBe('No such year');
    });

    it('lists the challenges running in the year with their progress', async () => {
      await store.create('challenges', { name: 'Twenty-five', kind: 'count', target: 25, periodStart: '2026-01-01', periodEnd: '2026-12-31' });
      await store.create('challenges', { name: 'Last year', kind: 'count', target: 25, periodStart: '2025-01-01', periodEnd: '2025-12-31' });
      await open();
      await until(fixture, () => element().querySelector('.challenges a'), 'the challenge');
      expect(Array.from(element().querySelectorAll('.challenges li')).map(textOf)).toEqual(['Twenty-five Read a number of books 3 of 25 books']);
    });
  });

  it('counts a New Year’s Eve finish in the new year for a reader in Tokyo', async () => {
    await setUp('Asia/Tokyo');
    await store.write('yearPlans', planId, { year: 2026, booksTarget: 12, deleted: false });
    await open();
    // 2026-01-01T07:30Z is 16:30 JST on 1 January 2026, so Evening Tide counts: 4 books.
    await until(fixture, () => element().querySelector('li.unit[data-unit="books"] .so-far'), 'the pacing');
    expect(textOf(element().querySelector('li.unit[data-unit="books"] .so-far'))).toBe('4 of 12 books');
  });
});

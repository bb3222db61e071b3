import { type ComponentFixture, TestBed } from '@angular/core/testing';

import { deterministicId } from '@shared/sync/deterministic-id';
import type { MonthPlan } from '@shared/sync/schema/collections';

import type { JournalDb } from '../../../core/data/journal-db';
import type { JournalStore } from '../../../core/data/journal-store';
import { choose, field, setUpGoalSpec, textOf, type, until } from '../../../core/testing/goal-fixtures';
import { BOOK, seedLibrary } from '../../../core/testing/seed';
import { MonthPage } from './month-page';

describe('MonthPage', () => {
  let store: JournalStore;
  let db: () => JournalDb;
  let tearDown: () => Promise<void>;
  let fixture: ComponentFixture<MonthPage>;
  const element = (): HTMLElement => fixture.nativeElement;
  const planId = deterministicId('month-plan', '2026-06');
  const plan = async () => (await db().rows('monthPlans').get(planId)) as MonthPlan | undefined;

  beforeEach(async () => {
    ({ store, db, tearDown } = await setUpGoalSpec());
    await seedLibrary(store);
    // Invented sessions; local times by the IANA tz database (Los Angeles is UTC−7 in June 2026).
    const session = (fields: Record<string, unknown>) => store.create('sessions', { bookId: BOOK.harrow, ...fields });
    // 10:00–11:00 PDT on 20 June: 60 minutes, pages 10 → 40 = 30 pages.
    await session({
      format: 'print',
      startedAt: '2026-06-20T17:00:00.000Z',
      endedAt: '2026-06-20T18:00:00.000Z',
      activeMinutes: 60,
      fromPosition: 10,
      toPosition: 40,
    });
    // 20:30–21:00 PDT on 20 June (already 21 June in UTC): 20 minutes of an ebook, no pages.
    await session({
      format: 'ebook',
      startedAt: '2026-06-21T03:30:00.000Z',
      endedAt: '2026-06-21T04:00:00.000Z',
      activeMinutes: 20,
      fromPosition: 5,
      toPosition: 9,
    });
    // 09:00–09:15 PDT on 2 June: 15 minutes.
    await session({ format: 'ebook', startedAt: '2026-06-02T16:00:00.000Z', endedAt: '2026-06-02T16:15:00.000Z', activeMinutes: 15 });
  });

  afterEach(async () => tearDown());

  async function open(year = '2026', month = '06'): Promise<void> {
    fixture = TestBed.createComponent(MonthPage);
    fixture.componentRef.setInput('year', year);
    fixture.componentRef.setInput('month', month);
    await until(fixture, () => element().querySelector('#account-heading'), 'the page');
  }

  it('shows the month, a link up to its year and to the months either side', async () => {
    await open();
    expect(textOf(element().querySelector('h1'))).toBe('June 2026');
    const links = Array.from(element().querySelectorAll<HTMLAnchorElement>('nav.up a')).map((link) => [textOf(link), link.getAttribute('href')]);
    expect(links).toEqual([
      ['Up to 2026', '/goals/2026'],
      ['May 2026', '/goals/2026/05'],
      ['July 2026', '/goals/2026/07'],
    ]);
  });

  it('lays out the days read, with the month’s totals as the text alternative', async () => {
    await open();
    const grid = element().querySelector('ll-month-heatmap [role="img"]')!;
    await until(fixture, () => grid.getAttribute('aria-label')?.includes('2 of 30'), 'the log');
    // Hand: 20 June has 60 + 20 = 80 minutes and 30 pages; 2 June 15 minutes; 95 minutes in all.
    expect(grid.getAttribute('aria-label')).toBe(
      'Reading in June 2026: 2 of 30 days with reading, 95 minutes and 30 pages in all. The most on 20 June: 80 minutes.',
    );
    const days = Array.from(grid.querySelectorAll<HTMLElement>('[data-day]'));
    expect(days.length).toBe(30);
    // Levels by HEATMAP_THRESHOLDS (15, 30, 60 minutes): 80 → 4, 15 → 2, none → 0.
    expect(days[19].className).toContain('level-4');
    expect(days[1].className).toContain('level-2');
    expect(days[0].className).toContain('level-0');
  });

  it('puts the month’s targets beside what was read, writing the month’s one row', async () => {
    await open();
    // From the sessions (LA days): 2 June, 20 June twice → 3 sessions, 95 minutes, 2 days.
    expect(Array.from(element().querySelectorAll('.tally li')).map(textOf)).toEqual(['3 sessions', '95 minutes read', '2 days with reading', '0 quotes kept']);
    type(field(element(), 'Books this month'), '2');
    type(field(element(), 'Minutes this month'), '600');
    element().querySelector<HTMLButtonElement>('.targets-form button[type="submit"]')!.click();
    await until(fixture, () => element().querySelectorAll('.progress li').length === 2, 'the progress');
    expect(
      Array.from(element().querySelectorAll('.progress li')).map((row) => textOf(row.querySelector('.unit')) + ' ' + textOf(row.querySelector('.unit + span'))),
    ).toEqual(['Books 1 of 2 books · 1 to go', 'Minutes 95 of 600 minutes · 505 to go']);
    expect(await plan()).toEqual(jasmine.objectContaining({ month: '2026-06', booksTarget: 2, minutesTarget: 600, deleted: false }));
    expect((await plan())?.pagesTarget).toBeUndefined();
  });

  it('lists the books started, finished and set aside that month, and keeps a favourite; no least favourite', async () => {
    await store.write('books', BOOK.ferry, { status: 'finished', statusChangedAt: '2026-06-30T20:00:00.000Z' });
    await store.create('bookStatusChanges', { bookId: BOOK.owl, status: 'reading', changedAt: '2026-06-03T16:00:00.000Z' });
    await store.create('bookStatusChanges', { bookId: BOOK.eve, status: 'dnf', changedAt: '2026-06-12T16:00:00.000Z' });
    await store.create('quotes', { bookId: BOOK.harrow, text: 'The light held.', capturedAt: '2026-06-20T18:05:00.000Z' });
    await open();
    await until(fixture, () => element().querySelectorAll('[aria-labelledby="finished-heading"] li a').length === 2, 'the books');
    // The status changes and quotes come from their own live query; the quote was written last.
    await until(fixture, () => textOf(element().querySelector('.tally'))?.includes('1 quote kept') ?? false, 'the quote counted');
    const listed = (heading: string) => Array.from(element().querySelectorAll(`[aria-labelledby="${heading}"] li`)).map(textOf);
    // Harrow Light's reading began on 1 June (the seed); An Owl at Dusk moved to reading on 3 June.
    expect(listed('started-heading')).toEqual(['Harrow Light', 'An Owl at Dusk']);
    expect(listed('finished-heading')).toEqual(['Harrow Light 20 June', 'The Blue Ferry 30 June']);
    expect(listed('abandoned-heading')).toEqual(['Evening Tide']);

    const selects = Array.from(element().querySelectorAll<HTMLSelectElement>('label.native select'));
    expect(selects.length).toBe(1);
    expect(textOf(element())).not.toContain('Least favourite');
    expect(Array.from(selects[0]!.options).map((option) => option.text)).toEqual(['Not chosen', 'Harrow Light', 'The Blue Ferry']);
    choose(selects[0]!, BOOK.harrow);
    await until(fixture, () => selects[0]!.value === BOOK.harrow, 'the choice');
    expect(await plan()).toEqual(jasmine.objectContaining({ favouriteBookId: BOOK.harrow }));
  });

  it('draws the pace against the month’s plan as a bar with the even-pace marker', async () => {
    // Today is 1 July in these specs: June is over, so an even pace stands at the whole target.
    await store.write('monthPlans', planId, { month: '2026-06', minutesTarget: 600, deleted: false });
    await open();
    await until(fixture, () => element().querySelector('.progress li[data-unit="minutes"] ll-pace-bar [role="img"]'), 'the pace');
    expect(element().querySelector('.progress ll-pace-bar [role="img"]')?.getAttribute('aria-label')).toBe(
      '95 of 600 minutes read; an even pace would be at 600 today.',
    );
  });

  it('keeps the reader’s look back at the month', async () => {
    await open();
    const notes = element().querySelector<HTMLTextAreaElement>('.reflection textarea')!;
    notes.value = '  A slow, lovely month.  ';
    notes.dispatchEvent(new Event('change'));
    await until(fixture, () => textOf(element()).includes('Notes saved on this device.'), 'the notes');
    expect((await plan())?.reflection).toBe('A slow, lovely month.');
  });

  it('says so for a month that does not exist', async () => {
    fixture = TestBed.createComponent(MonthPage);
    fixture.componentRef.setInput('year', '2026');
    fixture.componentRef.setInput('month', '13');
    await fixture.whenStable();
    expect(textOf(element().querySelector('h1'))).toBe('No such month');
  });
});

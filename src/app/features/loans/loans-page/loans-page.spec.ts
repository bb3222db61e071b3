import { TestBed, type ComponentFixture } from '@angular/core/testing';

import type { Loan } from '@shared/sync/schema/collections';

import { choose, field, setUpGoalSpec, type } from '../../../core/testing/goal-fixtures';
import { textOf, until } from '../../../core/testing/test-journal';
import type { JournalStore } from '../../../core/data/journal-store';
import { LoansPage } from './loans-page';

const BOOK = '00000000-0000-4000-8000-00000000b001';
const OTHER = '00000000-0000-4000-8000-00000000b002';
const THIRD = '00000000-0000-4000-8000-00000000b003';

/** The Loans screen against a real IndexedDB journal; "now" is noon on 1 July 2026 in Los Angeles. */
describe('LoansPage', () => {
  let store: JournalStore;
  let tearDown: () => Promise<void>;
  let fixture: ComponentFixture<LoansPage>;

  const page = () => fixture.nativeElement as HTMLElement;
  const rows = () => [...page().querySelectorAll('ul.loans:not(.closed) > li')].map((row) => textOf(row));
  const button = (text: string, root: Element = page()) => [...root.querySelectorAll<HTMLButtonElement>('button')].find((b) => textOf(b) === text)!;
  const stored = async () => (await store.list('loans')) as Loan[];

  beforeEach(async () => {
    ({ store, tearDown } = await setUpGoalSpec());
    await store.write('books', BOOK, { title: 'Rain on the Salt Road', format: 'print', status: 'reading', deleted: false });
    await store.write('books', OTHER, { title: 'A Map of Small Harbours', format: 'print', status: 'tbr', deleted: false });
    await store.write('books', THIRD, { title: 'The Clockmaker’s Daughter-in-Law', format: 'print', status: 'tbr', deleted: false });
    fixture = TestBed.createComponent(LoansPage);
    await until(() => !!page().querySelector('h1'), fixture, 10_000);
  }, 20_000);

  afterEach(async () => {
    fixture?.destroy();
    await tearDown();
  });

  it('lists loans by urgency: overdue, then a ready hold, then due soon, then lent out', async () => {
    await store.create('loans', { kind: 'lentOut', bookId: OTHER, friendName: 'Pim', dueOn: '2026-08-01' });
    await store.create('loans', { kind: 'library', bookId: BOOK, dueOn: '2026-07-02' });
    await store.create('loans', { kind: 'hold', bookId: THIRD, readyOn: '2026-06-30', pickUpBy: '2026-07-05' });
    await store.create('loans', { kind: 'library', bookId: OTHER, dueOn: '2026-06-28' });
    await until(() => rows().length === 4, fixture, 10_000);
    expect(rows()[0]).toContain('3 days overdue');
    expect(rows()[1]).toContain('Ready to pick up');
    expect(rows()[2]).toContain('Due tomorrow');
    expect(rows()[3]).toContain('Lent to Pim');
  });

  it('adds a library loan with a due date, on this device first', async () => {
    button('Add a loan').click();
    await until(() => !!page().querySelector('form[aria-label="Add a loan"]'), fixture, 10_000);
    await until(() => [...field<HTMLSelectElement>(page(), 'Book').options].some((o) => o.value === BOOK), fixture, 10_000);
    choose(field<HTMLSelectElement>(page(), 'Book'), BOOK);
    type(field(page(), 'Due on'), '2026-07-03');
    type(field(page(), 'Renewals allowed'), '2');
    button('Save loan').click();
    await until(() => rows().length === 1, fixture, 10_000);
    expect(rows()[0]).toContain('Due in 2 days');
    expect(rows()[0]).toContain('0 of 2 renewals used');
    const [loan] = await stored();
    expect(loan).toEqual(jasmine.objectContaining({ kind: 'library', bookId: BOOK, dueOn: '2026-07-03', renewalsUsed: 0, renewalsAllowed: 2 }));
  });

  it('says why a loan cannot be saved: no book chosen, a friend not named', async () => {
    button('Add a loan').click();
    await until(() => !!page().querySelector('form[aria-label="Add a loan"]'), fixture, 10_000);
    button('Save loan').click();
    await until(() => textOf(page().querySelector('[role="alert"]')) === 'Choose the book.', fixture, 10_000);
    await until(() => [...field<HTMLSelectElement>(page(), 'Book').options].some((o) => o.value === BOOK), fixture, 10_000);
    choose(field<HTMLSelectElement>(page(), 'Book'), BOOK);
    choose(field<HTMLSelectElement>(page(), 'What'), 'lentOut');
    await fixture.whenStable();
    button('Save loan').click();
    await until(() => textOf(page().querySelector('[role="alert"]')) === 'Name the friend.', fixture, 10_000);
    expect(await stored()).toEqual([]);
  });

  it('renews in one click with the count shown, and refuses once renewals run out', async () => {
    await store.create('loans', { kind: 'library', bookId: BOOK, dueOn: '2026-07-02', renewalsUsed: 0, renewalsAllowed: 1 });
    await until(() => rows().length === 1, fixture, 10_000);
    button('Renew').click();
    await until(() => rows()[0]!.includes('1 of 1 renewal used'), fixture, 10_000);
    // 2 July + 21 days (the usual period when the library has none) = 23 July.
    expect((await stored())[0]!.dueOn).toBe('2026-07-23');
    button('Renew').click();
    await until(() => textOf(page().querySelector('[role="alert"]')) === 'The one renewal allowed has been used.', fixture, 10_000);
  });

  it('turns a collected hold into a loan in one step', async () => {
    await store.create('loans', { kind: 'hold', bookId: THIRD, readyOn: '2026-06-30', pickUpBy: '2026-07-05' });
    await until(() => rows().length === 1, fixture, 10_000);
    button('Collected').click();
    await until(() => rows().length === 1 && rows()[0]!.includes('Library loan'), fixture, 10_000);
    const loans = await stored();
    expect(loans.find((l) => l.kind === 'hold')?.holdOutcome).toBe('collected');
    expect(loans.find((l) => l.kind === 'library')).toEqual(jasmine.objectContaining({ bookId: THIRD, startedOn: '2026-07-01', dueOn: '2026-07-22' }));
  });

  it('edits a hold’s place in the queue and pick-up day, and a loan’s library, dates and renewals', async () => {
    const library = await store.create('libraries', { name: 'Fernwick Reading Rooms', loanDays: 14 });
    const hold = await store.create('loans', { kind: 'hold', bookId: THIRD, startedOn: '2026-06-20', queuePosition: 7 });
    await until(() => rows().length === 1, fixture, 10_000);
    button('Edit').click();
    await until(() => !!page().querySelector('form[aria-label="Edit hold"]'), fixture, 10_000);
    const form = () => page().querySelector<HTMLElement>('form[aria-label="Edit hold"]')!;
    expect(field(form(), 'Place in the queue').value).toBe('7');
    type(field(form(), 'Place in the queue'), '3');
    type(field(form(), 'Ready on'), '2026-07-01');
    type(field(form(), 'Pick up by'), '2026-07-06');
    button('Save changes', form()).click();
    await until(() => !page().querySelector('form[aria-label="Edit hold"]'), fixture, 10_000);
    expect((await stored()).find((l) => l.id === hold)).toEqual(jasmine.objectContaining({ queuePosition: 3, readyOn: '2026-07-01', pickUpBy: '2026-07-06' }));
    await until(() => rows()[0]!.includes('Ready to pick up'), fixture, 10_000);

    const loan = await store.create('loans', { kind: 'library', bookId: BOOK, startedOn: '2026-06-20', dueOn: '2026-07-10', renewalsUsed: 0 });
    await until(() => rows().length === 2, fixture, 10_000);
    const item = [...page().querySelectorAll('ul.loans:not(.closed) > li')].find((row) => textOf(row).includes('Rain on the Salt Road'))!;
    button('Edit', item).click();
    await until(() => !!item.querySelector('form[aria-label="Edit loan"]'), fixture, 10_000);
    await until(() => [...field<HTMLSelectElement>(item as HTMLElement, 'Library').options].some((o) => o.value === library), fixture, 10_000);
    choose(field<HTMLSelectElement>(item as HTMLElement, 'Library'), library);
    type(field(item as HTMLElement, 'Due on'), '2026-07-12');
    type(field(item as HTMLElement, 'Renewals allowed'), '3');
    button('Save changes', item).click();
    await until(() => !item.querySelector('form[aria-label="Edit loan"]'), fixture, 10_000);
    expect((await stored()).find((l) => l.id === loan)).toEqual(
      jasmine.objectContaining({ libraryId: library, dueOn: '2026-07-12', renewalsAllowed: 3, renewalsUsed: 0 }),
    );
  });

  it('shows the shared schema’s reasons under the fields and saves nothing until they are right', async () => {
    await store.create('loans', { kind: 'lentOut', bookId: OTHER, friendName: 'Pim', startedOn: '2026-06-20', dueOn: '2026-08-01' });
    await store.create('loans', { kind: 'hold', bookId: THIRD, queuePosition: 4 });
    await until(() => rows().length === 2, fixture, 10_000);
    const item = (text: string) => [...page().querySelectorAll<HTMLElement>('ul.loans:not(.closed) > li')].find((row) => textOf(row).includes(text))!;
    button('Edit', item('Clockmaker')).click();
    await until(() => !!item('Clockmaker').querySelector('form'), fixture, 10_000);
    type(field(item('Clockmaker'), 'Place in the queue'), '0');
    button('Save changes', item('Clockmaker')).click();
    await until(() => textOf(item('Clockmaker').querySelector('mat-error')) === 'Place in the queue must be at least 1', fixture, 10_000);

    button('Edit', item('Small Harbours')).click();
    await until(() => !!item('Small Harbours').querySelector('form'), fixture, 10_000);
    expect(field(item('Small Harbours'), 'Lent to').value).toBe('Pim');
    type(field(item('Small Harbours'), 'Expected back'), '2026-06-01');
    button('Save changes', item('Small Harbours')).click();
    await until(() => textOf(item('Small Harbours').querySelector('mat-error')) === 'Expected back must not be before the day it started', fixture, 10_000);
    const saved = await stored();
    expect(saved.find((l) => l.kind === 'hold')?.queuePosition).toBe(4);
    expect(saved.find((l) => l.kind === 'lentOut')?.dueOn).toBe('2026-08-01');
  });
});

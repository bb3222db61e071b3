import { TestBed, type ComponentFixture } from '@angular/core/testing';

import { setUpGoalSpec } from '../../../core/testing/goal-fixtures';
import { textOf, until } from '../../../core/testing/test-journal';
import type { JournalStore } from '../../../core/data/journal-store';
import { LoansToday } from './loans-today';

const BOOK = '00000000-0000-4000-8000-00000000c001';

/** Today's loans card; "now" is 23:30 on 30 June 2026 in Los Angeles (06:30 UTC on 1 July). */
describe('LoansToday', () => {
  let store: JournalStore;
  let tearDown: () => Promise<void>;
  let fixture: ComponentFixture<LoansToday>;
  const page = () => fixture.nativeElement as HTMLElement;

  beforeEach(async () => {
    ({ store, tearDown } = await setUpGoalSpec({ now: '2026-07-01T06:30:00.000Z' }));
    await store.write('books', BOOK, { title: 'Rain on the Salt Road', format: 'print', status: 'reading', deleted: false });
    fixture = TestBed.createComponent(LoansToday);
    await fixture.whenStable();
  }, 20_000);

  afterEach(async () => {
    fixture?.destroy();
    await tearDown();
  });

  it('shows nothing while no loan is due within 3 days', async () => {
    // Due 3 July: three days ahead of the reader's 30 June (not of UTC's 1 July).
    await store.create('loans', { kind: 'library', bookId: BOOK, dueOn: '2026-07-03' });
    await new Promise((resolve) => setTimeout(resolve, 200));
    await fixture.whenStable();
    expect(page().querySelector('section')).toBeNull();
  });

  it("shows a loan due within 3 days, in the reader's own day", async () => {
    await store.create('loans', { kind: 'library', bookId: BOOK, dueOn: '2026-07-02' });
    await until(() => !!page().querySelector('section'), fixture, 10_000);
    expect(textOf(page().querySelector('li'))).toContain('Due in 2 days');
  });

  it('shows a hold ready to pick up', async () => {
    await store.create('loans', { kind: 'hold', bookId: BOOK, readyOn: '2026-06-30', pickUpBy: '2026-07-04' });
    await until(() => !!page().querySelector('section'), fixture, 10_000);
    expect(textOf(page().querySelector('li'))).toContain('Ready to pick up');
  });
});

import { TestBed } from '@angular/core/testing';

import { openTestJournal, waitFor, type TestJournal } from '../../../core/testing/test-journal';
import { CircleStore } from '../../circles';
import { DuplicatesPanel } from './duplicates-panel';

describe('DuplicatesPanel', () => {
  let journal: TestJournal;
  beforeEach(() => (journal = openTestJournal()));
  afterEach(() => journal.close());

  it('finds two entries of one book and merges them: the picked ISBN kept, the session moved, the other book deleted', async () => {
    // Ids in key order: the panel offers to keep the first book of a group.
    const kept = '10000000-0000-4000-8000-000000000001';
    const other = '20000000-0000-4000-8000-000000000002';
    await journal.store.write('books', kept, { title: 'Salt Roads', authors: ['Mirela Oakes'], format: 'print', status: 'reading', deleted: false });
    await journal.store.write('books', other, {
      title: 'Salt roads',
      authors: ['Oakes, Mirela'],
      format: 'print',
      status: 'reading',
      isbn: '9780306406157',
      deleted: false,
    });
    const session = await journal.store.create('sessions', { bookId: other, activeMinutes: 30 });
    // References beyond the children: a loan, a year plan's best book and goal, a challenge prompt, a circle's link.
    const loan = await journal.store.create('loans', { kind: 'lentOut', bookId: other, friendName: 'Wren' });
    const plan = await journal.store.create('yearPlans', { year: 2026, bestBookId: other, otherGoals: [{ id: 'g1', text: 'Finish it', bookId: other }] });
    const challenge = await journal.store.create('challenges', { name: 'Prompts', kind: 'prompts', prompts: [{ id: 'p1', text: 'A road', bookId: other }] });
    const circleId = '30000000-0000-4000-8000-000000000003';
    const progress = await TestBed.inject(CircleStore).create('circleProgress', circleId, { bookLinks: { '40000000-0000-4000-8000-000000000004': other } });
    const fixture = TestBed.createComponent(DuplicatesPanel);
    const element = fixture.nativeElement as HTMLElement;
    await waitFor(fixture, () => element.querySelector('button'), 'the Look button');
    expect(element.querySelector('.groups li')).withContext('nothing read before the reader asks').toBeNull();
    element.querySelector<HTMLButtonElement>('button')!.click();
    await waitFor(fixture, () => element.querySelector('.groups li'), 'the duplicate group');
    expect(element.querySelector('.groups li')!.textContent).toContain('2 books');
    element.querySelector<HTMLButtonElement>('.groups button')!.click();
    await waitFor(fixture, () => element.querySelector('fieldset'), 'the merge choices');
    const isbn = [...element.querySelectorAll('fieldset')].find((set) => set.querySelector('legend')!.textContent === 'ISBN')!;
    isbn.querySelectorAll('input')[1]!.click();
    await waitFor(fixture, () => isbn.querySelectorAll('input')[1]!.checked, 'the other ISBN picked');
    // The Merge button's own handler, awaited, so a failure shows here.
    await (fixture.componentInstance as unknown as { merge(): Promise<void> }).merge();
    expect((await journal.store.get('books', other))?.deleted).toBeTrue();
    expect((await journal.store.get('books', kept))?.isbn).toBe('9780306406157');
    expect((await journal.store.get('sessions', session))?.bookId).toBe(kept);
    expect((await journal.store.get('loans', loan))?.bookId).toBe(kept);
    const movedPlan = await journal.store.get('yearPlans', plan);
    expect([movedPlan?.bestBookId, movedPlan?.otherGoals?.[0]?.bookId]).toEqual([kept, kept]);
    expect((await journal.store.get('challenges', challenge))?.prompts?.[0]?.bookId).toBe(kept);
    const link = (await journal.db.table('circleProgress').get(progress)) as { bookLinks: Record<string, string> };
    expect(Object.values(link.bookLinks)).toEqual([kept]);
  }, 20_000); // a dozen IndexedDB writes and two renders: slow on a busy shared machine
});

import { type ComponentFixture, TestBed } from '@angular/core/testing';

import type { JournalStore } from '../../../core/data/journal-store';
import { setUpGoalSpec, textOf, until } from '../../../core/testing/goal-fixtures';
import { seedLibrary } from '../../../core/testing/seed';
import { ChallengesList } from './challenges-list';

describe('ChallengesList', () => {
  let store: JournalStore;
  let tearDown: () => Promise<void>;
  let fixture: ComponentFixture<ChallengesList>;
  const element = (): HTMLElement => fixture.nativeElement;

  beforeEach(async () => {
    ({ store, tearDown } = await setUpGoalSpec());
    await seedLibrary(store);
  });

  afterEach(async () => tearDown());

  it('lists running challenges first, each with its progress from the same books', async () => {
    await store.create('challenges', { name: 'Last year', kind: 'count', target: 25, periodStart: '2025-01-01', periodEnd: '2025-12-31' });
    await store.create('challenges', { name: 'A to Z', kind: 'alphabet', alphabetBy: 'title', periodStart: '2026-01-01', periodEnd: '2026-12-31' });
    await store.create('challenges', { name: 'Fifty', kind: 'count', target: 50, periodStart: '2026-01-01', periodEnd: '2026-12-31' });
    fixture = TestBed.createComponent(ChallengesList);
    await until(fixture, () => element().querySelectorAll('.challenges li .name').length === 3, 'the challenges');
    expect(Array.from(element().querySelectorAll('.challenges li')).map((li) => [textOf(li.querySelector('.name')), textOf(li.querySelector('.line'))])).toEqual([
      ['A to Z', '3 of 26 letters'],
      ['Fifty', '3 of 50 books'],
      // Evening Tide: 31 December 2025 in Los Angeles.
      ['Last year', '1 of 25 books'],
    ]);
    expect(element().querySelector('ll-challenge-celebration')).toBeNull();
  });

  it('celebrates a challenge that finished since it was last seen', async () => {
    await store.create('challenges', { name: 'Three in a year', kind: 'count', target: 3, periodStart: '2026-01-01', periodEnd: '2026-12-31' });
    fixture = TestBed.createComponent(ChallengesList);
    await until(fixture, () => element().querySelector('ll-challenge-celebration'), 'the celebration');
    expect(textOf(element().querySelector('ll-challenge-celebration'))).toContain('You finished “Three in a year”.');
    element().querySelector<HTMLButtonElement>('ll-challenge-celebration button')!.click();
    await fixture.whenStable();
    expect(element().querySelector('ll-challenge-celebration')).toBeNull();
    expect(textOf(element().querySelector('.challenges li .line'))).toBe('3 of 3 books Finished');
  });

  it('says what challenges are when there are none', async () => {
    fixture = TestBed.createComponent(ChallengesList);
    await until(fixture, () => element().querySelector('.challenges .empty'), 'the empty state');
    expect(textOf(element().querySelector('.empty'))).toContain('a book can count in all of them at once');
  });
});

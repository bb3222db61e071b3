import { type ComponentFixture, TestBed } from '@angular/core/testing';
import { Router } from '@angular/router';

import type { Challenge } from '@shared/sync/schema/collections';

import type { JournalDb } from '../../../core/data/journal-db';
import { field, setUpGoalSpec, textOf, type, until } from '../../../core/testing/goal-fixtures';
import { ChallengeEditor } from './challenge-editor';

describe('ChallengeEditor', () => {
  let db: () => JournalDb;
  let tearDown: () => Promise<void>;
  let fixture: ComponentFixture<ChallengeEditor>;
  const element = (): HTMLElement => fixture.nativeElement;
  const radio = (value: string) => element().querySelector<HTMLInputElement>(`input[type="radio"][value="${value}"]`)!;
  const challenges = async () => (await db().rows('challenges').toArray()) as Challenge[];

  beforeEach(async () => {
    ({ db, tearDown } = await setUpGoalSpec());
    fixture = TestBed.createComponent(ChallengeEditor);
    await fixture.whenStable();
  });

  afterEach(async () => tearDown());

  async function save(): Promise<void> {
    element().querySelector<HTMLButtonElement>('button[type="submit"]')!.click();
    await fixture.whenStable();
    await new Promise((resolve) => setTimeout(resolve, 20));
  }

  it('offers 25, 50 and 100 books, or any number, over the current year', async () => {
    expect(Array.from(element().querySelectorAll('.targets mat-radio-button')).map(textOf)).toEqual(['25', '50', '100', 'Another number']);
    radio('other').click();
    await until(fixture, () => element().querySelector('.targets + mat-form-field input'), 'the number');
    type(field(element(), 'Number of books'), '2');
    await save();
    await until(fixture, () => TestBed.inject(Router).url.startsWith('/goals/challenges/'), 'the challenge page');
    const [row] = await challenges();
    expect(row).toEqual(jasmine.objectContaining({ name: '2 books in 2026', kind: 'count', target: 2, periodStart: '2026-01-01', periodEnd: '2026-12-31' }));
    expect(TestBed.inject(Router).url).toBe(`/goals/challenges/${row.id}`);
  });

  it('starts an A to Z by author’s surname', async () => {
    radio('alphabet').click();
    await until(fixture, () => radio('author-surname'), 'the choice of letters');
    radio('author-surname').click();
    type(field(element(), 'Name'), 'Surnames');
    await save();
    await until(fixture, async () => (await challenges()).length === 1, 'the row');
    expect((await challenges())[0]).toEqual(jasmine.objectContaining({ name: 'Surnames', kind: 'alphabet', alphabetBy: 'author-surname' }));
  });

  it('says how many weeks a weekly challenge’s year has', async () => {
    radio('weekly').click();
    await until(fixture, () => element().querySelector('.weeks-hint'), 'the year');
    // isoWeeksOfYear(2026): 53 weeks from Monday 29 December 2025 to Sunday 3 January 2027.
    expect(textOf(element().querySelector('.weeks-hint'))).toBe('53 weeks: 29 December 2025 – 3 January 2027');
    type(field(element(), 'Year'), '2027');
    await fixture.whenStable();
    expect(textOf(element().querySelector('.weeks-hint'))).toBe('52 weeks: 4 January 2027 – 2 January 2028');
  });

  it('writes a list of prompts', async () => {
    radio('prompts').click();
    await until(fixture, () => element().querySelector('.prompt input'), 'the prompts');
    type(element().querySelector<HTMLInputElement>('.prompt input')!, 'A book set at sea');
    Array.from(element().querySelectorAll<HTMLButtonElement>('button'))
      .find((button) => textOf(button) === 'Add a prompt')!
      .click();
    await fixture.whenStable();
    type(element().querySelectorAll<HTMLInputElement>('.prompt input')[1], 'A debut');
    await save();
    await until(fixture, async () => (await challenges()).length === 1, 'the row');
    expect((await challenges())[0].prompts?.map((prompt) => prompt.text)).toEqual(['A book set at sea', 'A debut']);
  });

  it('refuses dates that end before they start, and writes nothing', async () => {
    const end = field(element(), 'Last day');
    type(end, '2025-06-01');
    await save();
    expect(textOf(element().querySelector('[role="alert"]'))).toBe('The last day comes before the first: check the dates');
    expect(await challenges()).toEqual([]);
  });
});

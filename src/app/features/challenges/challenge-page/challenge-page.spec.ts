import { type ComponentFixture, TestBed } from '@angular/core/testing';

import type { Challenge } from '@shared/sync/schema/collections';

import type { JournalDb } from '../../../core/data/journal-db';
import type { JournalStore } from '../../../core/data/journal-store';
import { choose, JULY_FIRST_NOON_LA, setUpGoalSpec, textOf, until } from '../../../core/testing/goal-fixtures';
import { BOOK, seedLibrary } from '../../../core/testing/seed';
import { ChallengePage } from './challenge-page';

describe('ChallengePage', () => {
  let store: JournalStore;
  let db: () => JournalDb;
  let tearDown: () => Promise<void>;
  let fixture: ComponentFixture<ChallengePage>;
  const element = (): HTMLElement => fixture.nativeElement;
  const year = { periodStart: '2026-01-01', periodEnd: '2026-12-31' };

  beforeEach(async () => {
    ({ store, db, tearDown } = await setUpGoalSpec());
    await seedLibrary(store);
  });

  afterEach(async () => tearDown());

  async function open(id: string): Promise<void> {
    fixture?.destroy();
    fixture = TestBed.createComponent(ChallengePage);
    fixture.componentRef.setInput('id', id);
    await until(fixture, () => element().querySelector('#counted-heading'), 'the challenge');
  }
  const counted = () => Array.from(element().querySelectorAll('.counted li a')).map(textOf);

  it('counts the same books in a count challenge and an A to Z', async () => {
    const count = await store.create('challenges', { name: 'Twenty-five', kind: 'count', target: 25, ...year });
    const alphabet = await store.create('challenges', { name: 'A to Z', kind: 'alphabet', alphabetBy: 'title', ...year });

    await open(count);
    // Finished in 2026 in Los Angeles: Salt and Lanterns (10 Jan), The Quiet Orchard (28 Feb), Harrow Light (20 Jun).
    expect(textOf(element().querySelector('.line'))).toBe('3 of 25 books');
    expect(counted()).toEqual(['Salt and Lanterns', 'The Quiet Orchard', 'Harrow Light']);

    await open(alphabet);
    expect(textOf(element().querySelector('.line'))).toBe('3 of 26 letters');
    expect(counted()).toEqual(['Harrow Light', 'The Quiet Orchard', 'Salt and Lanterns']);
  });

  it('renames the challenge, writing only its name, and refuses a blank one', async () => {
    const id = await store.create('challenges', { name: 'Twenty-five', kind: 'count', target: 25, ...year });
    await open(id);
    const button = (label: string) => Array.from(element().querySelectorAll('button')).find((b) => textOf(b) === label)!;

    button('Rename').click();
    await fixture.whenStable();
    const input = element().querySelector<HTMLInputElement>('form.rename input')!;
    expect(input.value).toBe('Twenty-five');
    input.value = '   ';
    input.dispatchEvent(new Event('input'));
    button('Save name').click();
    await fixture.whenStable();
    expect(textOf(element().querySelector('mat-error'))).toBe('Name is required');
    expect(((await db().rows('challenges').get(id)) as Challenge).name).toBe('Twenty-five');

    input.value = '  A year of twenty-five ';
    input.dispatchEvent(new Event('input'));
    button('Save name').click();
    await until(fixture, () => textOf(element().querySelector('h1')) === 'A year of twenty-five', 'the new name');
    const stored = (await db().rows('challenges').get(id)) as Challenge;
    expect(stored.name).toBe('A year of twenty-five');
    expect(stored.target).toBe(25);
    expect(textOf(element().querySelector('.line'))).toBe('3 of 25 books');
  });

  it('files titles past a leading article, and suggests TBR books for open letters', async () => {
    const id = await store.create('challenges', { name: 'A to Z', kind: 'alphabet', alphabetBy: 'title', ...year });
    await open(id);
    const letter = (l: string) => element().querySelector(`.letters li[data-letter="${l}"]`)!;
    // alphabetKey: "The Quiet Orchard" files under Q, not T (ALA Filing Rules, 1980, from memory).
    expect(letter('Q').classList).toContain('filled');
    expect(textOf(letter('Q'))).toBe('Q Q: The Quiet Orchard');
    expect(letter('T').classList).not.toContain('filled');
    // "The Blue Ferry" is TBR and would fill B; "An Owl at Dusk" is being read, so O suggests nothing.
    expect(textOf(letter('B'))).toBe('B B: Open From your TBR: The Blue Ferry');
    expect(textOf(letter('O'))).toBe('O O: Open');
    expect(textOf(element().querySelector('#letters-heading + p'))).toContain('Still open: A, B, C, D, E, F, G, I, J, K, L, M, N, O, P, R, T, U, V, W, X, Y, Z.');
  });

  it('files by the first author’s surname when asked', async () => {
    const id = await store.create('challenges', { name: 'Surnames', kind: 'alphabet', alphabetBy: 'author-surname', ...year });
    await open(id);
    // Ada Okafor → O (both of her finished books; the earlier fills it), Lio Penhallow → P.
    expect(textOf(element().querySelector('.letters li[data-letter="O"]'))).toBe('O O: Salt and Lanterns');
    expect(textOf(element().querySelector('.letters li[data-letter="P"]'))).toBe('P P: Harrow Light');
    expect(textOf(element().querySelector('.letters li[data-letter="A"]'))).toBe('A A: Open From your TBR: The Blue Ferry');
  });

  it('shows the 53 weeks of 2026 as met, missed or to come', async () => {
    // isoWeeksOfYear(2026): Monday 29 December 2025 to Sunday 3 January 2027.
    const id = await store.create('challenges', { name: 'Weekly', kind: 'weekly', periodStart: '2025-12-29', periodEnd: '2027-01-03' });
    await open(id);
    const weeks = Array.from(element().querySelectorAll<HTMLElement>('.weeks li'));
    expect(weeks.length).toBe(53);
    // Hand, counting days from Monday 29 December 2025 (day 0): Evening Tide's 31 December 2025 is
    // day 2 → week 1 of ISO 2026; 10 January day 12 → week 2; 28 February day 61 → week 9; 20 June
    // day 173 → week 25; today, 1 July, day 184 → week 27 (still to come).
    const met = weeks.filter((week) => week.classList.contains('met')).map((week) => Number(week.dataset['week']));
    expect(met).toEqual([1, 2, 9, 25]);
    expect(weeks.filter((week) => week.classList.contains('missed')).length).toBe(26 - 4);
    expect(weeks.filter((week) => week.classList.contains('upcoming')).length).toBe(53 - 26);
    expect(textOf(weeks[8])).toContain('Week 9, 23 Feb to 1 Mar: Met, The Quiet Orchard');
    expect(textOf(element().querySelector('#weeks-heading + p'))).toContain('4 met · 22 missed · 27 to come.');
  });

  it('links a book to each prompt, and knows which are done', async () => {
    const id = await store.create('challenges', {
      name: 'Prompts',
      kind: 'prompts',
      ...year,
      prompts: [
        { id: 'p1', text: 'A book set in an orchard', bookId: null },
        { id: 'p2', text: 'A bird in the title', bookId: null },
      ],
    });
    await open(id);
    const select = (text: string) => element().querySelector<HTMLSelectElement>(`select[aria-label="Book for ${text}"]`)!;
    choose(select('A book set in an orchard'), BOOK.orchard);
    choose(select('A bird in the title'), BOOK.owl);
    const states = () => Array.from(element().querySelectorAll('.prompts li .state')).map(textOf).join();
    await until(fixture, () => states() === 'Done,Planned', 'both books');
    expect(textOf(element().querySelector('.line'))).toBe('1 of 2 prompts');
    const row = (await db().rows('challenges').get(id)) as Challenge;
    expect(row.prompts?.map((prompt) => [prompt.id, prompt.bookId])).toEqual([
      ['p1', BOOK.orchard],
      ['p2', BOOK.owl],
    ]);
  });

  it('celebrates a finished challenge once, and records when', async () => {
    const id = await store.create('challenges', { name: 'Just one', kind: 'count', target: 1, ...year });
    await open(id);
    await until(fixture, () => element().querySelector('ll-challenge-celebration'), 'the celebration');
    expect(textOf(element().querySelector('ll-challenge-celebration [role="status"]'))).toContain('You finished “Just one”.');
    const stored = async () => ((await db().rows('challenges').get(id)) as Challenge).celebratedAt;
    for (let i = 0; i < 100 && !(await stored()); i++) await new Promise((resolve) => setTimeout(resolve, 5));
    expect(await stored()).toBe(JULY_FIRST_NOON_LA);

    await open(id);
    expect(element().querySelector('ll-challenge-celebration')).toBeNull();
    expect(textOf(element().querySelector('.line'))).toBe('3 of 1 book Finished');
  });
});

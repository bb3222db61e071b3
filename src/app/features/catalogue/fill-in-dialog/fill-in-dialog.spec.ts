import { ApplicationRef } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { MatDialog } from '@angular/material/dialog';

import type { CatalogueBook } from '@shared/api/catalogue';

import { OpenFillIn } from '../open-fill-in';

/** Two editions the local catalogue could both answer for (invented books). */
const HARDBACK: CatalogueBook = {
  isbn: '9781999990114',
  isbns: ['9781999990114', '9781999990121'],
  title: 'Moths of the lower fen',
  subtitle: 'a field guide',
  authors: ['Bartholomew Quist'],
  edition: null,
  publisher: 'Mossgate Editions',
  year: 2019,
  format: 'print',
  pageCount: 288,
  audioMinutes: null,
  series: null,
  seriesPosition: null,
  language: 'en',
  subjects: [],
  summary: null,
};
const REISSUE: CatalogueBook = { ...HARDBACK, year: 2024, edition: '2nd ed.', pageCount: 301 };

async function settle(): Promise<void> {
  await TestBed.inject(ApplicationRef).whenStable();
  await new Promise((resolve) => setTimeout(resolve, 10));
}
const surface = () => document.querySelector<HTMLElement>('ll-fill-in-dialog')!;
const box = (label: string) =>
  Array.from(surface().querySelectorAll<HTMLInputElement>('input[type="checkbox"]')).find((input) =>
    input.closest('mat-checkbox')!.textContent!.trim().startsWith(`${label}:`),
  )!;
const button = (text: string) => Array.from(surface().querySelectorAll<HTMLButtonElement>('button')).find((b) => b.textContent!.trim() === text)!;

describe('FillInDialog', () => {
  beforeEach(() => TestBed.configureTestingModule({}));
  afterEach(() => TestBed.inject(MatDialog).closeAll());

  it('ticks what is empty, leaves a typed field unticked with what it would replace, and hands back only the ticked fields', async () => {
    const chosen = TestBed.inject(OpenFillIn).choose({ books: [HARDBACK], source: '127.0.0.1:41500', current: { title: 'Moths (library copy)', pageCount: '' } });
    await settle();

    expect(box('Title').checked).toBeFalse();
    expect(surface().textContent).toContain('Replaces what you typed: “Moths (library copy)”');
    expect(box('Page count').checked).toBeTrue();
    expect(box('Authors').checked).toBeTrue();
    box('Authors').click();
    await settle();
    button('Fill in the chosen details').click();

    const result = await chosen;
    expect(result.title).toBeUndefined();
    expect(result.authors).toBeUndefined();
    expect(result.pageCount).toBe('288');
    expect(result.publisher).toBe('Mossgate Editions');
  });

  it('lets the reader pick one of several matches, and fills from that one', async () => {
    const chosen = TestBed.inject(OpenFillIn).choose({ books: [HARDBACK, REISSUE], source: 'cache', current: {} });
    await settle();
    expect(surface().textContent).toContain('The catalogue has 2 matches');
    expect(surface().textContent).toContain('From an earlier look-up');

    surface().querySelectorAll<HTMLInputElement>('input[type="radio"]')[1]!.click();
    await settle();
    button('Fill in the chosen details').click();

    const result = await chosen;
    expect([result.year, result.pageCount]).toEqual(['2024', '301']);
  });

  it('answers nothing when the reader cancels', async () => {
    const chosen = TestBed.inject(OpenFillIn).choose({ books: [HARDBACK], source: 'cache', current: {} });
    await settle();
    button('Cancel').click();
    expect(await chosen).toEqual({});
  });
});

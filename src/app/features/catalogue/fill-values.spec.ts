import { asIsbn10 } from 'isbn3';

import type { CatalogueBook } from '@shared/api/catalogue';

import { catalogueValues, fillChoices, matchLine } from './fill-values';

/** The local catalogue's audiobook hard case, as the server maps it (invented book). */
const AUDIOBOOK: CatalogueBook = {
  isbn: '9781999990411',
  isbns: ['9781999990411'],
  title: 'The orchard under snow',
  subtitle: null,
  authors: ['Halvard Nyström'],
  edition: null,
  publisher: 'Kestrel & Vane Audio',
  year: 2024,
  format: 'audiobook',
  pageCount: null,
  audioMinutes: 555,
  series: null,
  seriesPosition: null,
  language: 'en',
  subjects: ['Winter', 'Audiobooks'],
  summary: null,
};

describe('fillChoices', () => {
  it('offers every field the record has to an empty form, none of them replacing anything, minutes rather than pages for an audiobook', () => {
    const choices = fillChoices({}, AUDIOBOOK);
    expect(choices.map((choice) => choice.field)).toEqual(['title', 'authors', 'format', 'audioMinutes', 'isbn', 'publisher', 'year', 'language', 'genres']);
    expect(choices.every((choice) => !choice.replaces)).toBeTrue();
    expect(choices.find((choice) => choice.field === 'format')).toEqual(jasmine.objectContaining({ offered: 'audiobook', shown: 'Audiobook' }));
    expect(choices.find((choice) => choice.field === 'audioMinutes')!.offered).toBe('555');
  });

  it('marks a field the reader typed something else into as replacing it, so it is not taken unasked', () => {
    const choices = fillChoices({ title: 'Orchard in snow', publisher: '' }, AUDIOBOOK);
    expect(choices.find((choice) => choice.field === 'title')).toEqual(jasmine.objectContaining({ replaces: true, current: 'Orchard in snow' }));
    expect(choices.find((choice) => choice.field === 'publisher')!.replaces).toBeFalse();
  });

  it('leaves out what the form already says, however it was typed: case and list spacing, or the ISBN-10 of the same book (isbn3 as reference)', () => {
    const isbn10 = asIsbn10(AUDIOBOOK.isbn!, true)!; // the same book's ISBN-10, hyphenated by isbn3
    const choices = fillChoices({ title: 'the ORCHARD under snow', genres: 'winter,audiobooks', isbn: isbn10, format: 'audiobook' }, AUDIOBOOK);
    expect(choices.map((choice) => choice.field)).not.toContain('title');
    expect(choices.map((choice) => choice.field)).not.toContain('genres');
    expect(choices.map((choice) => choice.field)).not.toContain('isbn');
    expect(choices.map((choice) => choice.field)).not.toContain('format');
  });
});

describe('catalogueValues and matchLine', () => {
  it('gives pages, not minutes, for print, and leaves out what the record lacks', () => {
    const print = { ...AUDIOBOOK, format: 'print' as const, pageCount: 345, audioMinutes: null, publisher: null, subjects: [] };
    const values = catalogueValues(print);
    expect(values.pageCount).toBe('345');
    expect('audioMinutes' in values).toBeFalse();
    expect('publisher' in values).toBeFalse();
    expect('genres' in values).toBeFalse();
  });

  it('tells matches apart by year, format, publisher and edition', () => {
    expect(matchLine(AUDIOBOOK)).toBe('2024 · Audiobook · Kestrel & Vane Audio');
    expect(matchLine({ ...AUDIOBOOK, format: 'print', edition: '2nd ed.', publisher: null })).toBe('2024 · Print · 2nd ed.');
  });
});

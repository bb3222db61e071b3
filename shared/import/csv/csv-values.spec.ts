import { standardEan13CheckDigit, standardIsbn10CheckDigit } from '../../isbn/testing/standard-check-digits';
import { guessStatus, readDate, readFormat, readIsbn, readList, readRating, readStatus, statusValueMapping } from './csv-values';

describe('CSV values', () => {
  it('converts an ISBN-10 to ISBN-13 after ISO 2108 (978 prefix, check digit recomputed) and refuses a wrong check digit', () => {
    // ISO 2108 example of the ISBN Users' Manual: 0-306-40615-2 ↔ 978-0-306-40615-7.
    expect(readIsbn('0-306-40615-2')).toEqual({ value: '9780306406157' });
    expect(readIsbn('="9780306406157"')).toEqual({ value: '9780306406157' });
    const nine = '080442957';
    expect(readIsbn(`${nine}${standardIsbn10CheckDigit(nine)}`)).toEqual({ value: `978${nine}${standardEan13CheckDigit(`978${nine}`)}` });
    expect(readIsbn('0-306-40615-3')).toEqual({ problem: 'ISBN "0-306-40615-3" has a wrong check digit' });
    expect(readIsbn('978-0-306-40615-8')).toEqual({ problem: 'ISBN "978-0-306-40615-8" has a wrong check digit' });
    expect(readIsbn('12345')).toEqual({ problem: 'ISBN "12345" is not 10 or 13 digits' });
    expect(readIsbn('')).toEqual({ value: null });
  });

  it('reads ratings in range, rounds to half stars, and refuses the rest', () => {
    expect(readRating('4')).toEqual({ value: 4 });
    expect(readRating('3,5')).toEqual({ value: 3.5 });
    expect(readRating('4.3')).toEqual({ value: 4.5 });
    expect(readRating('0')).toEqual({ value: null });
    expect(readRating('7')).toEqual({ problem: 'rating "7" is not between 0.5 and 5' });
    expect(readRating('good')).toEqual({ problem: 'rating "good" is not between 0.5 and 5' });
  });

  it('reads dates in the chosen layout as ISO 8601 calendar dates', () => {
    expect(readDate('03/04/2025', 'dd/MM/yyyy')).toEqual({ value: '2025-04-03' });
    expect(readDate('03/04/2025', 'MM/dd/yyyy')).toEqual({ value: '2025-03-04' });
    expect(readDate('2025-12-31', 'yyyy-MM-dd')).toEqual({ value: '2025-12-31' });
    expect(readDate('31/02/2025', 'dd/MM/yyyy')).toEqual({ problem: 'date "31/02/2025" is not a DD/MM/YYYY date' });
    expect(readDate(' ', 'dd/MM/yyyy')).toEqual({ value: null });
  });

  it('maps status values through the guesses and the reader’s own mapping', () => {
    expect(guessStatus('Currently reading')).toBe('reading');
    expect(guessStatus('Read')).toBe('finished');
    const mapping = statusValueMapping(['Read', 'read', 'Shelved', 'Read', '']);
    expect([...mapping]).toEqual([
      ['Read', 'finished'],
      ['read', 'finished'],
      ['Shelved', null],
    ]);
    expect(readStatus('Shelved', mapping)).toEqual({ problem: 'status "Shelved" is not one we know (map it to a status)' });
    expect(readStatus('Shelved', new Map([['Shelved', 'tbr']]))).toEqual({ value: 'tbr' });
    expect(readStatus('', mapping)).toEqual({ value: 'tbr' });
  });

  it('reads formats and lists', () => {
    expect(readFormat('Audio CD')).toBe('audiobook');
    expect(readFormat('e-book')).toBe('ebook');
    expect(readFormat('Paperback')).toBe('print');
    expect(readList('sea; winter, sea')).toEqual(['sea', 'winter']);
    expect(readList('Marlowe, Ines & Vask, Teodor', /;|&/)).toEqual(['Marlowe, Ines', 'Vask, Teodor']);
  });
});

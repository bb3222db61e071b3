import { optionalText, splitList } from './form-text';

describe('optionalText', () => {
  it('gives the trimmed text, or null for a box of only spaces or line breaks', () => {
    expect(optionalText('  The Salt Road \n')).toBe('The Salt Road');
    expect(optionalText(' \n\t ')).toBeNull();
    expect(optionalText('')).toBeNull();
  });
});

describe('splitList', () => {
  it('splits at commas and line breaks, trims, drops empty items and keeps each once in typed order', () => {
    expect(splitList('Nell Ashby, Tomas Reyes')).toEqual(['Nell Ashby', 'Tomas Reyes']);
    expect(splitList('late, sea , late\n\nharbour,')).toEqual(['late', 'sea', 'harbour']);
    expect(splitList(' , \n')).toEqual([]);
  });
});

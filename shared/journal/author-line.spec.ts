import { authorLine } from './author-line';

describe('authorLine', () => {
  it('joins one, two and three authors as a reader says them, skipping blanks', () => {
    expect(authorLine(['Ada Pell'])).toBe('Ada Pell');
    expect(authorLine(['Nell Ashby', ' Tomas Reyes '])).toBe('Nell Ashby and Tomas Reyes');
    expect(authorLine(['A', '', 'B', 'C'])).toBe('A, B and C');
    expect(authorLine(undefined)).toBe('');
  });
});

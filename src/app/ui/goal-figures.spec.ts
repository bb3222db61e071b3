import { amountsLine, goalAmount, goalFigure, signedFigure } from './goal-figures';

describe('goal figures', () => {
  it('writes books to one decimal place and pages and minutes whole, as pacingMessage does', () => {
    expect(goalFigure(3.24, 'books')).toBe('3.2');
    expect(goalFigure(1487.6, 'pages')).toBe('1,488');
    expect(goalAmount(1, 'books')).toBe('1 book');
    expect(goalAmount(1.04, 'books')).toBe('1 book');
    expect(goalAmount(0, 'minutes')).toBe('0 minutes');
  });

  it('signs a difference with a true minus sign, and none for nothing', () => {
    // Unicode: U+2212 MINUS SIGN is the mathematical minus (The Unicode Standard, ch. 6, "Dashes").
    expect(signedFigure(-1.25, 'books')).toBe('\u22121.3');
    expect(signedFigure(2, 'pages')).toBe('+2');
    expect(signedFigure(0.01, 'books')).toBe('0');
  });

  it('puts a period’s amounts on one line', () => {
    expect(amountsLine({ books: 1, pages: 30.4, minutes: 95 })).toBe('1 book · 30 pages · 95 minutes');
  });
});

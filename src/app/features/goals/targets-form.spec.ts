import { changedTargets, targetsByUnit, targetTexts, toTarget } from './targets-form';

describe('targets form', () => {
  it('writes only the targets that changed, and clears one left blank', () => {
    const before = { books: '12', pages: '3000', minutes: '' };
    expect(changedTargets(before, { books: '12', pages: '4000', minutes: '' })).toEqual({ pagesTarget: 4000 });
    expect(changedTargets(before, { books: '', pages: ' 3000 ', minutes: '900' })).toEqual({ booksTarget: null, minutesTarget: 900 });
    expect(changedTargets(before, before)).toEqual({});
  });

  it('reads stored targets both ways', () => {
    expect(targetTexts({ booksTarget: 12, pagesTarget: null })).toEqual({ books: '12', pages: '', minutes: '' });
    expect(targetsByUnit({ booksTarget: 12, pagesTarget: null, minutesTarget: 600 })).toEqual({ books: 12, minutes: 600 });
    expect(targetsByUnit(undefined)).toEqual({});
    expect(toTarget('  ')).toBeNull();
  });
});

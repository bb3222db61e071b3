import { companionLine, countWords } from './companion-words';

describe('companion words', () => {
  it('says one and many as English does', () => {
    expect(countWords('sessions', 1)).toBe('1 session');
    expect(countWords('bookStatusChanges', 4)).toBe('4 status changes');
  });

  it('joins kinds with commas and a last "and", leaving out kinds with none', () => {
    // CLDR's en-GB list patterns: "{0}, {1}" between and "{0} and {1}" at the end, no serial comma.
    const counts = [
      { collection: 'readings', count: 2 },
      { collection: 'sessions', count: 5 },
      { collection: 'quotes', count: 0 },
      { collection: 'bookStatusChanges', count: 1 },
    ] as const;
    expect(companionLine(counts)).toBe('2 readings, 5 sessions and 1 status change');
    expect(companionLine([{ collection: 'quotes', count: 1 }])).toBe('1 quote');
    expect(companionLine([{ collection: 'quotes', count: 0 }])).toBe('');
  });
});

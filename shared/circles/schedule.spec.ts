import { describePartEnd, orderedParts, parsePartEnd, partEndFraction, partEndOf, storedPartEnd } from './schedule';

describe('schedule parts', () => {
  it('reads pages, percents and chapter labels as a host types them', () => {
    expect(parsePartEnd('p. 120')).toEqual({ kind: 'page', page: 120 });
    expect(parsePartEnd('page 88')).toEqual({ kind: 'page', page: 88 });
    expect(parsePartEnd('212')).toEqual({ kind: 'page', page: 212 });
    expect(parsePartEnd('45%')).toEqual({ kind: 'percent', percent: 45 });
    expect(parsePartEnd('12,5 percent')).toEqual({ kind: 'percent', percent: 12.5 });
    expect(parsePartEnd('Chapter 7')).toEqual({ kind: 'chapter', label: 'Chapter 7' });
    expect(parsePartEnd('  Part  Two ')).toEqual({ kind: 'chapter', label: 'Part Two' });
  });

  it('refuses empty text, page 0 and percents over 100', () => {
    expect(parsePartEnd('  ')).toBeNull();
    expect(parsePartEnd('0')).toBeNull();
    expect(parsePartEnd('140%')).toBeNull();
  });

  it('stores and reads back every kind of end', () => {
    for (const typed of ['p. 40', '33.5%', 'The Lantern Chapter']) {
      const end = parsePartEnd(typed)!;
      expect(partEndOf(storedPartEnd(end))).toEqual(end);
    }
    expect(partEndOf({ endKind: 'page', endValue: 'twelve' })).toBeNull();
  });

  it('places an end in the book and describes it', () => {
    expect(partEndFraction({ kind: 'page', page: 150 }, { pageCount: 300 })).toBe(0.5);
    expect(partEndFraction({ kind: 'page', page: 150 }, {})).toBeNull();
    expect(partEndFraction({ kind: 'chapter', label: 'Coda' }, { pageCount: 300 })).toBeNull();
    expect(describePartEnd({ kind: 'percent', percent: 45 })).toBe('to 45 %');
  });

  it('orders parts by position, then id', () => {
    const ids = orderedParts([
      { id: 'b', position: 2 },
      { id: 'c', position: 1 },
      { id: 'a', position: 2 },
    ]).map((part) => part.id);
    expect(ids).toEqual(['c', 'a', 'b']);
  });
});

import { quotePosition, quoteWithSource } from './quote-source';

// Typography: U+201C/U+201D are the English double quotation marks and U+2014 the em dash that
// sets off a source (Unicode 15.1, General Punctuation block; The Chicago Manual of Style, 18th
// edition, 13.36 on attributing an epigraph with an em dash).
describe('quote with its source line', () => {
  const almanac = { title: 'The Salt Road Almanac', authors: ['Ada Pell'], format: 'print' as const };

  it('gives a print quote its page', () => {
    expect(quoteWithSource({ text: 'Salt keeps what the sea forgets.', page: 42 }, almanac)).toBe(
      '\u201CSalt keeps what the sea forgets.\u201D\n\u2014 Ada Pell, The Salt Road Almanac, p. 42',
    );
  });

  it('gives an ebook quote its location, or its percent as typed', () => {
    const ebook = { title: 'Glasswing', authors: ['Oren Vale'], format: 'ebook' as const };
    expect(quoteWithSource({ text: 'Light bends.', ebookLocation: '1234' }, ebook)).toBe('“Light bends.”\n— Oren Vale, Glasswing, loc. 1234');
    expect(quoteWithSource({ text: 'Light bends.', ebookLocation: '37%' }, ebook)).toBe('“Light bends.”\n— Oren Vale, Glasswing, 37%');
  });

  it('gives an audiobook quote its time stamp as h:mm:ss', () => {
    const audio = { title: 'The Fen Hours', authors: ['Ines Roa', 'Tam Okafor'], format: 'audiobook' as const };
    expect(quoteWithSource({ text: 'Listen low.', audioSeconds: 3750 }, audio)).toBe('“Listen low.”\n— Ines Roa and Tam Okafor, The Fen Hours, 1:02:30');
  });

  it('leaves out what is missing: the author, the position, or the whole source', () => {
    expect(quoteWithSource({ text: 'Anonymous, and proud.', page: 7 }, { title: 'Marginalia', authors: [] })).toBe('“Anonymous, and proud.”\n— Marginalia, p. 7');
    expect(quoteWithSource({ text: 'No page kept.' }, almanac)).toBe('“No page kept.”\n— Ada Pell, The Salt Road Almanac');
    expect(quoteWithSource({ text: 'From memory.' }, undefined)).toBe('“From memory.”');
  });

  it('does not double the quotation marks of a passage pasted with its own', () => {
    expect(quoteWithSource({ text: ' “Already quoted.” ', page: 1 }, almanac)).toBe('“Already quoted.”\n— Ada Pell, The Salt Road Almanac, p. 1');
    expect(quoteWithSource({ text: '"Straight ones too."' }, null)).toBe('“Straight ones too.”');
  });
});

describe('quote position', () => {
  it('prefers the field of the book’s format, else the first one set', () => {
    const quote = { page: 12, ebookLocation: '88', audioSeconds: 65 };
    expect(quotePosition(quote, 'print')).toBe('p. 12');
    expect(quotePosition(quote, 'ebook')).toBe('loc. 88');
    expect(quotePosition(quote, 'audiobook')).toBe('0:01:05');
    expect(quotePosition({ audioSeconds: 65 }, 'print')).toBe('0:01:05');
    expect(quotePosition({ page: 0 })).toBe('p. 0');
    expect(quotePosition({})).toBe('');
  });
});

import { formatSplit } from './format-split';

describe('formatSplit', () => {
  it('counts print, ebook and audiobook and leaves unknown formats out (worked by hand)', () => {
    expect(formatSplit([{ format: 'print' }, { format: 'audiobook' }, { format: 'print' }, { format: null }, { format: 'scroll' }])).toEqual({
      print: 2,
      ebook: 0,
      audiobook: 1,
    });
  });
});

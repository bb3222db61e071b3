import type { Quote } from '@shared/sync/schema/collections';

import { changedQuoteFields, EMPTY_QUOTE_FORM, pageBeyondBook, positionError, tagsError, toQuoteFields, toQuoteForm } from './quote-form-model';

describe('quote form model', () => {
  const typed = { ...EMPTY_QUOTE_FORM, bookId: 'b1', text: '  Tides are patient.\n', chapter: ' ', tags: 'sea, patience ,sea', labelIds: ['l1'] };

  it('puts the position in the one field of the book’s format and clears the other two', () => {
    expect(toQuoteFields({ ...typed, position: ' 42 ' }, 'print')).toEqual({
      bookId: 'b1',
      text: 'Tides are patient.',
      page: 42,
      ebookLocation: null,
      audioSeconds: null,
      chapter: null,
      note: null,
      tags: ['sea', 'patience'],
      labelIds: ['l1'],
      favourite: false,
    });
    expect(toQuoteFields({ ...typed, position: '37%' }, 'ebook')).toEqual(jasmine.objectContaining({ page: null, ebookLocation: '37%', audioSeconds: null }));
    expect(toQuoteFields({ ...typed, position: '1:02:30' }, 'audiobook')).toEqual(jasmine.objectContaining({ page: null, ebookLocation: null, audioSeconds: 3750 }));
    expect(toQuoteFields({ ...typed, bookId: '' }, 'print')).toEqual(jasmine.objectContaining({ bookId: null, page: null }));
  });

  it('warns about a page past the book’s page count, but only for print and only past the end', () => {
    expect(pageBeyondBook('400', 'print', 320)).toContain('320 pages, so page 400 is past its end');
    expect(pageBeyondBook('320', 'print', 320)).toBeNull();
    expect(pageBeyondBook('400', 'print', null)).toBeNull();
    expect(pageBeyondBook('400', 'ebook', 320)).toBeNull();
    expect(pageBeyondBook('', 'print', 320)).toBeNull();
  });

  it('says what is wrong with a position, per format', () => {
    expect(positionError('42', 'print')).toBeNull();
    expect(positionError('', 'audiobook')).toBeNull();
    expect(positionError('forty-two', 'print')).toBe('Use a page number such as 42');
    expect(positionError('100001', 'print')).toBe('Use a page number such as 42');
    expect(positionError('1:75:00', 'audiobook')).toBe('Use h:mm:ss such as 1:02:30, or minutes such as 45');
    expect(positionError('x'.repeat(41), 'ebook')).toBe('Use at most 40 characters');
    expect(tagsError(Array.from({ length: 41 }, (_, i) => `t${i}`).join(','))).toBe('Use at most 40 tags');
    expect(tagsError('y'.repeat(61))).toBe('Keep each tag to 60 characters');
    expect(tagsError('one, two')).toBeNull();
  });

  it('sends only the fields the reader changed, so edits from other devices are kept', () => {
    const stored: Quote = { id: 'q1', bookId: 'b1', text: 'Reeds keep the time.', audioSeconds: 65, tags: ['fen'], labelIds: [], favourite: false };
    const loaded = toQuoteForm(stored, 'audiobook');
    expect(loaded.position).toBe('0:01:05');

    expect(changedQuoteFields(loaded, 'audiobook', { ...loaded }, 'audiobook')).toEqual({});
    expect(changedQuoteFields(loaded, 'audiobook', { ...loaded, note: 'For Ines', favourite: true }, 'audiobook')).toEqual({ note: 'For Ines', favourite: true });
    expect(changedQuoteFields(loaded, 'audiobook', { ...loaded, position: '2:00' }, 'audiobook')).toEqual({
      page: null,
      ebookLocation: null,
      audioSeconds: 120,
    });
  });

  it('shows a quote kept under another format where it was, and leaves it alone unless changed', () => {
    const stored: Quote = { id: 'q2', bookId: 'b1', text: 'Old page.', page: 12 };
    const loaded = toQuoteForm(stored, 'ebook'); // the book became an ebook since
    expect(loaded.position).toBe('12');
    expect(changedQuoteFields(loaded, 'ebook', { ...loaded, chapter: 'One' }, 'ebook')).toEqual({ chapter: 'One' });
    // Once the reader changes it, the old page is cleared.
    expect(changedQuoteFields(loaded, 'ebook', { ...loaded, position: '14%' }, 'ebook')).toEqual({
      page: null,
      ebookLocation: '14%',
      audioSeconds: null,
    });
  });
});

import { formatHlc } from '@shared/sync/hlc';
import type { LocalRow } from '@shared/sync/local-row';

import { bookOptions, clip, lastEdited, summarizeNotebooks } from './notebook-data';

const at = (iso: string, counter = 0) => formatHlc({ wall: Date.parse(iso), counter, node: 'tablet' });
const row = (id: string, fields: Record<string, unknown>, edited: string): LocalRow => ({
  id,
  ...fields,
  _hlc: Object.fromEntries(Object.keys(fields).map((field) => [field, at(edited)])),
});

describe('notebook data', () => {
  it('takes the last edit from the greatest field clock of any row', () => {
    const rows: LocalRow[] = [
      { id: 'a', _hlc: { title: at('2026-03-01T10:00:00Z'), body: at('2026-03-04T08:30:00Z') } },
      { id: 'b', _hlc: { title: at('2026-03-02T10:00:00Z', 7) } },
    ];
    expect(lastEdited(rows)).toBe(Date.parse('2026-03-04T08:30:00Z'));
    expect(lastEdited([{ id: 'c', _hlc: {} }])).toBeNull();
  });

  it('summarizes notebooks: titles, books, live page counts; most recently edited first', () => {
    const notebooks = [
      row('n1', { title: 'Coast reading', bookId: 'b1', deleted: false }, '2026-03-01T10:00:00Z'),
      row('n2', { title: 'Loose thoughts', bookId: null, deleted: false }, '2026-03-02T10:00:00Z'),
      row('n3', { title: 'Gone', deleted: true }, '2026-03-09T10:00:00Z'),
      row('n4', { title: 'On a book not here yet', bookId: 'b9', deleted: false }, '2026-02-01T10:00:00Z'),
    ];
    const pages = [
      row('p1', { notebookId: 'n1', deleted: false }, '2026-03-05T10:00:00Z'),
      row('p2', { notebookId: 'n1', deleted: false }, '2026-03-01T11:00:00Z'),
      row('p3', { notebookId: 'n1', deleted: true }, '2026-03-06T10:00:00Z'),
    ];
    const books = [row('b1', { title: 'The Salt Roads', deleted: false }, '2026-01-01T00:00:00Z')];

    expect(summarizeNotebooks(notebooks, pages, books)).toEqual([
      { id: 'n1', title: 'Coast reading', bookId: 'b1', bookTitle: 'The Salt Roads', pageCount: 2, lastEdited: Date.parse('2026-03-06T10:00:00Z') },
      { id: 'n2', title: 'Loose thoughts', bookId: null, bookTitle: null, pageCount: 0, lastEdited: Date.parse('2026-03-02T10:00:00Z') },
      { id: 'n4', title: 'On a book not here yet', bookId: 'b9', bookTitle: null, pageCount: 0, lastEdited: Date.parse('2026-02-01T10:00:00Z') },
    ]);
  });

  it('offers books by title, without deleted ones', () => {
    const books = [
      row('b2', { title: 'Wintering Birds', deleted: false }, '2026-01-01T00:00:00Z'),
      row('b1', { title: 'Atlas of Tides', deleted: false }, '2026-01-01T00:00:00Z'),
      row('b3', { title: 'Discarded', deleted: true }, '2026-01-01T00:00:00Z'),
      row('b4', { deleted: false }, '2026-01-01T00:00:00Z'),
    ];
    expect(bookOptions(books)).toEqual([
      { id: 'b1', title: 'Atlas of Tides' },
      { id: 'b4', title: 'Untitled' },
      { id: 'b2', title: 'Wintering Birds' },
    ]);
  });

  it('clips text to a length without splitting a surrogate pair', () => {
    expect(clip('abcdef', 4)).toBe('abcd');
    expect(clip('abc', 4)).toBe('abc');
    expect(clip('ab🦉cd', 3)).toBe('ab'); // the owl is two UTF-16 units
    expect(clip('ab🦉cd', 4)).toBe('ab🦉');
  });
});

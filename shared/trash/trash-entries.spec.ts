import { formatHlc } from '../sync/hlc';
import { trashEntries, type TrashRow } from './trash-entries';

// Instants in ISO 8601, read with ECMAScript's Date.parse (ECMA-262 §21.4.3.2).
const at = (iso: string, node = 'tablet') => formatHlc({ wall: Date.parse(iso), counter: 0, node });
const NOW = Date.parse('2026-11-20T12:00:00Z');
const gone = (id: string, clock: string, fields: Record<string, unknown> = {}, edits: Record<string, string> = {}): TrashRow => ({
  id,
  deleted: true,
  _hlc: { deleted: clock, ...edits },
  ...fields,
});

describe('trashEntries', () => {
  const bookDelete = at('2026-11-19T08:00:00Z');

  it('lists a deleted book once, with the sessions and quotes deleted in the same write under it', () => {
    const entries = trashEntries(
      {
        books: [gone('b1', bookDelete, { title: 'The Salt Orchard' })],
        sessions: [gone('s1', bookDelete, { bookId: 'b1' }), gone('s2', bookDelete, { bookId: 'b1' })],
        quotes: [gone('q1', bookDelete, { bookId: 'b1' })],
        bookStatusChanges: [gone('h1', bookDelete, { bookId: 'b1' })],
      },
      NOW,
    );
    expect(entries.length).toBe(1);
    expect(entries[0]!.collection).toBe('books');
    expect(entries[0]!.companions.map((g) => [g.collection, g.rows.length])).toEqual([
      ['sessions', 2],
      ['quotes', 1],
      ['bookStatusChanges', 1],
    ]);
  });

  it('lists a session deleted on its own before its book separately', () => {
    const entries = trashEntries({ books: [gone('b1', bookDelete)], sessions: [gone('s1', at('2026-11-18T08:00:00Z'), { bookId: 'b1' })] }, NOW);
    expect(entries.map((e) => e.collection)).toEqual(['books', 'sessions']);
    expect(entries[0]!.companions).toEqual([]);
  });

  it('flags a book when one of the rows that went with it was edited after the delete', () => {
    const quote = gone('q1', bookDelete, { bookId: 'b1' }, { note: at('2026-11-19T09:00:00Z', 'phone') });
    const [entry] = trashEntries({ books: [gone('b1', bookDelete)], quotes: [quote] }, NOW);
    expect(entry!.editedAfterDelete).toBeTrue();
  });

  it('leaves out deletes older than 30 days and sorts the rest newest first', () => {
    const entries = trashEntries(
      {
        labels: [gone('l1', at('2026-10-01T00:00:00Z')), gone('l2', at('2026-11-10T00:00:00Z'))],
        series: [gone('r1', at('2026-11-15T00:00:00Z'))],
      },
      NOW,
    );
    expect(entries.map((e) => e.row.id)).toEqual(['r1', 'l2']);
  });
});

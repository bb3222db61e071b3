import fc from 'fast-check';

import { exportRowOf, type ExportRow } from '../export/export-format';
import { arbitraryBooks, BOOK_ID, localRow, sampleJournal } from '../export/testing/sample-journal';
import type { LocalRow } from '../sync/local-row';
import type { CollectionName } from '../sync/schema/collections';
import { expectProperty } from '../testing/expect-property';
import { importRow, type RowImport } from './import-row';
import { importText } from './text-importer';

const NOW = Date.parse('2026-12-04T10:00:00Z');
type Store = Map<string, LocalRow>;

/** Imports exported rows into a store of one collection, as the app's importer does per batch. */
function importInto(store: Store, collection: CollectionName, rows: readonly ExportRow[]): RowImport[] {
  return rows.map((fileRow) => {
    const result = importRow(collection, fileRow, store.get(fileRow.id), NOW, importText);
    if (result.row) store.set(result.row.id, result.row);
    return result;
  });
}

const exported = (collection: CollectionName, store: Store) =>
  [...store.values()].map((row) => exportRowOf(collection, row)).sort((a, b) => a.id.localeCompare(b.id));

describe('importRow', () => {
  it('export → import into a fresh store → export again gives the same rows (property, fast-check)', () => {
    expectProperty(
      fc.property(arbitraryBooks, (books) => {
        const first = books.map((row) => exportRowOf('books', row));
        const fresh: Store = new Map();
        importInto(fresh, 'books', first);
        return JSON.stringify(exported('books', fresh)) === JSON.stringify([...first].sort((a, b) => a.id.localeCompare(b.id)));
      }),
    );
  });

  it('importing the same file twice changes nothing the second time (property, fast-check)', () => {
    expectProperty(
      fc.property(arbitraryBooks, (books) => {
        const file = books.map((row) => exportRowOf('books', row));
        const store: Store = new Map();
        importInto(store, 'books', file);
        return importInto(store, 'books', file).every((result) => result.outcome === 'unchanged' && result.changes.length === 0);
      }),
    );
  });

  it('round-trips every collection of the sample, texts included', () => {
    for (const [collection, rows] of sampleJournal()) {
      const file = rows.map((row) => exportRowOf(collection, row));
      const store: Store = new Map();
      expect(importInto(store, collection, file).map((r) => r.outcome)).toEqual(file.map(() => 'added'));
      expect(exported(collection, store)).withContext(collection).toEqual(file);
    }
  });

  it('never overwrites a field the device wrote later, and takes one the file wrote later', () => {
    const device = localRow(BOOK_ID, { title: 'Newer here', status: 'reading' }, 2_000_000_000_000, 'dev-b');
    const fileRow = exportRowOf('books', { ...localRow(BOOK_ID, { title: 'Older in file', pageCount: 200 }, 1_000_000_000_000) });
    const result = importRow('books', fileRow, device, NOW);
    expect(result.outcome).toBe('updated');
    expect(result.row!['title']).toBe('Newer here');
    expect(result.row!['pageCount']).toBe(200);
    expect(result.changes.map((change) => change.field)).toEqual(['pageCount']);
    expect(result.changes[0]!.hlc).toBe(fileRow.clocks['pageCount']!);
  });

  it('refuses a row with a value out of range, an unknown field or a bad or future clock, naming why', () => {
    const good = exportRowOf('books', sampleJournal().get('books')![0]!);
    const cases: [unknown, string][] = [
      [{ ...good, fields: { ...good.fields, rating: 9 } }, 'rating must be at most 5'],
      [{ ...good, fields: { ...good.fields, shelf: 'x' } }, 'shelf is not a field of books'],
      [{ ...good, clocks: { ...good.clocks, title: 'soon' } }, 'title has no valid clock'],
      [{ ...good, clocks: { ...good.clocks, title: '009999999999999:00000:x' } }, 'title has a clock more than a day in the future'],
      [{ ...good, id: 'not an id!' }, 'has no valid id'],
      ['a string', 'has no valid id'],
    ];
    for (const [row, reason] of cases) {
      const result = importRow('books', row, undefined, NOW);
      expect(result.outcome).toBe('refused');
      expect(result.reason).toBe(reason);
    }
  });

  it('turns a set field into a delta the server accepts and a text into a Yjs update', () => {
    const [book] = sampleJournal().get('books')!;
    const result = importRow('books', exportRowOf('books', book!), undefined, NOW);
    const tags = result.changes.find((change) => change.field === 'tags')!;
    expect(Object.keys(tags.value as object).sort()).toEqual(['sea', 'winter']);
    const reading = sampleJournal().get('readings')![0]!;
    const review = importRow('readings', exportRowOf('readings', reading), undefined, NOW, importText).changes.find((change) => change.field === 'review')!;
    expect(Object.keys(review.value as object)).toEqual(['yjs']);
  });
});

import { exportFileName, exportJsonPieces, exportRowOf, type ExportRow } from './export-format';
import { BOOK_ID, sampleJournal } from './testing/sample-journal';

describe('exportRowOf', () => {
  it('keeps the fields of the collection with their clocks and none of the device bookkeeping', () => {
    const row = { ...sampleJournal().get('books')![0]!, _sets: { tags: {} }, _text: {}, notAField: 1 };
    const exported = exportRowOf('books', row);
    expect(exported.id).toBe(BOOK_ID);
    expect(exported.fields['title']).toBe('The Lantern, "Again"');
    expect(Object.keys(exported.fields)).not.toContain('_sets');
    expect(Object.keys(exported.fields)).not.toContain('notAField');
    expect(Object.keys(exported.clocks).sort()).toEqual(Object.keys(exported.fields).sort());
  });

  it('keeps only the id and the tombstone of a deleted row', () => {
    const label = sampleJournal().get('labels')![0]!;
    expect(exportRowOf('labels', label)).toEqual({ id: label.id, fields: { deleted: true }, clocks: { deleted: label._hlc['deleted']! } });
  });
});

describe('exportJsonPieces', () => {
  it('joins into exactly JSON.stringify of the whole export, whatever the piece size', () => {
    const rows = new Map([...sampleJournal()].map(([name, list]) => [name, list.map((row) => exportRowOf(name, row))] as [typeof name, ExportRow[]]));
    const whole = {
      format: 'lamplight-export',
      version: 1,
      exportedAt: '2026-12-04T10:00:00.000Z',
      collections: Object.fromEntries(rows),
    };
    for (const size of [1, 2, 500]) {
      expect([...exportJsonPieces('2026-12-04T10:00:00.000Z', rows, size)].join('')).toBe(JSON.stringify(whole));
    }
  });

  it('adds the covers after the collections, still exactly JSON.stringify of the whole', () => {
    const rows = new Map([['books', []]] as [['books', ExportRow[]]]);
    const covers = [
      { id: 'a'.repeat(64), dataUrl: 'data:image/webp;base64,UklGRg==' },
      { id: 'b'.repeat(64), dataUrl: 'data:image/png;base64,iVBORw==' },
    ];
    const whole = { format: 'lamplight-export', version: 1, exportedAt: '2026-12-04T10:00:00.000Z', collections: { books: [] }, covers };
    expect([...exportJsonPieces('2026-12-04T10:00:00.000Z', rows, 500, covers)].join('')).toBe(JSON.stringify(whole));
  });

  it('writes an empty journal as empty collections', () => {
    expect(JSON.parse([...exportJsonPieces('2026-12-04T10:00:00.000Z', new Map([['books', []]]))].join(''))).toEqual({
      format: 'lamplight-export',
      version: 1,
      exportedAt: '2026-12-04T10:00:00.000Z',
      collections: { books: [] },
    });
  });
});

describe('exportFileName', () => {
  it('names the file by the date', () => {
    expect(exportFileName('2026-12-04')).toBe('lamplight-export-2026-12-04.json');
    expect(exportFileName('2026-12-04', 'csv', 'books')).toBe('lamplight-books-2026-12-04.csv');
  });
});

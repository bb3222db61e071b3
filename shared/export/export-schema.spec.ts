import Ajv2020 from 'ajv/dist/2020';
import addFormats from 'ajv-formats';

import { exportJsonPieces, exportRowOf, type ExportRow } from './export-format';
import { lamplightExportSchema } from './export-schema';
import { sampleJournal } from './testing/sample-journal';

/** Ajv (a reference JSON Schema validator, draft 2020-12 mode) judges our schema and our files. */
function validator() {
  const ajv = new Ajv2020({ strict: true, allErrors: true });
  addFormats(ajv);
  return ajv.compile(lamplightExportSchema());
}

/** A 1×1 PNG (the PNG signature and IHDR of RFC 2083 / ISO 15948), as a cover in the file. */
const PNG_COVER = {
  id: '6b7fa434f92a8b80aab02d9bf1a12e49ffcae424e4013a1c4f68b67e3d2bbcd0',
  dataUrl: 'data:image/png;base64,iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mNk+M9QDwADhgGAWjR9awAAAABJRU5ErkJggg==',
};

function sampleExport(): Record<string, unknown> {
  const rows = new Map([...sampleJournal()].map(([name, list]) => [name, list.map((row) => exportRowOf(name, row))] as [typeof name, ExportRow[]]));
  return JSON.parse([...exportJsonPieces('2026-12-04T10:00:00.000Z', rows, 500, [PNG_COVER])].join('')) as Record<string, unknown>;
}

describe('lamplightExportSchema (checked by Ajv 2020)', () => {
  it('is a valid draft 2020-12 schema that accepts an export with its covers', () => {
    const validate = validator();
    expect(validate(sampleExport())).withContext(JSON.stringify(validate.errors)).toBeTrue();
  });

  it('refuses another format, a newer version, an unknown collection, a field out of range, a bad clock and a cover that is no picture data URL', () => {
    const validate = validator();
    const good = sampleExport();
    const collections = good['collections'] as Record<string, ExportRow[]>;
    const book = collections['books']![0]!;
    const bad = [
      { ...good, format: 'another-app' },
      { ...good, version: 2 },
      { ...good, collections: { ...collections, shelves: [] } },
      { ...good, collections: { ...collections, books: [{ ...book, fields: { ...book.fields, rating: 7 } }] } },
      { ...good, collections: { ...collections, books: [{ ...book, clocks: { title: 'yesterday' } }] } },
      { ...good, collections: { ...collections, books: [{ ...book, fields: { ...book.fields, colour: 'red' } }] } },
      { ...good, covers: [{ ...PNG_COVER, id: 'not-a-hash' }] },
      { ...good, covers: [{ ...PNG_COVER, dataUrl: 'https://covers.invalid/a.png' }] },
      { ...good, covers: [{ ...PNG_COVER, dataUrl: 'data:text/html;base64,PGI+' }] },
    ];
    for (const file of bad) expect(validate(file)).withContext(JSON.stringify(file).slice(0, 120)).toBeFalse();
  });
});

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

function sampleExport(): Record<string, unknown> {
  const rows = new Map([...sampleJournal()].map(([name, list]) => [name, list.map((row) => exportRowOf(name, row))] as [typeof name, ExportRow[]]));
  return JSON.parse([...exportJsonPieces('2026-12-04T10:00:00.000Z', rows)].join('')) as Record<string, unknown>;
}

describe('lamplightExportSchema (checked by Ajv 2020)', () => {
  it('is a valid draft 2020-12 schema that accepts an export', () => {
    const validate = validator();
    expect(validate(sampleExport())).withContext(JSON.stringify(validate.errors)).toBeTrue();
  });

  it('refuses another format, a newer version, an unknown collection, a field out of range and a bad clock', () => {
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
    ];
    for (const file of bad) expect(validate(file)).withContext(JSON.stringify(file).slice(0, 120)).toBeFalse();
  });
});

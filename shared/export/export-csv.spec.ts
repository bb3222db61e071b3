import Papa from 'papaparse';

import type { Book } from '../sync/schema/collections';
import { collectionCsv, csvHeaders, UTF8_BOM } from './export-csv';
import { sampleJournal } from './testing/sample-journal';

const books = () => sampleJournal().get('books')! as unknown as Book[];

describe('collectionCsv', () => {
  it('starts with a UTF-8 byte order mark and ends every record with CRLF (RFC 4180 §2.1–2.2)', () => {
    const csv = collectionCsv('books', books());
    expect(csv.startsWith(UTF8_BOM)).toBeTrue();
    expect(csv.endsWith('\r\n')).toBeTrue();
    expect(csv.slice(1).split('\r\n')[0]).toBe(csvHeaders('books').join(','));
  });

  it('quotes fields with commas, quotes or line breaks and doubles the quotes inside (RFC 4180 §2.5–2.7)', () => {
    const csv = collectionCsv('books', books());
    expect(csv).toContain(',"The Lantern, ""Again""",');
    expect(csv).toContain(',"Salt Roads\nand Other Tales",');
    // A plain field is not quoted.
    expect(csv).toContain(',9780306406157,');
  });

  it('round-trips through papaparse (a reference parser) to the same values', () => {
    const sample = sampleJournal();
    for (const [collection, rows] of [
      ['books', sample.get('books')!],
      ['readings', sample.get('readings')!],
      ['quotes', sample.get('quotes')!],
      ['sessions', sample.get('sessions')!],
    ] as const) {
      const parsed = Papa.parse<Record<string, string>>(collectionCsv(collection, rows, books()).slice(1), { header: true, skipEmptyLines: true, newline: '\r\n' });
      expect(parsed.errors).withContext(collection).toEqual([]);
      expect(parsed.data.length).withContext(collection).toBe(rows.length);
      expect(parsed.data[0]!['id']).toBe(rows[0]!.id);
    }
    const [first] = Papa.parse<Record<string, string>>(collectionCsv('books', books()).slice(1), { header: true, skipEmptyLines: true }).data;
    expect(first!['title']).toBe('The Lantern, "Again"');
    expect(first!['authors']).toBe('Ines Marlowe; Teodor Vask');
    expect(first!['rating']).toBe('4.5');
    const [quote] = Papa.parse<Record<string, string>>(collectionCsv('quotes', sample.get('quotes')!, books()).slice(1), { header: true }).data;
    expect(quote!['text']).toBe('Keep the lamp lit,\r\nkeep the door open.');
    expect(quote!['book_title']).toBe('The Lantern, "Again"');
  });

  it('leaves deleted rows out', () => {
    const deleted = { ...books()[0]!, deleted: true };
    expect(collectionCsv('books', [deleted]).slice(1).split('\r\n').filter(Boolean).length).toBe(1);
  });
});

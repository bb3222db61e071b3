import { asIsbn13 } from 'isbn3';
import request from 'supertest';

import { readSruResponse } from '../../sync-server/src/domain/catalogue/sru-response';
import { HARD_CASES, inventedRecords } from '../../sync-server/src/local-catalogue/invented-records';
import { createLocalCatalogue } from '../../sync-server/src/local-catalogue/sru-server';

/* The local catalogue speaks SRU 2.0 (OASIS searchRetrieve Part 3); diagnostics are numbered as
   in the "SRU Diagnostics List" (info:srw/diagnostic/1/N). */
describe('The local catalogue (GET /sru)', () => {
  const app = createLocalCatalogue();
  const ask = (query: Record<string, string>) =>
    request(app)
      .get('/sru')
      .query({ recordSchema: 'marcxml', ...query })
      .expect(200);
  const diagnosticOf = (xml: string) => readSruResponse(xml).diagnostics[0]?.uri;

  it('When asked for an ISBN-10 that a record holds only as ISBN-10, then it answers one record in the SRU 2.0 namespace', async () => {
    const res = await ask({ query: `bath.isbn=${HARD_CASES.isbn10Only.isbn10}` });
    expect(res.headers['content-type']).toContain('application/sru+xml');
    expect(res.text).toContain('http://docs.oasis-open.org/ns/search-ws/sruResponse');
    const result = readSruResponse(res.text);
    expect(result.numberOfRecords).toBe(1);
    expect(result.records[0]!.controlFields.find((field) => field.tag === '001')!.value).toBe('llc-hard-1');
  });

  it('When a search matches many records, then maximumRecords and startRecord page through them', async () => {
    const all = readSruResponse((await ask({ query: 'dc.title all "lantern-lit"', maximumRecords: '50' })).text);
    const page = await ask({ query: 'dc.title all "lantern-lit"', maximumRecords: '2', startRecord: '2' });
    expect(all.numberOfRecords).toBeGreaterThan(3);
    expect(readSruResponse(page.text).records.length).toBe(2);
    expect(page.text).toContain('<sru:nextRecordPosition>4</sru:nextRecordPosition>');
  });

  it('When the query, schema or parameters are wrong, then it answers the SRU diagnostic for each', async () => {
    expect(diagnosticOf((await ask({ query: '' })).text)).toBe('info:srw/diagnostic/1/7'); // mandatory parameter not supplied
    expect(diagnosticOf((await ask({ query: 'dc.title="unclosed' })).text)).toBe('info:srw/diagnostic/1/10'); // query syntax error
    expect(diagnosticOf((await ask({ query: 'rec.id=1' })).text)).toBe('info:srw/diagnostic/1/16'); // unsupported index
    expect(diagnosticOf((await ask({ query: 'salt', recordSchema: 'dc' })).text)).toBe('info:srw/diagnostic/1/66'); // unknown schema
    expect(diagnosticOf((await ask({ query: 'salt', maximumRecords: 'many' })).text)).toBe('info:srw/diagnostic/1/6'); // unsupported value
  });

  it('holds a few hundred records whose ISBNs are all valid (isbn3 as reference) and each on one record only', () => {
    const records = inventedRecords();
    const isbns = records.flatMap((record) => record.fields.filter((field) => field[0] === '020' && field[2] === 'a').map((field) => field[3]!.split(' ')[0]!));
    expect(records.length).toBeGreaterThanOrEqual(300);
    expect(isbns.every((isbn) => asIsbn13(isbn) !== null)).toBeTrue();
    expect(new Set(isbns.map((isbn) => asIsbn13(isbn))).size).toBe(isbns.length);
    // hard-cases.json writes its ISBNs out; they must be the ones HARD_CASES hands to the specs.
    const hardCaseIsbns: string[] = Object.values(HARD_CASES).flatMap((isbnsOfCase) => Object.values(isbnsOfCase));
    expect(hardCaseIsbns.filter((isbn) => !isbns.includes(isbn))).toEqual([]);
  });
});

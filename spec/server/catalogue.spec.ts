import type { Express } from 'express';
import { asIsbn10 } from 'isbn3';
import request from 'supertest';

import { isbn10To13 } from '../../shared/isbn/isbn10-to-13';
import { loadConfig } from '../../sync-server/src/config';
import { HARD_CASES, inventedIsbn13, inventedRecords } from '../../sync-server/src/local-catalogue/invented-records';
import { toMarcXml } from '../../sync-server/src/local-catalogue/marc-fields';
import { startLocalCatalogue, type RunningCatalogue } from '../../sync-server/src/local-catalogue/sru-server';
import { bearer, registerReader } from '../support/accounts';
import { startStubCatalogue, sruDiagnostic, sruRecords, type StubCatalogue } from '../support/stub-catalogue';
import { testDataSource } from '../support/test-database';
import { createTestApp } from '../support/test-server';

const host = (url: string) => new URL(url).host;
const hyphenated10 = (isbn10: string) => `${isbn10.slice(0, 1)}-${isbn10.slice(1, 6)}-${isbn10.slice(6, 9)}-${isbn10.slice(9)}`;
/** The local catalogue's record with this ISBN-13 as MARCXML, for stubs to serve. */
const recordXml = (isbn13: string) =>
  toMarcXml(inventedRecords().find((record) => record.fields.some((field) => field[0] === '020' && field[3]?.startsWith(isbn13)))!);

describe('/api/catalogue', () => {
  let local: RunningCatalogue;
  const stubs: StubCatalogue[] = [];
  const stub = async (answer: Parameters<typeof startStubCatalogue>[0]) => {
    const started = await startStubCatalogue(answer);
    stubs.push(started);
    return started;
  };
  /** A catalogue URL where nothing listens any more. */
  const down = async () => {
    const closed = await startStubCatalogue({ body: '' });
    await closed.close();
    return closed.url;
  };
  const appWith = (urls: string[], env: Record<string, string> = {}) => createTestApp({ LAMPLIGHT_CATALOGUE_URLS: urls.join(','), ...env });

  beforeAll(async () => (local = await startLocalCatalogue(0)));
  afterAll(async () => {
    await local.close();
    for (const started of stubs.splice(0)) await started.close();
  });
  beforeEach(async () => (await testDataSource()).query('DELETE FROM catalogue_cache'));

  describe('GET /api/catalogue/isbn/:isbn', () => {
    let app: Express;
    let token: string;
    beforeAll(async () => {
      app = await appWith([local.url]);
      token = (await registerReader(app)).accessToken;
    });

    it('When nobody is signed in, then it answers 401', async () => {
      await request(app).get(`/api/catalogue/isbn/${HARD_CASES.audiobook.isbn13}`).expect(401);
    });

    it('When a reader looks up the local audiobook, then the details come from the local catalogue with minutes and no pages', async () => {
      const res = await request(app).get(`/api/catalogue/isbn/${HARD_CASES.audiobook.isbn13}`).set(bearer(token)).expect(200);
      expect(res.body.source).toBe(host(local.url));
      expect(res.body.books.length).toBe(1);
      expect(res.body.books[0]).toEqual(
        jasmine.objectContaining({
          isbn: HARD_CASES.audiobook.isbn13,
          title: 'The orchard under snow',
          authors: ['Halvard Nyström'],
          format: 'audiobook',
          audioMinutes: 555,
          pageCount: null,
          publisher: 'Kestrel & Vane Audio',
          year: 2024,
        }),
      );
    });

    it('When the ISBN is typed as a hyphenated ISBN-10 of a record that has only the ISBN-10, then it is found under its ISBN-13', async () => {
      const isbn10 = HARD_CASES.isbn10Only.isbn10;
      const res = await request(app)
        .get(`/api/catalogue/isbn/${hyphenated10(isbn10)}`)
        .set(bearer(token))
        .expect(200);
      expect(res.body.books[0].isbn).toBe(isbn10To13(isbn10));
      expect(res.body.books[0].pageCount).toBe(233);
    });

    it('When a record lists several ISBNs, then the one looked up is the book’s', async () => {
      const res = await request(app).get(`/api/catalogue/isbn/${HARD_CASES.severalIsbns.paperback}`).set(bearer(token)).expect(200);
      expect(res.body.books[0].isbn).toBe(HARD_CASES.severalIsbns.paperback);
      expect(res.body.books[0].isbns.length).toBe(3);
    });

    it('When the ISBN is not valid, then it answers 400 naming the field', async () => {
      const res = await request(app).get('/api/catalogue/isbn/978-1-999999-00-2').set(bearer(token)).expect(400);
      expect(res.body.error.details.isbn).toContain('valid ISBN');
    });

    it('When no record has the ISBN (0 records), then it answers 404 no_match', async () => {
      const res = await request(app)
        .get(`/api/catalogue/isbn/${inventedIsbn13(8888)}`)
        .set(bearer(token))
        .expect(404);
      expect(res.body.error.code).toBe('no_match');
    });
  });

  describe('the cache', () => {
    it('When an ISBN was answered once, then it is answered from PostgreSQL for 30 days, even with the catalogue gone', async () => {
      const catalogue = await stub({ body: sruRecords([recordXml(HARD_CASES.seriesEntry.isbn13)]) });
      const app = await appWith([catalogue.url]);
      const { accessToken } = await registerReader(app);

      const first = await request(app).get(`/api/catalogue/isbn/${HARD_CASES.seriesEntry.isbn13}`).set(bearer(accessToken)).expect(200);
      await catalogue.close();
      const again = await request(app).get(`/api/catalogue/isbn/${HARD_CASES.seriesEntry.isbn13}`).set(bearer(accessToken)).expect(200);

      expect(catalogue.requests.length).toBe(1);
      expect(first.body.source).toBe(host(catalogue.url));
      expect(again.body).toEqual({ books: first.body.books, source: 'cache' });
      expect(again.body.books[0]).toEqual(jasmine.objectContaining({ series: 'Saltmarsh quartet', seriesPosition: 2 }));
      const rows = await (
        await testDataSource()
      ).query(`SELECT extract(epoch FROM expires_at - fetched_at) / 86400 AS days FROM catalogue_cache WHERE key = $1`, [`isbn:${HARD_CASES.seriesEntry.isbn13}`]);
      expect(Number(rows[0].days)).toBe(30);
    });

    it('When the cached answer has expired, then the catalogue is asked again', async () => {
      const catalogue = await stub({ body: sruRecords([recordXml(HARD_CASES.ebook.isbn13)]) });
      const app = await appWith([catalogue.url]);
      const { accessToken } = await registerReader(app);
      await request(app).get(`/api/catalogue/isbn/${HARD_CASES.ebook.isbn13}`).set(bearer(accessToken)).expect(200);
      await (await testDataSource()).query(`UPDATE catalogue_cache SET expires_at = now() - interval '1 second'`);

      const again = await request(app).get(`/api/catalogue/isbn/${HARD_CASES.ebook.isbn13}`).set(bearer(accessToken)).expect(200);
      expect(catalogue.requests.length).toBe(2);
      expect(again.body.source).toBe(host(catalogue.url));
    });
  });

  describe('several catalogues', () => {
    it('When the first is down and the second has no record, then the third answers, and each was asked in order', async () => {
      const empty = await stub({ body: sruRecords([]) });
      const app = await appWith([await down(), empty.url, local.url]);
      const { accessToken } = await registerReader(app);

      const res = await request(app).get(`/api/catalogue/isbn/${HARD_CASES.datedNames.isbn13}`).set(bearer(accessToken)).expect(200);
      expect(empty.requests.length).toBe(1);
      // CQL with the bath context set's ISBN index, in both forms (isbn3 gives the ISBN-10).
      expect(empty.requests[0]!.searchParams.get('query')).toBe(`bath.isbn=${HARD_CASES.datedNames.isbn13} or bath.isbn=${asIsbn10(HARD_CASES.datedNames.isbn13)}`);
      expect(empty.requests[0]!.searchParams.get('recordSchema')).toBe('marcxml');
      expect(res.body.source).toBe(host(local.url));
      expect(res.body.books[0].authors).toEqual(['Juniper Asquith', 'Odile Marchetti']);
    });

    it('When the first catalogue has the book, then the others are never asked', async () => {
      const second = await stub({ body: sruRecords([]) });
      const app = await appWith([local.url, second.url]);
      const { accessToken } = await registerReader(app);
      await request(app).get(`/api/catalogue/isbn/${HARD_CASES.qualified.isbn13}`).set(bearer(accessToken)).expect(200);
      expect(second.requests.length).toBe(0);
    });
  });

  describe('a catalogue that fails', () => {
    const failing = async (answer: Parameters<typeof startStubCatalogue>[0], env: Record<string, string> = {}) => {
      const catalogue = await stub(answer);
      const app = await appWith([catalogue.url], env);
      const { accessToken } = await registerReader(app);
      return request(app).get(`/api/catalogue/isbn/${HARD_CASES.audiobook.isbn13}`).set(bearer(accessToken));
    };

    it('When it is slower than the timeout, then it answers 502 catalogue_timeout without waiting for it (default timeout 3 s)', async () => {
      expect(loadConfig({ DATABASE_URL: 'postgres://x', LAMPLIGHT_JWT_SECRET: 'x'.repeat(32) }).catalogueTimeoutMs).toBe(3000);
      const started = Date.now();
      const res = await failing({ body: sruRecords([recordXml(HARD_CASES.audiobook.isbn13)]), delayMs: 2500 }, { LAMPLIGHT_CATALOGUE_TIMEOUT_MS: '300' });
      expect(res.status).toBe(502);
      expect(res.body.error.code).toBe('catalogue_timeout');
      expect(Date.now() - started).toBeLessThan(2500);
    });

    it('When it is down, then it answers 502 catalogue_unavailable', async () => {
      const app = await appWith([await down()]);
      const { accessToken } = await registerReader(app);
      const res = await request(app).get(`/api/catalogue/isbn/${HARD_CASES.audiobook.isbn13}`).set(bearer(accessToken)).expect(502);
      expect(res.body.error.code).toBe('catalogue_unavailable');
    });

    it('When it sends XML that is not well-formed, or HTML, then it answers 502 catalogue_malformed and caches nothing', async () => {
      const broken = await failing({ body: '<?xml version="1.0"?><searchRetrieveResponse><numberOfRecords>1</numberOfRecords><records><record>' });
      expect([broken.status, broken.body.error.code]).toEqual([502, 'catalogue_malformed']);
      const html = await failing({ body: '<!doctype html><html><body><p>Maintenance</p></body></html>', status: 503 });
      expect([html.status, html.body.error.code]).toEqual([502, 'catalogue_malformed']);
      const rows = await (await testDataSource()).query('SELECT count(*)::int AS n FROM catalogue_cache');
      expect(rows[0].n).toBe(0);
    });

    it('When it answers with an SRU diagnostic, then it answers 502 with the diagnostic’s message', async () => {
      const res = await failing({ body: sruDiagnostic(16, 'Unsupported index', 'bath.isbn') });
      expect(res.status).toBe(502);
      expect(res.body.error.code).toBe('catalogue_unavailable');
      expect(res.body.error.message).toContain('Unsupported index');
    });

    it('When a record smuggles in a NUL as a character reference, then it is dropped and the answer is stored (PostgreSQL refuses NUL)', async () => {
      const record = recordXml(HARD_CASES.audiobook.isbn13).replace('The orchard under snow', 'The orchard&#0; under snow');
      const res = await failing({ body: sruRecords([record]) });
      expect(res.status).toBe(200);
      expect(res.body.books[0].title).toBe('The orchard under snow');
    });

    it('When it escapes its records as a string (recordXMLEscaping=string), then they are read all the same', async () => {
      const res = await failing({ body: sruRecords([recordXml(HARD_CASES.audiobook.isbn13)], true) });
      expect(res.status).toBe(200);
      expect(res.body.books[0].audioMinutes).toBe(555);
    });
  });

  describe('GET /api/catalogue/search', () => {
    let app: Express;
    let token: string;
    beforeAll(async () => {
      app = await appWith([local.url]);
      token = (await registerReader(app)).accessToken;
    });

    it('When a reader searches words of a title, then books with those words come back with year and format', async () => {
      const res = await request(app).get('/api/catalogue/search').query({ q: 'orchard under snow' }).set(bearer(token)).expect(200);
      expect(res.body.books[0]).toEqual(jasmine.objectContaining({ title: 'The orchard under snow', year: 2024, format: 'audiobook' }));
    });

    it('When the words are an author’s name, then that author’s books come back', async () => {
      const res = await request(app).get('/api/catalogue/search').query({ q: 'Juniper Asquith' }).set(bearer(token)).expect(200);
      expect(res.body.books.map((book: { title: string }) => book.title)).toContain('A grammar of rivers');
    });

    it('When a catalogue does not support the CQL relation "all" (SRU diagnostic 19), then the search is asked again with "="', async () => {
      const strict = await stub({
        body: (url) =>
          url.searchParams.get('query')!.includes(' all ') ? sruDiagnostic(19, 'Unsupported relation', 'all') : sruRecords([recordXml(HARD_CASES.qualified.isbn13)]),
      });
      const strictApp = await appWith([strict.url]);
      const { accessToken } = await registerReader(strictApp);
      const res = await request(strictApp).get('/api/catalogue/search').query({ title: 'salt and lantern' }).set(bearer(accessToken)).expect(200);
      expect(strict.requests.map((url) => url.searchParams.get('query'))).toEqual(['dc.title all "salt and lantern"', 'dc.title = "salt and lantern"']);
      expect(res.body.books[0].title).toBe('Salt and lantern');
    });

    it('When nothing matches, then it answers 200 with no books', async () => {
      const res = await request(app).get('/api/catalogue/search').query({ title: 'zzyzx quillwort', author: 'Nobody' }).set(bearer(token)).expect(200);
      expect(res.body.books).toEqual([]);
    });

    it('When the words are missing, repeated or hold a NUL, then it answers 400 naming the field', async () => {
      expect((await request(app).get('/api/catalogue/search').set(bearer(token)).expect(400)).body.error.details.q).toBeDefined();
      expect((await request(app).get('/api/catalogue/search?q=a&q=b').set(bearer(token)).expect(400)).body.error.details.q).toBeDefined();
      expect((await request(app).get('/api/catalogue/search').query({ q: 'salt\u0000' }).set(bearer(token)).expect(400)).body.error.details.q).toBeDefined();
    });
  });

  describe('the limit per reader', () => {
    it('When a reader looks up more than the limit in a minute, then it answers 429, and another reader is not held back', async () => {
      const app = await appWith([local.url], { LAMPLIGHT_CATALOGUE_RATE_LIMIT: '2' });
      const busy = await registerReader(app);
      const other = await registerReader(app);
      const lookUp = (token: string) => request(app).get(`/api/catalogue/isbn/${HARD_CASES.ebook.isbn13}`).set(bearer(token));

      expect((await lookUp(busy.accessToken)).status).toBe(200);
      expect((await lookUp(busy.accessToken)).status).toBe(200);
      const refused = await lookUp(busy.accessToken);
      expect([refused.status, refused.body.error.code]).toEqual([429, 'too_many_requests']);
      expect((await lookUp(other.accessToken)).status).toBe(200);
    });
  });
});

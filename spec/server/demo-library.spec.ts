import { createHash, randomUUID } from 'node:crypto';

import type { Express } from 'express';
import { parse as isbn3Parse } from 'isbn3';
import request from 'supertest';

import { isValidIsbn13 } from '../../shared/isbn/is-valid-isbn13';
import type { PulledChange } from '../../shared/api/sync';
import { parseHlc } from '../../shared/sync/hlc';
import { sessionProblems } from '../../shared/reading/session-problems';
import { loanState } from '../../shared/loans/loan-state';
import { byUrgency } from '../../shared/loans/urgency';
import type { Loan, Session } from '../../shared/sync/schema/collections';
import { BOOK_COPIES, BOOK_FORMATS, BOOK_STATUSES, COLLECTIONS, type CollectionName } from '../../shared/sync/schema/collections';
import { validateChange } from '../../shared/sync/validate-change';
import { validatePatch } from '../../shared/sync/validate-patch';
import { DEMO_BOOKS } from '../../sync-server/src/demo/demo-books';
import { DEMO_FRIEND, DEMO_LIBRARY, DEMO_LOAN_TITLES } from '../../sync-server/src/demo/demo-loans';
import { DEMO_SEED_NODE, seedDemoLibrary } from '../../sync-server/src/demo/seed-demo-library';
import { User } from '../../sync-server/src/data-access/entities/user.entity';
import { DEMO_ACCOUNTS, seedDemo } from '../../sync-server/src/demo/seed-demo';
import { bearer, registerReader } from '../support/accounts';
import { fieldChange, SyncClient } from '../support/sync-client';
import { testDataSource } from '../support/test-database';
import { startTestServer, type RunningServer } from '../support/test-server';

type Row = Record<string, unknown> & { id: string };

/** What a fresh device gets: every pulled change, and the rows they make, by collection. */
interface Pulled {
  readonly changes: PulledChange[];
  readonly rows: Record<CollectionName, Row[]>;
}

/** SHA-256 (FIPS 180-4) by node:crypto, in hex: what a content-addressed id must be. */
const sha256 = (bytes: Buffer) => createHash('sha256').update(bytes).digest('hex');

/**
 * Width and height from a PNG's IHDR, which the W3C PNG Specification (§5.2, §5.3, §11.2.1)
 * puts first: the 8-byte signature, then length (4), 'IHDR' (4), width and height (4 each).
 */
function pngSize(bytes: Buffer): { width: number; height: number } | null {
  const signature = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);
  if (bytes.length < 24 || !bytes.subarray(0, 8).equals(signature) || bytes.toString('latin1', 12, 16) !== 'IHDR') return null;
  return { width: bytes.readUInt32BE(16), height: bytes.readUInt32BE(20) };
}

async function countRows(table: string, userId: string): Promise<number> {
  const rows = await (await testDataSource()).query(`SELECT count(*)::int AS n FROM ${table} WHERE user_id = $1`, [userId]);
  return rows[0].n;
}

describe('demo library (seedDemoLibrary)', () => {
  let server: RunningServer;
  let app: Express;

  beforeAll(async () => {
    server = await startTestServer();
    app = server.app;
  });
  afterAll(() => server.close());

  /** Pulls everything as a new device would, page by page. */
  async function pullEverything(accessToken: string): Promise<Pulled> {
    const client = new SyncClient(server.baseUrl, accessToken);
    const changes: PulledChange[] = [];
    let cursor: string | undefined;
    for (;;) {
      const page = await client.pull(cursor, 500);
      changes.push(...page.changes);
      cursor = page.cursor;
      if (!page.hasMore) break;
    }
    const byRow = new Map<string, Row & { collection: string }>();
    for (const change of changes) {
      const key = `${change.collection}/${change.rowId}`;
      const row = byRow.get(key) ?? { id: change.rowId, collection: change.collection };
      row[change.field] = change.value;
      byRow.set(key, row);
    }
    const rows = Object.fromEntries(Object.keys(COLLECTIONS).map((name) => [name, [] as Row[]])) as Record<CollectionName, Row[]>;
    for (const { collection, ...row } of byRow.values()) rows[collection as CollectionName].push(row);
    return { changes, rows };
  }

  describe('for a reader with no books', () => {
    let reader: Awaited<ReturnType<typeof registerReader>>;
    let summary: Awaited<ReturnType<typeof seedDemoLibrary>>;
    let pulled: Pulled;
    const booksById = () => new Map(pulled.rows.books.map((book) => [book.id, book]));

    beforeAll(async () => {
      reader = await registerReader(app, { displayName: 'Tamsin Oakfield' });
      summary = await seedDemoLibrary(await testDataSource(), reader.user.id);
      pulled = await pullEverything(reader.accessToken);
    });

    it('When seeded, then a device pulls every demo book, in every format, status and kind of copy', () => {
      const { books } = pulled.rows;
      expect(DEMO_BOOKS.length).toBeGreaterThanOrEqual(24);
      expect(DEMO_BOOKS.length).toBeLessThanOrEqual(30);
      expect(summary?.books).toBe(DEMO_BOOKS.length);
      expect(books.length).toBe(DEMO_BOOKS.length);
      expect(new Set(books.map((book) => book['title'])).size).toBe(DEMO_BOOKS.length);
      expect(new Set(books.map((book) => book['format']))).toEqual(new Set(BOOK_FORMATS));
      expect(new Set(books.map((book) => book['status']))).toEqual(new Set(BOOK_STATUSES));
      expect(new Set(books.map((book) => book['copy']))).toEqual(new Set(BOOK_COPIES));
      for (const book of books.filter((row) => row['format'] === 'audiobook')) expect(book['audioMinutes']).toBeGreaterThan(0);
      for (const book of books.filter((row) => row['format'] !== 'audiobook')) expect(book['pageCount']).toBeGreaterThan(0);
      const languages = books.map((book) => book['language']);
      expect(languages.filter((language) => language === 'en').length).toBeGreaterThan(books.length / 2);
      expect(new Set(languages).size).toBeGreaterThan(2);
      expect(books.every((book) => (book['genres'] as string[]).length > 0)).toBeTrue();
    });

    it('When seeded, then every ISBN is a valid ISBN-13 by the shared code and by isbn3 (npm reference)', () => {
      const isbns = pulled.rows.books.map((book) => book['isbn']).filter((isbn): isbn is string => isbn !== null);
      expect(isbns.length).toBeGreaterThan(pulled.rows.books.length * 0.8);
      expect(new Set(isbns).size).toBe(isbns.length);
      for (const isbn of isbns) {
        expect(isValidIsbn13(isbn)).withContext(isbn).toBeTrue();
        // isbn3 also checks the registration group and registrant ranges, from the agency's table.
        expect(isbn3Parse(isbn)?.isbn13).withContext(isbn).toBe(isbn);
      }
    });

    it('When seeded, then about a third of the books have covers: PNGs the reader owns, ≤ 600 px tall, whose SHA-256 is their id', async () => {
      const coverIds = pulled.rows.books.map((book) => book['coverId']).filter((id): id is string => id !== null);
      expect(summary?.covers).toBe(coverIds.length);
      expect(coverIds.length).toBeGreaterThanOrEqual(Math.floor(DEMO_BOOKS.length / 4));
      expect(coverIds.length).toBeLessThanOrEqual(Math.ceil(DEMO_BOOKS.length / 2));
      expect(new Set(coverIds).size).withContext('each cover is its own picture').toBe(coverIds.length);
      for (const id of coverIds) {
        const res = await request(app).get(`/api/uploads/${id}`).set(bearer(reader.accessToken)).expect(200);
        const bytes = res.body as Buffer;
        expect(res.headers['content-type']).toBe('image/png');
        expect(sha256(bytes)).toBe(id);
        const size = pngSize(bytes);
        expect(size).withContext(id).not.toBeNull();
        expect(size!.height).toBeLessThanOrEqual(600);
        expect(size!.width).toBeGreaterThan(0);
      }
    });

    it('When seeded, then status changes and readings belong to books that exist, and each history ends at its book’s status', () => {
      const books = booksById();
      const { bookStatusChanges, readings } = pulled.rows;
      expect(summary?.statusChanges).toBe(bookStatusChanges.length);
      expect(summary?.readings).toBe(readings.length);
      for (const row of [...bookStatusChanges, ...readings])
        expect(books.has(row['bookId'] as string))
          .withContext(row.id)
          .toBeTrue();
      for (const book of books.values()) {
        const history = bookStatusChanges
          .filter((change) => change['bookId'] === book.id)
          .sort((a, b) => String(a['changedAt']).localeCompare(String(b['changedAt'])));
        expect(history.length).withContext(String(book['title'])).toBeGreaterThan(0);
        expect(history[0]!['status']).toBe('tbr');
        expect(history.at(-1)!['status']).toBe(book['status']);
        expect(history.at(-1)!['changedAt']).toBe(book['statusChangedAt']);
      }
      const lastChanges = [...books.values()].map((book) => String(book['statusChangedAt']));
      expect(lastChanges.every((at) => at.startsWith('2026-'))).toBeTrue();
      expect(new Set(lastChanges.map((at) => at.slice(5, 7))).size)
        .withContext('months of 2026')
        .toBeGreaterThanOrEqual(9);
    });

    it('When seeded, then every finished book has a reviewed, finished reading, and one book was read twice', () => {
      const { readings } = pulled.rows;
      for (const book of pulled.rows.books.filter((row) => row['status'] === 'finished')) {
        const finished = readings.filter((reading) => reading['bookId'] === book.id && reading['finishedOn'] !== null);
        expect(finished.length).withContext(String(book['title'])).toBeGreaterThan(0);
        for (const reading of finished) {
          expect(reading['summary']).toEqual(jasmine.any(String));
          expect(reading['recommend']).toMatch(/^(yes|maybe|no)$/);
          expect(String(reading['startedOn']) <= String(reading['finishedOn'])).toBeTrue();
        }
        expect(book['rating']).toBe(finished.sort((a, b) => String(a['finishedOn']).localeCompare(String(b['finishedOn']))).at(-1)!['rating']);
      }
      const finishedReadingsPerBook = new Map<unknown, number>();
      for (const reading of readings.filter((row) => row['finishedOn'] !== null)) {
        finishedReadingsPerBook.set(reading['bookId'], (finishedReadingsPerBook.get(reading['bookId']) ?? 0) + 1);
      }
      expect([...finishedReadingsPerBook.values()].filter((count) => count >= 2).length).toBeGreaterThanOrEqual(1);
      expect(readings.some((reading) => reading['review'] && reading['takeaways'] && reading['recommendTo'])).toBeTrue();
    });

    it('When seeded, then every pulled field passes the shared validators and carries a demo-seed clock', () => {
      const now = Date.now();
      pulled.changes.forEach((change, index) => {
        expect(validateChange({ id: randomUUID(), ...change }, index, now))
          .withContext(`${change.collection}.${change.field}`)
          .toBeNull();
        expect(parseHlc(change.hlc)?.node).toBe(DEMO_SEED_NODE);
      });
      for (const [name, rows] of Object.entries(pulled.rows)) {
        const spec = COLLECTIONS[name as CollectionName];
        for (const { id, ...fields } of rows) {
          expect(validatePatch(spec, fields)).withContext(`${name} ${id}`).toEqual({});
          // Whole rows: every field of the schema arrived, nulls included.
          expect(Object.keys(fields).sort()).toEqual(Object.keys(spec.fields).sort());
          expect(fields['deleted']).toBeFalse();
        }
      }
    });

    it('When seeded, then the series books point at series rows that exist, in order without gaps', () => {
      const seriesIds = new Set(pulled.rows.series.map((row) => row.id));
      const inSeries = pulled.rows.books.filter((book) => book['seriesId']);
      expect(seriesIds.size).toBe(2);
      expect(inSeries.every((book) => seriesIds.has(book['seriesId'] as string))).toBeTrue();
      for (const id of seriesIds) {
        const places = inSeries
          .filter((book) => book['seriesId'] === id)
          .map((book) => book['seriesPosition'])
          .sort();
        expect(places).toEqual([1, 2, 3]);
      }
    });

    it('When seeded, then the journal has possible sessions (no overlap, none in the future, none over 20 h), quotes, a plan and challenges', () => {
      const sessions = pulled.rows.sessions as unknown as Session[];
      expect(sessions.length).toBeGreaterThan(50);
      const now = Date.now();
      for (const session of sessions) {
        expect(sessionProblems(session, sessions, now))
          .withContext(`${session.startedAt}`)
          .toEqual({});
        expect(booksById().has(session.bookId!)).toBeTrue();
      }
      expect(pulled.rows.quotes.length).toBeGreaterThan(0);
      expect(pulled.rows.notebooks.length).toBe(1);
      expect(pulled.rows.yearPlans.map((plan) => plan['booksTarget'])).toEqual([24]);
      expect(pulled.rows.challenges.map((c) => c['kind']).sort()).toEqual(['alphabet', 'count']);
      expect(pulled.rows.books.some((book) => (book['labelIds'] as string[] | undefined)?.length)).toBeTrue();
    });

    it('When seeded, then the reader has an invented library, a loan due soon, a hold ready and a book lent to a friend', () => {
      const today = new Date().toISOString().slice(0, 10);
      const titleOf = (row: Row) => booksById().get(row['bookId'] as string)?.['title'];
      expect(pulled.rows.libraries.map((library) => [library['name'], library['cardLabel'], library['cardNumber']])).toEqual([
        [DEMO_LIBRARY.name, DEMO_LIBRARY.cardLabel, null],
      ]);
      const loans = pulled.rows.loans as unknown as (Loan & Row)[];
      const states = byUrgency(loans, today).map((loan) => [loanState(loan, today), titleOf(loan)]);
      // byUrgency puts a ready hold before a loan due soon, and lent-out books after both.
      expect(states).toEqual([
        ['holdReady', DEMO_LOAN_TITLES.holdReady],
        ['dueSoon', DEMO_LOAN_TITLES.dueSoon],
        ['lentOut', DEMO_LOAN_TITLES.lentOut],
      ]);
      expect(loans.find((loan) => loan.kind === 'lentOut')?.friendName).toBe(DEMO_FRIEND);
      expect(loans.find((loan) => loan.kind === 'library')?.libraryId).toBe(pulled.rows.libraries[0]!.id);
      expect(loans.every((loan) => loan.bookId && booksById().has(loan.bookId))).toBeTrue();
    });

    it('When seeded again, then nothing is added and the covers are not uploaded again', async () => {
      const dataSource = await testDataSource();
      const owned = async () => (await dataSource.query('SELECT count(*)::int AS n FROM upload_owners WHERE user_id = $1', [reader.user.id]))[0].n;
      const before = { books: await countRows('books', reader.user.id), covers: await owned() };

      expect(await seedDemoLibrary(dataSource, reader.user.id)).toBeNull();

      expect(await countRows('books', reader.user.id)).toBe(before.books);
      expect(await countRows('book_status_changes', reader.user.id)).toBe(pulled.rows.bookStatusChanges.length);
      expect(await countRows('readings', reader.user.id)).toBe(pulled.rows.readings.length);
      expect(await owned()).toBe(before.covers);
    });
  });

  it('When the reader already has a book of their own, then the seed changes nothing', async () => {
    const reader = await registerReader(app);
    const client = new SyncClient(server.baseUrl, reader.accessToken);
    await client.push([fieldChange(randomUUID(), 'title', 'A Notebook of Quiet Hours', { wall: Date.now() })]);

    expect(await seedDemoLibrary(await testDataSource(), reader.user.id)).toBeNull();
    expect(await countRows('books', reader.user.id)).toBe(1);
  });

  it('When seedDemo runs twice, then the demo reader has the library once and the demo admin none', async () => {
    const dataSource = await testDataSource();
    await seedDemo(dataSource, 4);
    const again = await seedDemo(dataSource, 4);

    const users = dataSource.getRepository(User);
    const wren = await users.findOneByOrFail({ email: DEMO_ACCOUNTS.find((account) => account.withLibrary)!.email });
    const oren = await users.findOneByOrFail({ email: DEMO_ACCOUNTS.find((account) => !account.withLibrary)!.email });
    expect(again.demoBooksAdded).toBe(0);
    expect(await countRows('books', wren.id)).toBe(DEMO_BOOKS.length);
    expect(await countRows('books', oren.id)).toBe(0);
  });
});

import { randomUUID } from 'node:crypto';

import type { DataSource } from 'typeorm';

import { gs1CheckDigit } from '../../../shared/isbn/gs1-check-digit';
import type { FieldChange } from '../../../shared/api/sync';
import { HlcClock } from '../../../shared/sync/hlc';
import type { Book, BookStatusChange, Reading, Series } from '../../../shared/sync/schema/collections';
import { bookStatusChanges, books, readings, series } from '../../../shared/sync/schema/collections';
import { deterministicId } from '../../../shared/sync/deterministic-id';
import { validateChange } from '../../../shared/sync/validate-change';
import { Uploads } from '../domain/uploads';
import { SyncStore } from '../data-access/sync-store';
import { UploadStore } from '../data-access/upload-store';
import { demoCover } from './demo-cover';
import { DEMO_BOOKS, type DemoBook, type DemoReview } from './demo-books';
import { seedDemoJournal } from './demo-journal';
import { seedDemoLoans } from './demo-loans';

/** The clocks' node id: every demo row was written by the seed, not by a device. */
export const DEMO_SEED_NODE = 'demo-seed';

/** What one seeding added. */
export interface DemoLibrarySummary {
  readonly books: number;
  readonly statusChanges: number;
  readonly readings: number;
  readonly covers: number;
  readonly sessions: number;
  readonly quotes: number;
  readonly libraries: number;
  readonly loans: number;
}

/**
 * Gives a reader the invented demo library: its books, their status history and readings,
 * generated covers, and a few loans (`demo-loans.ts`), written as synced rows so every device pulls them on sign-in. Rows go
 * through `SyncStore.push` (one transaction) with clocks from an `HlcClock` of node
 * `demo-seed`; covers go through the upload domain, so they are content-addressed and owned by
 * the reader. Does nothing, and answers null, when the reader already has any book (deleted
 * ones count): `npm start` seeds on every run.
 */
export async function seedDemoLibrary(dataSource: DataSource, userId: string, now: () => number = Date.now): Promise<DemoLibrarySummary | null> {
  const existing: unknown[] = await dataSource.query(`SELECT 1 FROM ${books.table} WHERE user_id = $1 LIMIT 1`, [userId]);
  if (existing.length > 0) return null;

  const uploads = new Uploads(new UploadStore(dataSource));
  const clock = new HlcClock(DEMO_SEED_NODE, now);
  const changes: FieldChange[] = [];
  const counts = { books: 0, statusChanges: 0, readings: 0, covers: 0, sessions: 0, quotes: 0, libraries: 0, loans: 0 };
  const seeded: { id: string; book: DemoBook }[] = [];
  // One clock per row, as a device stamps one write: all of a row's fields share it.
  const write = (collection: { readonly name: string }, fields: Record<string, unknown>, rowId: string = randomUUID()) => {
    const hlc = clock.tick();
    for (const [field, value] of Object.entries(fields)) {
      changes.push({ id: randomUUID(), collection: collection.name, rowId, field, value, hlc });
    }
    return rowId;
  };

  const seriesNames = new Map(DEMO_BOOKS.flatMap((book) => (book.series ? [[book.series.name, book.series.planned] as const] : [])));
  for (const [name, planned] of seriesNames) {
    write(series, { name, plannedCount: planned, review: null, rating: null, deleted: false } satisfies Fields<Series>, demoSeriesId(name));
  }

  for (const book of DEMO_BOOKS) {
    const coverId = book.cover ? (await uploads.upload(userId, demoCover(book.title, book.cover))).upload.id : null;
    if (coverId) counts.covers++;
    const bookId = write(books, bookFields(book, coverId));
    seeded.push({ id: bookId, book });
    counts.books++;
    for (const [status, at] of book.history) {
      write(bookStatusChanges, { bookId, status, changedAt: instant(at), deleted: false } satisfies Fields<BookStatusChange>);
      counts.statusChanges++;
    }
    for (const reading of readingsOf(book)) {
      write(readings, { bookId, ...reading, deleted: false } satisfies Fields<Reading>);
      counts.readings++;
    }
  }

  Object.assign(counts, seedDemoJournal(write, seeded, now()), seedDemoLoans(write, seeded, now()));

  // The seed is held to the rules a device's push is: a mistake here must fail loudly, not sync.
  const problems = changes.map((change, index) => validateChange(change, index, now())).filter((problem) => problem !== null);
  if (problems.length > 0) throw new Error(`demo library changes refused: ${JSON.stringify(problems.slice(0, 5))}`);
  await new SyncStore(dataSource).push(userId, changes);
  return counts;
}

/** Every field of a row (nulls included, so devices get whole rows), without its id. */
type Fields<Row> = Omit<Required<Row>, 'id'>;

function bookFields(book: DemoBook, coverId: string | null): Fields<Book> {
  const [lastStatus, lastAt] = book.history[book.history.length - 1]!;
  return {
    title: book.title,
    subtitle: book.subtitle ?? null,
    authors: [...book.authors],
    format: book.format,
    pageCount: book.pageCount ?? null,
    audioMinutes: book.audioMinutes ?? null,
    isbn: book.isbnBody ? isbn13(book.isbnBody) : null,
    publisher: book.publisher ?? null,
    year: book.year,
    language: book.language,
    genres: [...book.genres],
    tags: [...book.tags],
    status: lastStatus,
    statusChangedAt: instant(lastAt),
    copy: book.copy,
    coverId,
    // The book's rating is its latest rated reading's, as the app does unless the reader sets one.
    rating: [...(book.reviews ?? [])].reverse().find((review) => review.rating !== undefined)?.rating ?? null,
    labelIds: [],
    seriesId: book.series ? demoSeriesId(book.series.name) : null,
    seriesPosition: book.series?.position ?? null,
    dnfProgress: null,
    dnfUnit: null,
    dnfOn: null,
    dnfReason: null,
    wishPriority: book.copy === 'wishlist' ? 'medium' : null,
    wishWhere: null,
    wishPriceNote: null,
    releaseDate: null,
    preordered: null,
    deleted: false,
  };
}

/** One series row per series name, the same on every run. */
const demoSeriesId = (name: string) => deterministicId('demo-series', name);

/**
 * The readings a book's history implies: one begins at 'reading' (a 'reading' after 'paused'
 * resumes it) and ends at 'finished' (with its date) or 'dnf' (without one); each ended
 * reading takes the next review. A reading still going has dates only.
 */
function readingsOf(book: DemoBook): ReadingFields[] {
  const found: ReadingFields[] = [];
  const reviews = [...(book.reviews ?? [])];
  let startedOn: string | null = null;
  for (const [status, at] of book.history) {
    if (status === 'reading' && !startedOn) {
      startedOn = at.slice(0, 10);
    } else if ((status === 'finished' || status === 'dnf') && startedOn) {
      found.push(readingFields(startedOn, status === 'finished' ? at.slice(0, 10) : null, reviews.shift()));
      startedOn = null;
    }
  }
  if (startedOn) found.push(readingFields(startedOn, null, undefined));
  if (reviews.length > 0) throw new Error(`${book.title}: more reviews than ended readings`);
  return found;
}

type ReadingFields = Omit<Fields<Reading>, 'bookId' | 'deleted'>;

function readingFields(startedOn: string, finishedOn: string | null, review: DemoReview | undefined): ReadingFields {
  return {
    startedOn,
    finishedOn,
    rating: review?.rating ?? null,
    summary: review?.summary ?? null,
    review: review?.review ?? null,
    takeaways: review?.takeaways ?? null,
    recommend: review?.recommend ?? null,
    recommendTo: review?.recommendTo ?? null,
  };
}

/** 'YYYY-MM-DD HH:MM' (UTC) as the schema's instant text. */
function instant(at: string): string {
  return new Date(`${at.replace(' ', 'T')}:00.000Z`).toISOString();
}

/** The 12-digit body (hyphens allowed) with its GS1 check digit: the ISBN-13's digits. */
function isbn13(body: string): string {
  const digits = body.replace(/-/g, '');
  return digits + String(gs1CheckDigit(digits));
}

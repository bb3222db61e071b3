import * as z from 'zod/mini';

import { defineCollection, type RowOf } from './collection';
import { field, type FieldSpec } from './field';

export const BOOK_FORMATS = ['print', 'ebook', 'audiobook'] as const;
export const BOOK_STATUSES = ['tbr', 'reading', 'paused', 'finished', 'dnf'] as const;
/** Where the reader's copy is. */
export const BOOK_COPIES = ['owned', 'borrowed', 'library', 'wishlist'] as const;
export const RECOMMEND_ANSWERS = ['yes', 'maybe', 'no'] as const;
export const WISH_PRIORITIES = ['high', 'medium', 'low'] as const;
/** How far a DNF got: a page, or a percent of the book. */
export const PROGRESS_UNITS = ['page', 'percent', 'minute'] as const;
export const FAVOURITE_KINDS = ['book', 'author', 'quote'] as const;
/** Our label palette and icons: named, so every device draws them alike. */
export const LABEL_COLOURS = ['amber', 'rose', 'sage', 'teal', 'sky', 'plum', 'slate', 'sand'] as const;
export const LABEL_ICONS = ['star', 'repeat', 'group', 'favorite', 'bolt', 'spa', 'local_cafe', 'flag', 'auto_stories', 'bookmark'] as const;

/** Labels a book or a quote may carry, by label id (at most 20). */
const labelIds = () => field.set(20, 36);

/** The books of a reader's library. */
export const books = defineCollection(
  'books',
  {
    title: field.text(500),
    subtitle: field.optionalText(500),
    /** Ordered (the first is the main author): the whole list is one last-writer-wins value. */
    authors: field.orderedList(20, 200),
    format: field.choice(BOOK_FORMATS),
    /** Length in the book's own unit: pages for print and ebook… */
    pageCount: field.optionalInteger(1, 100_000),
    /** …and listening minutes at normal speed for audiobooks. */
    audioMinutes: field.optionalInteger(1, 20_000),
    isbn: field.optionalIsbn13(),
    publisher: field.optionalText(200),
    year: field.optionalInteger(1, 3000),
    language: field.optionalLanguage(),
    genres: field.set(20, 60),
    tags: field.set(40, 60),
    status: field.choice(BOOK_STATUSES),
    /** When the status last changed; every change is also kept in `bookStatusChanges`. */
    statusChangedAt: field.optionalTimestamp(),
    copy: field.optionalChoice(BOOK_COPIES),
    coverId: field.optionalUploadId(),
    /** The reader's rating of the book (the latest reading's, unless they set it themselves). */
    rating: field.optionalNumber(0.5, 5, 0.5),
    labelIds: labelIds(),
    /** Place in a series; decimals allowed for in-between stories (2.5). */
    seriesId: field.optionalRef(),
    seriesPosition: field.optionalNumber(0, 1000),
    /** A DNF keeps how far the reader got, when and why. */
    dnfProgress: field.optionalNumber(0, 100_000),
    dnfUnit: field.optionalChoice(PROGRESS_UNITS),
    dnfOn: field.optionalDate(),
    dnfReason: field.optionalText(1000),
    /** On the wishlist: how much it is wanted, where to get it, a note on price. */
    wishPriority: field.optionalChoice(WISH_PRIORITIES),
    wishWhere: field.optionalText(300),
    wishPriceNote: field.optionalText(200),
    /** An upcoming release. */
    releaseDate: field.optionalDate(),
    preordered: field.optionalBoolean(),
  },
  { indexes: ['status', 'title', 'seriesId'] },
);
export type Book = RowOf<typeof books>;

/**
 * Every status change of a book, one row each. A new row per change (never an edited list) so
 * changes made on two devices offline both survive the merge.
 */
export const bookStatusChanges = defineCollection(
  'bookStatusChanges',
  {
    bookId: field.optionalBookRef(),
    status: field.choice(BOOK_STATUSES),
    changedAt: field.optionalTimestamp(),
  },
  { indexes: ['bookId'] },
);
export type BookStatusChange = RowOf<typeof bookStatusChanges>;

/** One reading of a book, with its review. A re-read is another reading with its own dates. */
export const readings = defineCollection(
  'readings',
  {
    bookId: field.optionalBookRef(),
    startedOn: field.optionalDate(),
    finishedOn: field.optionalDate(),
    rating: field.optionalNumber(0.5, 5, 0.5),
    /** The review in one line. */
    summary: field.optionalText(200),
    review: field.mergeableText(20_000),
    takeaways: field.mergeableText(5_000),
    recommend: field.optionalChoice(RECOMMEND_ANSWERS),
    recommendTo: field.optionalText(200),
  },
  { indexes: ['bookId'] },
);
export type Reading = RowOf<typeof readings>;

/** A series the reader follows: its books are the books whose `seriesId` points here. */
export const series = defineCollection('series', {
  name: field.text(300),
  /** How many books the series will have, when known. */
  plannedCount: field.optionalInteger(1, 500),
  review: field.mergeableText(20_000),
  rating: field.optionalNumber(0.5, 5, 0.5),
});
export type Series = RowOf<typeof series>;

/** A passage the reader kept, with where in the book it is. */
export const quotes = defineCollection(
  'quotes',
  {
    bookId: field.optionalBookRef(),
    text: field.text(5_000),
    /** Where it is, in the book's own unit: a page, an ebook location, or an audio position. */
    page: field.optionalInteger(0, 100_000),
    ebookLocation: field.optionalText(40),
    audioSeconds: field.optionalInteger(0, 1_200_000),
    chapter: field.optionalText(200),
    note: field.mergeableText(5_000),
    tags: field.set(40, 60),
    labelIds: labelIds(),
    favourite: field.optionalBoolean(),
    /** When it was captured (for ordering and the year in review). */
    capturedAt: field.optionalTimestamp(),
  },
  { indexes: ['bookId'] },
);
export type Quote = RowOf<typeof quotes>;

/** A notebook of free-form pages, optionally about one book. */
export const notebooks = defineCollection(
  'notebooks',
  {
    title: field.text(300),
    bookId: field.optionalBookRef(),
  },
  { indexes: ['bookId'] },
);
export type Notebook = RowOf<typeof notebooks>;

/** One page of a notebook: plain text with light formatting (see shared/journal/light-format). */
export const notebookPages = defineCollection(
  'notebookPages',
  {
    notebookId: field.optionalRef(),
    title: field.optionalText(300),
    body: field.mergeableText(50_000),
    /** Order within the notebook; decimals let a page slot in between two others. */
    position: field.optionalNumber(-1e9, 1e9),
  },
  { indexes: ['notebookId'] },
);
export type NotebookPage = RowOf<typeof notebookPages>;

/** A page layout the reader saved for reuse. Starter templates ship with the app instead. */
export const pageTemplates = defineCollection('pageTemplates', {
  name: field.text(120),
  title: field.optionalText(300),
  body: field.mergeableText(50_000),
});
export type PageTemplate = RowOf<typeof pageTemplates>;

/** A favourite book, author or quote, with why. */
export const favourites = defineCollection('favourites', {
  kind: field.choice(FAVOURITE_KINDS),
  bookId: field.optionalBookRef(),
  quoteId: field.optionalRef(),
  authorName: field.optionalText(200),
  why: field.optionalText(2_000),
});
export type Favourite = RowOf<typeof favourites>;

/** The pick of a month. Its row id is `deterministicId('month-pick', month)`: one row per month. */
export const monthPicks = defineCollection('monthPicks', {
  month: field.optionalMonth(),
  bookId: field.optionalBookRef(),
  why: field.optionalText(2_000),
});
export type MonthPick = RowOf<typeof monthPicks>;

/** A small label for books and quotes: our starter set (fixed ids) and the reader's own. */
export const labels = defineCollection('labels', {
  name: field.text(40),
  colour: field.choice(LABEL_COLOURS),
  icon: field.choice(LABEL_ICONS),
});
export type Label = RowOf<typeof labels>;

/** How a session felt, in the reader's own shorthand (optional). */
export const SESSION_MOODS = ['absorbed', 'calm', 'restless', 'sleepy', 'moved'] as const;
export const SESSION_SOURCES = ['timer', 'manual'] as const;
export const TIMER_STATES = ['running', 'paused', 'idle'] as const;

/**
 * One stretch of reading or listening. Positions are in the book's own unit: page (print),
 * percent 0–100 (ebook), listened minutes into the book (audiobook).
 */
export const sessions = defineCollection(
  'sessions',
  {
    bookId: field.optionalBookRef(),
    format: field.optionalChoice(BOOK_FORMATS),
    startedAt: field.optionalTimestamp(),
    endedAt: field.optionalTimestamp(),
    /** Time actually spent, pauses left out. At most 20 hours (a longer one is refused). */
    activeMinutes: field.optionalNumber(0, 1200),
    fromPosition: field.optionalNumber(0, 100_000),
    toPosition: field.optionalNumber(0, 100_000),
    /** An ebook's own location, as the reader's device shows it. */
    ebookLocation: field.optionalText(40),
    playbackSpeed: field.optionalNumber(0.5, 4),
    mood: field.optionalChoice(SESSION_MOODS),
    note: field.mergeableText(2_000),
    source: field.optionalChoice(SESSION_SOURCES),
  },
  { indexes: ['bookId', 'startedAt'] },
);
export type Session = RowOf<typeof sessions>;

/**
 * The reader's one reading timer, stored rather than counted: its start and pauses are written
 * at each action and the elapsed time is always computed from them, so it survives reloads,
 * sleep and days offline, and shows on every device. Its row id is
 * `deterministicId('reading-timer', 'current')`.
 */
export const timers = defineCollection('timers', {
  state: field.choice(TIMER_STATES),
  bookId: field.optionalBookRef(),
  startedAt: field.optionalTimestamp(),
  /** Set while paused. */
  pausedAt: field.optionalTimestamp(),
  /** Paused time before the current pause, in milliseconds. */
  pausedMs: field.optionalNumber(0, 1e10),
  /** Which device started it, for "running on another device". */
  deviceId: field.optionalText(64),
  deviceName: field.optionalText(80),
  targetMinutes: field.optionalInteger(1, 600),
  /** Where the reader started, in the book's unit. */
  startPosition: field.optionalNumber(0, 100_000),
});
export type Timer = RowOf<typeof timers>;

export const CHALLENGE_KINDS = ['count', 'alphabet', 'weekly', 'prompts'] as const;
export const ALPHABET_BY = ['title', 'author-surname'] as const;

/** A short checklist item (a reading goal that is not a number, a prompt with its book); built on first use, as every field's validator. */
const checklist = () =>
  z
    .array(
      z.object({
        id: z.string().check(z.minLength(1), z.maxLength(36)),
        text: z.string().check(z.maxLength(300, 'each entry must be at most 300 characters')),
        done: z.optional(z.boolean()),
        bookId: z.optional(z.nullable(z.uuid())),
      }),
    )
    .check(z.maxLength(100, 'must have at most 100 entries'));

/** The reader's plan for a year. Row id `deterministicId('year-plan', 'YYYY')`: one per year. */
export const yearPlans = defineCollection('yearPlans', {
  year: field.optionalInteger(1900, 3000),
  booksTarget: field.optionalInteger(1, 10_000),
  pagesTarget: field.optionalInteger(1, 10_000_000),
  minutesTarget: field.optionalInteger(1, 1_000_000),
  bestBookId: field.optionalBookRef(),
  /** Goals that are not numbers ("read a book in French"), as a checklist. */
  otherGoals: field.json(() => z.nullable(checklist()), 'entries'),
  notes: field.optionalText(20_000),
});
export type YearPlan = RowOf<typeof yearPlans>;

/** The reader's plan and look back for a month. Row id `deterministicId('month-plan', 'YYYY-MM')`. */
export const monthPlans = defineCollection('monthPlans', {
  month: field.optionalMonth(),
  booksTarget: field.optionalInteger(1, 1_000),
  pagesTarget: field.optionalInteger(1, 1_000_000),
  minutesTarget: field.optionalInteger(1, 50_000),
  favouriteBookId: field.optionalBookRef(),
  leastFavouriteBookId: field.optionalBookRef(),
  reflection: field.optionalText(20_000),
});
export type MonthPlan = RowOf<typeof monthPlans>;

/** A reading challenge of one of the kinds readers play. */
export const challenges = defineCollection('challenges', {
  name: field.text(200),
  kind: field.choice(CHALLENGE_KINDS),
  periodStart: field.optionalDate(),
  periodEnd: field.optionalDate(),
  /** Count: books to read. */
  target: field.optionalInteger(1, 10_000),
  /** Alphabet: a letter per title, or per author surname. */
  alphabetBy: field.optionalChoice(ALPHABET_BY),
  /** Prompts: the reader's own list, each with the book that answers it. */
  prompts: field.json(() => z.nullable(checklist()), 'entries'),
  /** When the finish was celebrated, so the celebration shows once. */
  celebratedAt: field.optionalTimestamp(),
});
export type Challenge = RowOf<typeof challenges>;

/** What a loan row records: a library loan, a hold, a book lent to a friend, or one borrowed from one. */
export const LOAN_KINDS = ['library', 'hold', 'lentOut', 'borrowed'] as const;
/** How a hold ended. A collected hold is followed by a library loan row of its own. */
export const HOLD_OUTCOMES = ['collected', 'cancelled', 'expired'] as const;

/**
 * A library the reader borrows from. `cardNumber` stays on the reader's devices and the server:
 * it never goes into a mail or the calendar feed (those show `name` at most).
 */
export const libraries = defineCollection('libraries', {
  name: field.text(120),
  /** How the reader tells their cards apart ("blue card"), instead of the number. */
  cardLabel: field.optionalText(60),
  cardNumber: field.optionalText(40),
  /** The library's usual loan period and renewals, to prefill a new loan. */
  loanDays: field.optionalInteger(1, 365),
  renewalsAllowed: field.optionalInteger(0, 99),
});
export type Library = RowOf<typeof libraries>;

/**
 * One loan, hold or lending of a book (`kind`). Dates are the reader's local calendar days.
 * `startedOn` is borrowed / placed / lent on; `dueOn` is due (a library loan), or expected back
 * (lent out, borrowed from a friend).
 */
export const loans = defineCollection(
  'loans',
  {
    kind: field.choice(LOAN_KINDS),
    bookId: field.optionalBookRef(),
    libraryId: field.optionalRef(),
    /** The friend, as the reader names them (lent out, borrowed). */
    friendName: field.optionalText(120),
    startedOn: field.optionalDate(),
    dueOn: field.optionalDate(),
    renewalsUsed: field.optionalInteger(0, 99),
    renewalsAllowed: field.optionalInteger(0, 99),
    returnedOn: field.optionalDate(),
    /** A hold: place in the queue, when it became ready, the last day to pick it up. */
    queuePosition: field.optionalInteger(1, 100_000),
    readyOn: field.optionalDate(),
    pickUpBy: field.optionalDate(),
    holdOutcome: field.optionalChoice(HOLD_OUTCOMES),
    /** The day a hold was collected, cancelled or expired. */
    closedOn: field.optionalDate(),
  },
  { indexes: ['bookId', 'kind'] },
);
export type Loan = RowOf<typeof loans>;

/**
 * The reader's choice of loan reminders by e-mail: one row, id
 * `deterministicId('loan-reminders', 'settings')`. Off until the reader turns it on.
 * `timeZone` is the reader's IANA zone, so the server knows which day it is for them.
 */
export const loanReminders = defineCollection('loanReminders', {
  email: field.optionalBoolean(),
  daysBefore: field.optionalInteger(0, 30),
  holdReady: field.optionalBoolean(),
  lentOverdue: field.optionalBoolean(),
  digest: field.optionalBoolean(),
  timeZone: field.optionalText(64),
  /** When the reader last turned mails on; an unsubscribe link used after it stops them. */
  emailSince: field.optionalTimestamp(),
});
export type LoanReminders = RowOf<typeof loanReminders>;

/** Lamplight's own colour themes; none (or 'system') follows the device's light or dark. */
export const THEMES = ['system', 'lamplight', 'moss', 'harbour'] as const;
export type Theme = (typeof THEMES)[number];

/**
 * The reader's settings that follow them to every device. One row per reader, id
 * `deterministicId('reader-settings', 'current')`.
 */
export const readerSettings = defineCollection('readerSettings', {
  /** The locale dates are written in ('en-GB', 'de'); none: the browser's. */
  dateLocale: field.optionalLanguage(),
  theme: field.optionalChoice(THEMES),
});
export type ReaderSettings = RowOf<typeof readerSettings>;

/** Every synced collection, by name: the one source of truth for Dexie, zod and TypeORM. */
export const COLLECTIONS = {
  books,
  bookStatusChanges,
  readings,
  series,
  quotes,
  notebooks,
  notebookPages,
  pageTemplates,
  favourites,
  monthPicks,
  labels,
  sessions,
  timers,
  yearPlans,
  monthPlans,
  challenges,
  libraries,
  loans,
  loanReminders,
  readerSettings,
} as const;
export type CollectionName = keyof typeof COLLECTIONS;

export function collectionSpec(name: string) {
  return Object.hasOwn(COLLECTIONS, name) ? COLLECTIONS[name as CollectionName] : undefined;
}

/** The spec of one field of a collection, or `undefined` (own properties only: `__proto__` is no field). */
export function fieldSpecOf(collection: string, field: string): FieldSpec | undefined {
  const fields: Readonly<Record<string, FieldSpec>> | undefined = collectionSpec(collection)?.fields;
  return fields && Object.hasOwn(fields, field) ? fields[field] : undefined;
}

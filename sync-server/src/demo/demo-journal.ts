import { STARTER_LABELS } from '../../../shared/journal/starter-labels';
import { deterministicId } from '../../../shared/sync/deterministic-id';
import type { DemoBook } from './demo-books';

/** Writes one synced row (the seed's `write`): all fields under one clock. */
export type Write = (collection: { readonly name: string }, fields: Record<string, unknown>, rowId?: string) => string;

const HOUR = 3600_000;

/** A small repeatable random source (an LCG), so the demo journal is the same on every run. */
function random(seedText: string): () => number {
  let state = [...seedText].reduce((sum, char) => (sum * 31 + char.charCodeAt(0)) % 2 ** 31, 7);
  return () => (state = (state * 1103515245 + 12345) % 2 ** 31) / 2 ** 31;
}

const at = (text: string) => Date.parse(`${text.replace(' ', 'T')}:00.000Z`);
const iso = (ms: number) => new Date(ms).toISOString();

/** How long a book is in its own unit: pages, percent (ebooks), or listening minutes. */
function lengthOf(book: DemoBook): number {
  if (book.format === 'ebook') return 100;
  if (book.format === 'audiobook') return book.audioMinutes ?? 600;
  return book.pageCount ?? 300;
}

/**
 * Reading sessions for the demo: for every stretch a book was being read (from 'reading' to the
 * next change, or to `now`), an evening session every day or two, 20–70 minutes, moving through
 * the book steadily. Evenings only, one session a day at most, so sessions never overlap.
 */
export function demoSessions(book: DemoBook, bookId: string, now: number): Record<string, unknown>[] {
  const rand = random(book.title);
  const length = lengthOf(book);
  const sessions: Record<string, unknown>[] = [];
  const stretches: [number, number, number][] = [];
  let position = 0;
  book.history.forEach(([status, when], n) => {
    if (status !== 'reading') return;
    const next = book.history[n + 1];
    const end = next ? at(next[1]) : now - HOUR;
    const goal = next?.[0] === 'finished' ? length : Math.round(length * (0.3 + rand() * 0.4));
    if (next?.[0] === 'finished' || !next) position = n > 0 && book.history[n - 1]?.[0] === 'paused' ? position : 0;
    stretches.push([at(when), end, goal]);
  });
  for (const [start, end, goal] of stretches) {
    const days = Math.max(1, Math.floor((end - start) / (24 * HOUR)));
    const step = Math.max(1, Math.round(days / Math.max(1, Math.min(days, 14))));
    const evenings: number[] = [];
    for (let day = 0; day < days; day += step + (rand() < 0.3 ? 1 : 0)) {
      const evening = Math.floor((start + day * 24 * HOUR) / (24 * HOUR)) * 24 * HOUR + (19 + Math.floor(rand() * 3)) * HOUR;
      if (evening > start && evening + 2 * HOUR < end) evenings.push(evening);
    }
    const from = position;
    evenings.forEach((evening, i) => {
      const minutes = 20 + Math.floor(rand() * 50);
      const to = Math.round(from + ((goal - from) * (i + 1)) / evenings.length);
      sessions.push({
        bookId,
        format: book.format,
        startedAt: iso(evening),
        endedAt: iso(evening + minutes * 60_000 + 5 * 60_000),
        activeMinutes: minutes,
        fromPosition: position,
        toPosition: Math.max(position, to),
        ebookLocation: null,
        playbackSpeed: book.format === 'audiobook' ? 1.25 : null,
        mood: (['absorbed', 'calm', 'sleepy', 'moved', null] as const)[Math.floor(rand() * 5)] ?? null,
        note: null,
        source: 'timer',
        deleted: false,
      });
      position = Math.max(position, to);
    });
  }
  return sessions;
}

/**
 * One can read one thing at a time: two books read in the same weeks may not share an evening.
 * Keeps the earlier of two overlapping sessions, then lets each book's next session start where
 * its last kept one ended.
 */
function withoutOverlaps(all: Record<string, unknown>[]): Record<string, unknown>[] {
  const sorted = [...all].sort((a, b) => String(a['startedAt']).localeCompare(String(b['startedAt'])));
  const kept: Record<string, unknown>[] = [];
  let busyUntil = '';
  for (const session of sorted) {
    if (String(session['startedAt']) < busyUntil) continue;
    kept.push(session);
    busyUntil = String(session['endedAt']);
  }
  const reached = new Map<unknown, number>();
  for (const session of kept) {
    // A session from position 0 starts a (re-)reading afresh.
    const own = session['fromPosition'] as number;
    const from = own === 0 ? 0 : (reached.get(session['bookId']) ?? own);
    const to = Math.max(from, session['toPosition'] as number);
    Object.assign(session, { fromPosition: from, toPosition: to });
    reached.set(session['bookId'], to);
  }
  return kept;
}

/** Invented passages for a few demo books, keyed by title. */
const DEMO_QUOTES: Record<string, readonly { text: string; page?: number; chapter?: string; favourite?: boolean }[]> = {
  'The Bell Under Ashwater Marsh': [
    {
      text: 'The marsh kept its bells the way old people keep their letters: unopened, and never thrown away.',
      page: 41,
      chapter: 'The Drowned Tower',
      favourite: true,
    },
    { text: 'Nobody rings a bell for the tide. The tide comes anyway, and the bell answers.', page: 212 },
  ],
  'A Ledger of Ashwater Salt': [{ text: 'Every debt in Ashwater was paid in salt, and salt remembers.', page: 88 }],
};

/** Quotes, labels on books, a notebook, a year plan, picks and challenges for the demo reader. */
export function seedDemoJournal(write: Write, seeded: readonly { id: string; book: DemoBook }[], now: number): { sessions: number; quotes: number } {
  let quoteCount = 0;
  const sessions = withoutOverlaps(seeded.flatMap(({ id, book }) => demoSessions(book, id, now)));
  for (const session of sessions) write({ name: 'sessions' }, session);
  for (const { id, book } of seeded) {
    for (const quote of DEMO_QUOTES[book.title] ?? []) {
      write(
        { name: 'quotes' },
        {
          bookId: id,
          text: quote.text,
          page: quote.page ?? null,
          ebookLocation: null,
          audioSeconds: null,
          chapter: quote.chapter ?? null,
          note: null,
          tags: [],
          labelIds: [],
          favourite: quote.favourite ?? false,
          capturedAt: iso(now - 30 * 24 * HOUR),
          deleted: false,
        },
      );
      quoteCount++;
    }
  }

  const byTitle = new Map(seeded.map((entry) => [entry.book.title, entry.id]));
  const first = (title: string) => byTitle.get(title) ?? null;
  const notebook = write({ name: 'notebooks' }, { title: 'Ashwater, read again', bookId: first('The Bell Under Ashwater Marsh'), deleted: false });
  write(
    { name: 'notebookPages' },
    {
      notebookId: notebook,
      title: 'What I missed the first time',
      body: '# The bells\n- The bell is rung only **once** in the whole book.\n- [x] Find the map of the tower\n- [ ] Ask Oren about the ending\n\n> The tide comes anyway.',
      position: 0,
      deleted: false,
    },
  );

  const year = new Date(now).getUTCFullYear();
  write(
    { name: 'yearPlans' },
    {
      year,
      booksTarget: 24,
      pagesTarget: 8000,
      minutesTarget: 6000,
      bestBookId: first('The Bell Under Ashwater Marsh'),
      otherGoals: [
        { id: 'g1', text: 'Read a book in another language', done: true },
        { id: 'g2', text: 'Finish a series I started', done: false },
      ],
      notes: null,
      deleted: false,
    },
    deterministicId('year-plan', String(year)),
  );
  write(
    { name: 'challenges' },
    {
      name: `${year}: twenty-five books`,
      kind: 'count',
      periodStart: `${year}-01-01`,
      periodEnd: `${year}-12-31`,
      target: 25,
      alphabetBy: null,
      prompts: null,
      celebratedAt: null,
      deleted: false,
    },
  );
  write(
    { name: 'challenges' },
    {
      name: 'A to Z by title',
      kind: 'alphabet',
      periodStart: `${year}-01-01`,
      periodEnd: `${year}-12-31`,
      target: 26,
      alphabetBy: 'title',
      prompts: null,
      celebratedAt: null,
      deleted: false,
    },
  );

  // Labels of the starter set on a few books.
  const [fiveStars, reRead] = STARTER_LABELS;
  for (const { id, book } of seeded) {
    const labels = [
      ...((book.reviews ?? []).some((review) => review.rating === 5) ? [fiveStars!.id] : []),
      ...(book.history.filter(([status]) => status === 'finished').length > 1 ? [reRead!.id] : []),
    ];
    if (labels.length > 0) write({ name: 'books' }, { labelIds: labels }, id);
  }
  return { sessions: sessions.length, quotes: quoteCount };
}

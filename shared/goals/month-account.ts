import { tz } from '@date-fns/tz';
import { differenceInCalendarDays, getDaysInMonth } from 'date-fns';

import { localDay } from '../calendar/local-day';
import { parseCalendarDay } from '../calendar/parse-calendar-day';

/** What the month's account reads: sessions, status changes, readings and quotes (synced rows fit). */
export interface MonthAccountInput {
  /** 'YYYY-MM'. */
  readonly month: string;
  /** The reader's local date, 'YYYY-MM-DD'. */
  readonly today: string;
  readonly timeZone: string;
  readonly sessions: readonly { readonly startedAt?: string | null; readonly activeMinutes?: number | null }[];
  readonly statusChanges: readonly { readonly bookId?: string | null; readonly status?: string | null; readonly changedAt?: string | null }[];
  readonly readings: readonly { readonly bookId?: string | null; readonly startedOn?: string | null }[];
  readonly quotes: readonly { readonly capturedAt?: string | null }[];
}

/** A month as only Lamplight can tell it: from the sessions, status changes and quotes of the journal. */
export interface MonthAccount {
  readonly sessions: number;
  readonly minutes: number;
  readonly readingDays: number;
  /** Book ids, in the order they happened (each once). */
  readonly started: readonly string[];
  readonly abandoned: readonly string[];
  readonly quotes: number;
  /** The share of the month gone before today (0 for a month to come, 1 for one past): where an even pace stands. */
  readonly evenShare: number;
}

/**
 * The month's sessions, minutes and days read, the books started (a reading's start day or a
 * move to "reading") and abandoned (a move to DNF), the quotes kept, all on the reader's local
 * days, and how much of the month is gone.
 *
 * @example
 * monthAccount({ month: '2026-03', today: '2026-03-16', timeZone: 'Europe/Oslo', sessions, statusChanges: [], readings: [], quotes: [] }).evenShare
 * // 15 / 31
 */
export function monthAccount(input: MonthAccountInput): MonthAccount {
  const { month, timeZone } = input;
  const inMonth = (instant: string | null | undefined): instant is string => !!instant && localDay(instant, timeZone).startsWith(`${month}-`);
  const sessions = input.sessions.filter((session) => inMonth(session.startedAt));
  const changes = input.statusChanges.filter((change) => change.bookId && inMonth(change.changedAt)).sort((a, b) => (a.changedAt! < b.changedAt! ? -1 : 1));
  const started = [
    ...input.readings
      .filter((reading) => reading.bookId && reading.startedOn?.startsWith(`${month}-`))
      .map((reading) => ({ bookId: reading.bookId!, at: reading.startedOn! })),
    ...changes.filter((change) => change.status === 'reading').map((change) => ({ bookId: change.bookId!, at: localDay(change.changedAt!, timeZone) })),
  ].sort((a, b) => (a.at < b.at ? -1 : a.at > b.at ? 1 : 0));

  const first = parseCalendarDay(`${month}-01`);
  const days = getDaysInMonth(first, { in: tz('UTC') });
  const gone = differenceInCalendarDays(parseCalendarDay(input.today), first, { in: tz('UTC') });
  return {
    sessions: sessions.length,
    minutes: sessions.reduce((sum, session) => sum + (session.activeMinutes ?? 0), 0),
    readingDays: new Set(sessions.map((session) => localDay(session.startedAt!, timeZone))).size,
    started: unique(started.map((entry) => entry.bookId)),
    abandoned: unique(changes.filter((change) => change.status === 'dnf').map((change) => change.bookId!)),
    quotes: input.quotes.filter((quote) => inMonth(quote.capturedAt)).length,
    evenShare: Math.min(Math.max(gone, 0), days) / days,
  };
}

function unique(ids: readonly string[]): string[] {
  return [...new Set(ids)];
}

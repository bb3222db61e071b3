import type { Library, Loan } from '../../../shared/sync/schema/collections';
import type { DemoBook } from './demo-books';
import type { Write } from './demo-journal';

/** The demo's invented library, friend and the books they concern. */
export const DEMO_LIBRARY = { name: 'Fernwick Reading Rooms', cardLabel: 'green card', loanDays: 21, renewalsAllowed: 2 } as const;
export const DEMO_FRIEND = 'Maren Tollis';
export const DEMO_LOAN_TITLES = {
  dueSoon: 'Rooftop Gardens of an Imaginary City',
  holdReady: 'Inspector Halloran Takes the Night Ferry',
  lentOut: "The Glassblower's Almanac",
} as const;

const DAY = 86_400_000;

/**
 * The demo reader's loans, relative to the day of seeding (UTC), so Today and the Loans screen
 * have something to say at once: a library loan due in two days (one renewal used of two), a hold
 * ready since yesterday with five days to pick it up, and a book lent to an invented friend,
 * expected back in two weeks. The library has a card label and no card number.
 */
export function seedDemoLoans(write: Write, seeded: readonly { id: string; book: DemoBook }[], now: number): { libraries: number; loans: number } {
  const day = (offset: number) => new Date(now + offset * DAY).toISOString().slice(0, 10);
  const bookId = (title: string) => {
    const found = seeded.find((entry) => entry.book.title === title);
    if (!found) throw new Error(`demo loans: no demo book titled ${title}`);
    return found.id;
  };
  const libraryId = write({ name: 'libraries' }, { ...DEMO_LIBRARY, cardNumber: null, deleted: false } satisfies Omit<Required<Library>, 'id'>);
  const blank: Omit<Required<Loan>, 'id' | 'kind' | 'bookId'> = {
    libraryId: null,
    friendName: null,
    startedOn: null,
    dueOn: null,
    renewalsUsed: null,
    renewalsAllowed: null,
    returnedOn: null,
    queuePosition: null,
    readyOn: null,
    pickUpBy: null,
    holdOutcome: null,
    closedOn: null,
    deleted: false,
  };
  // Every field, nulls included, so devices get whole rows.
  const loan = (fields: Pick<Loan, 'kind' | 'bookId'> & Partial<Loan>) => write({ name: 'loans' }, { ...blank, ...fields });
  loan({ kind: 'library', bookId: bookId(DEMO_LOAN_TITLES.dueSoon), libraryId, startedOn: day(-40), dueOn: day(2), renewalsUsed: 1, renewalsAllowed: 2 });
  loan({ kind: 'hold', bookId: bookId(DEMO_LOAN_TITLES.holdReady), libraryId, startedOn: day(-24), queuePosition: 1, readyOn: day(-1), pickUpBy: day(5) });
  loan({ kind: 'lentOut', bookId: bookId(DEMO_LOAN_TITLES.lentOut), friendName: DEMO_FRIEND, startedOn: day(-9), dueOn: day(14) });
  return { libraries: 1, loans: 3 };
}

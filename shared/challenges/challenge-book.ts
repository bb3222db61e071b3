/** The little a challenge needs to know about a book in the reader's library. */
export interface ChallengeBook {
  readonly id: string;
  readonly title: string;
  /** As written on the book, first author first, e.g. ['Ada Okafor']. */
  readonly authors: readonly string[];
  /** Only 'finished' books count toward challenges ('to-read', 'reading', … do not). */
  readonly status: string;
  /** The reader's local date the book was finished, 'YYYY-MM-DD'. */
  readonly finishedOn?: string;
}

/** The dates a challenge runs, both included, as 'YYYY-MM-DD'. */
export interface ChallengePeriod {
  readonly start: string;
  readonly end: string;
}

/** What every challenge reports, whatever its kind. */
export interface ChallengeStatus {
  readonly period: ChallengePeriod;
  /** How much of the challenge is done: books, letters, weeks or prompts. */
  readonly done: number;
  readonly target: number;
  /** Ids of the books that counted. One book may count in several challenges. */
  readonly counted: readonly string[];
  readonly finished: boolean;
}

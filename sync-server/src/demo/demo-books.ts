import type { BOOK_COPIES, BOOK_FORMATS, BOOK_STATUSES, RECOMMEND_ANSWERS } from '../../../shared/sync/schema/collections';
import type { CoverStyle } from './demo-cover';
import demoBooks from './demo-books.json';

/** What the reader wrote when a reading ended (finished or given up). */
export interface DemoReview {
  readonly rating?: number;
  readonly summary: string;
  readonly review?: string;
  readonly takeaways?: string;
  readonly recommend: (typeof RECOMMEND_ANSWERS)[number];
  readonly recommendTo?: string;
}

/** One book of the demo library, as written here; `seedDemoLibrary` turns it into synced rows. */
export interface DemoBook {
  readonly title: string;
  readonly subtitle?: string;
  readonly authors: readonly string[];
  readonly format: (typeof BOOK_FORMATS)[number];
  readonly pageCount?: number;
  readonly audioMinutes?: number;
  /** The first 12 digits of the ISBN-13, hyphens allowed; the seed computes the check digit. */
  readonly isbnBody?: string;
  readonly publisher?: string;
  readonly year: number;
  readonly language: string;
  readonly genres: readonly string[];
  readonly tags: readonly string[];
  readonly copy: (typeof BOOK_COPIES)[number];
  /** The style of its generated cover; books without one have no cover. */
  readonly cover?: CoverStyle;
  /**
   * Status changes, oldest first, at 'YYYY-MM-DD HH:MM' UTC; the last is the book's status.
   * Readings follow from them: one starts at 'reading' (unless resuming from 'paused') and ends
   * at 'finished' or 'dnf'.
   */
  readonly history: readonly (readonly [(typeof BOOK_STATUSES)[number], string])[];
  /** One per reading that ended, in order. */
  readonly reviews?: readonly DemoReview[];
  /** Its series (by name, planned number of books) and place in it. */
  readonly series?: { readonly name: string; readonly planned: number; readonly position: number };
}

/**
 * Wren Ashdown's library, kept as data in demo-books.json (the demo-library spec checks every
 * book against the shared schema). Every title, author, publisher and review is invented for
 * Lamplight's demo; none is a real book or person. ISBN bodies use registration groups 978/979 with
 * registrant numbers inside the ranges of the ISBN agency's range table (as isbn3 carries it),
 * and check digits computed by shared/isbn; as with any made-up ISBN, a number may by chance
 * also be some real edition's, so nothing should ever look them up.
 */
// JSON has no tuple or literal types; the seed writes every book through the shared validators.
export const DEMO_BOOKS = demoBooks as unknown as readonly DemoBook[];

import { Pace } from './pace';
import { ASSUMED_BOOK_WORDS, SILENT_READING_WPM, WORDS_PER_PAGE } from './reading-rates';

/** Brysbaert (2019) gives separate silent reading rates for fiction and non-fiction. */
export type Genre = 'fiction' | 'nonfiction';

/** What `fallbackPace` may know about the book, by format. */
export type FallbackPaceInput =
  | { readonly format: 'print'; readonly genre?: Genre; readonly wordsPerPage?: number }
  | {
      readonly format: 'ebook';
      readonly genre?: Genre;
      /** Print page count of the edition, when the catalogue knows it. */
      readonly pageCount?: number;
      readonly wordsPerPage?: number;
      /** Words in the book, when the store says; wins over pageCount. */
      readonly wordCount?: number;
    }
  | { readonly format: 'audiobook'; readonly playbackSpeed?: number };

/**
 * A typical pace for a reader without enough history for `personalPace`.
 *
 * Print: the Brysbaert (2019) silent reading rate (238 wpm non-fiction, 260 fiction; non-fiction
 * when the genre is unknown, as the lower and headline figure) over `wordsPerPage` (default
 * 275, common practice). Ebook: the same words per minute over the book's words (wordCount, or
 * pageCount × wordsPerPage, or else the assumed 90,000 words) as percent per hour. Audiobook:
 * the playback speed, since at 1× one listened minute takes one real minute.
 *
 * @example
 * fallbackPace({ format: 'print', genre: 'fiction' })      // rate 56.72… pages/hour (260 × 60 / 275)
 * fallbackPace({ format: 'ebook', pageCount: 300 })        // rate 17.30… percent/hour
 * fallbackPace({ format: 'audiobook', playbackSpeed: 1.5 }) // rate 1.5 listened min per minute
 */
export function fallbackPace(input: FallbackPaceInput): Pace {
  if (input.format === 'audiobook') {
    return { format: 'audiobook', rate: positive(input.playbackSpeed ?? 1, 'playbackSpeed') };
  }
  const wordsPerHour = SILENT_READING_WPM[input.genre ?? 'nonfiction'] * 60;
  const wordsPerPage = positive(input.wordsPerPage ?? WORDS_PER_PAGE.typical, 'wordsPerPage');
  if (input.format === 'print') return { format: 'print', rate: wordsPerHour / wordsPerPage };

  const bookWords =
    input.wordCount !== undefined
      ? positive(input.wordCount, 'wordCount')
      : input.pageCount !== undefined
        ? positive(input.pageCount, 'pageCount') * wordsPerPage
        : ASSUMED_BOOK_WORDS;
  return { format: 'ebook', rate: (wordsPerHour / bookWords) * 100 };
}

function positive(value: number, name: string): number {
  if (!(value > 0) || !Number.isFinite(value)) throw new RangeError(`${name} must be a positive number, not ${value}`);
  return value;
}

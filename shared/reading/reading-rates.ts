/**
 * Average adult silent reading rates in English, words per minute: 238 for non-fiction and 260
 * for fiction (Brysbaert 2019, "How many words do we read per minute? A review and
 * meta-analysis of reading rate", Journal of Memory and Language 109, 104047). Most adults
 * fall within 175–300 (non-fiction) and 200–320 (fiction), same source.
 */
export const SILENT_READING_WPM = { nonfiction: 238, fiction: 260 } as const;

/**
 * Words on a printed page of a typical trade book: 275 by default, usually 250–300 (common
 * practice, not a measured figure).
 */
export const WORDS_PER_PAGE = { typical: 275, min: 250, max: 300 } as const;

/**
 * Length assumed for an ebook whose size we do not know: 90,000 words, the middle of the
 * 80,000–100,000 words often quoted for an adult novel (common practice, from memory). About
 * 327 pages at 275 words a page.
 */
export const ASSUMED_BOOK_WORDS = 90_000;

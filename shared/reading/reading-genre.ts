import { Genre } from './fallback-pace';

// Words readers and shops shelve by (our own list, common practice; not from a standard). A
// term is matched as whole words, case aside: "Fantasy", "historical fiction", "Memoir".
const NONFICTION =
  /\b(non-?fiction|memoirs?|biography|autobiography|history|essays?|philosophy|self-help|true crime|travel|cookbooks?|cooking|politics|economics|psychology|science|nature writing|journalism|reference)\b/;
const FICTION =
  /\b(fiction|novels?|novellas?|fantasy|mystery|mysteries|thrillers?|romance|horror|sci-fi|short stories|crime|literary|dystopian|adventure|fairy tales?)\b/;

/**
 * Whether a book reads as fiction or non-fiction, from the reader's genres, for the reading
 * rates of Brysbaert (2019). The first genre that tells decides (the reader's first genre is
 * the main one); "science fiction" and "historical fiction" are fiction, "non-fiction" is not.
 * Undefined when no genre tells (poetry, plays, or none at all).
 *
 * @example
 * readingGenre(['Sea stories', 'Fantasy']) // 'fiction'
 * readingGenre(['Memoir'])                 // 'nonfiction'
 * readingGenre(['Poetry'])                 // undefined
 */
export function readingGenre(genres: readonly string[] | null | undefined): Genre | undefined {
  for (const raw of genres ?? []) {
    const genre = raw.toLocaleLowerCase('en');
    if (/\bnon-?fiction\b/.test(genre)) return 'nonfiction';
    if (/\bfiction\b/.test(genre)) return 'fiction';
    if (NONFICTION.test(genre)) return 'nonfiction';
    if (FICTION.test(genre)) return 'fiction';
  }
  return undefined;
}

import type { LooseBookRow } from '../books/book-row';

/** What two books must share to look like the same book. */
export type BookIdentity = Pick<LooseBookRow, 'title' | 'authors' | 'isbn'>;

/** Lower case, accents and punctuation gone, one space between words (Unicode NFKD, then combining marks dropped). */
function fold(text: string): string {
  return text
    .normalize('NFKD')
    .replace(/\p{M}/gu, '')
    .toLowerCase()
    .replace(/&/g, ' and ')
    .replace(/[^\p{L}\p{N}]+/gu, ' ')
    .trim();
}

/** A title to compare: folded, without a leading "The", "A" or "An". */
export function normaliseTitle(title: string): string {
  return fold(title).replace(/^(the|a|an) /, '');
}

/** An author to compare: folded, "Surname, Given" read as "Given Surname". */
export function normaliseAuthor(name: string): string {
  const [surname, given, ...rest] = name.split(',');
  return fold(given !== undefined && rest.length === 0 ? `${given} ${surname}` : name);
}

/**
 * The keys under which a book may meet its duplicate: its ISBN-13, and its normalised title with
 * its first author. Two books sharing any key are duplicates.
 */
export function bookKeys(book: BookIdentity): string[] {
  const keys: string[] = [];
  if (book.isbn) keys.push(`isbn:${book.isbn}`);
  const title = book.title ? normaliseTitle(book.title) : '';
  const author = book.authors?.[0] ? normaliseAuthor(book.authors[0]) : '';
  if (title) keys.push(`title:${title}|${author}`);
  return keys;
}

/**
 * Groups of books that look like the same book (each group two or more, joined through any
 * shared key), in the order their first book appears. `keysOf` may hand back keys worked out
 * earlier (the Library keeps them per row), so a large library is not normalised again.
 */
export function findDuplicates<B extends BookIdentity & { readonly id: string }>(books: readonly B[], keysOf: (book: B) => readonly string[] = bookKeys): B[][] {
  const parent = books.map((_, index) => index);
  const root = (i: number): number => (parent[i] === i ? i : (parent[i] = root(parent[i]!)));
  const firstWithKey = new Map<string, number>();
  books.forEach((book, index) => {
    for (const key of keysOf(book)) {
      const seen = firstWithKey.get(key);
      if (seen === undefined) firstWithKey.set(key, index);
      else parent[root(index)] = root(seen);
    }
  });
  const groups = new Map<number, B[]>();
  books.forEach((book, index) => {
    const group = groups.get(root(index));
    if (group) group.push(book);
    else groups.set(root(index), [book]);
  });
  return [...groups.values()].filter((group) => group.length > 1);
}

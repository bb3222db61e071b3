/**
 * The fields a spreadsheet's columns can fill, and guesses from header names. The guesses are
 * plain English words any spreadsheet might use, never another product's column layout.
 */
export const CSV_TARGETS = [
  'title',
  'authors',
  'isbn',
  'status',
  'rating',
  'startedOn',
  'finishedOn',
  'pages',
  'format',
  'tags',
  'shelves',
  'review',
  'publisher',
  'year',
] as const;
export type CsvTarget = (typeof CSV_TARGETS)[number];

/** What the reader sees for each field. */
export const CSV_TARGET_LABELS: Readonly<Record<CsvTarget, string>> = {
  title: 'Title',
  authors: 'Authors',
  isbn: 'ISBN',
  status: 'Status',
  rating: 'Rating',
  startedOn: 'Date started',
  finishedOn: 'Date finished',
  pages: 'Pages',
  format: 'Format',
  tags: 'Tags',
  shelves: 'Shelves (become tags)',
  review: 'Review',
  publisher: 'Publisher',
  year: 'Year published',
};

/** Header words (lower case, letters and digits only) that suggest each field. */
const HEADER_WORDS: readonly (readonly [CsvTarget, readonly string[]])[] = [
  ['isbn', ['isbn', 'isbn13', 'isbn10', 'ean']],
  ['title', ['title', 'booktitle', 'name', 'book']],
  ['authors', ['author', 'authors', 'writer', 'writers', 'by', 'creator']],
  ['status', ['status', 'state', 'readingstatus', 'progress']],
  ['rating', ['rating', 'stars', 'score', 'rated']],
  ['startedOn', ['started', 'start', 'startdate', 'datestarted', 'startedon', 'begun']],
  ['finishedOn', ['finished', 'finish', 'finishdate', 'datefinished', 'finishedon', 'dateread', 'read', 'completed', 'enddate']],
  ['pages', ['pages', 'pagecount', 'numberofpages', 'length']],
  ['format', ['format', 'binding', 'medium', 'type']],
  ['shelves', ['shelves', 'shelf', 'lists', 'collections']],
  ['tags', ['tags', 'tag', 'labels', 'keywords', 'genres', 'genre']],
  ['review', ['review', 'notes', 'note', 'comments', 'comment', 'thoughts']],
  ['publisher', ['publisher', 'publishedby', 'imprint']],
  ['year', ['year', 'published', 'yearpublished', 'publicationyear', 'pubyear']],
];

const simplify = (header: string) => header.toLowerCase().replace(/[^a-z0-9]/g, '');

/**
 * The field a column probably fills, from its header ("Date finished" → finishedOn), or null.
 * Each field is guessed for one column at most: the first that matches.
 */
export function guessMapping(headers: readonly string[]): (CsvTarget | null)[] {
  const taken = new Set<CsvTarget>();
  return headers.map((header) => {
    const simple = simplify(header);
    const match =
      HEADER_WORDS.find(([target, words]) => !taken.has(target) && words.includes(simple)) ??
      HEADER_WORDS.find(([target, words]) => !taken.has(target) && words.some((word) => word.length > 3 && simple.includes(word)));
    if (!match) return null;
    taken.add(match[0]);
    return match[0];
  });
}

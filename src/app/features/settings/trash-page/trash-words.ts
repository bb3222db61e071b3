import type { TrashEntry, TrashKind, TrashRow } from '@shared/trash/trash-entries';

/** Trash's group headings, one per kind. */
export const TRASH_HEADINGS: Record<TrashKind, string> = {
  books: 'Books',
  series: 'Series',
  readings: 'Readings',
  sessions: 'Sessions',
  quotes: 'Quotes',
  notebooks: 'Notebooks',
  notebookPages: 'Pages',
  pageTemplates: 'Page templates',
  labels: 'Labels',
  challenges: 'Challenges',
  monthPicks: 'Picks of the month',
  favourites: 'Favourites',
};

const text = (value: unknown): string => (typeof value === 'string' ? value : '');
const clipped = (value: string, max = 80) => (value.length > max ? `${value.slice(0, max - 1)}…` : value);

/** A line naming a deleted thing; `bookTitle` finds the title of a book it belongs to. */
export function trashTitle(entry: TrashEntry, bookTitle: (id: unknown) => string): string {
  const row: TrashRow = entry.row;
  switch (entry.collection) {
    case 'books':
      return text(row['title']) || 'Untitled book';
    case 'series':
    case 'pageTemplates':
    case 'labels':
    case 'challenges':
      return text(row['name']) || 'Unnamed';
    case 'readings':
      return `A reading of ${bookTitle(row['bookId'])}`;
    case 'sessions':
      return `A session of ${bookTitle(row['bookId'])}${text(row['startedAt']) ? ` on ${text(row['startedAt']).slice(0, 10)}` : ''}`;
    case 'quotes':
      return `“${clipped(text(row['text']))}”`;
    case 'notebooks':
    case 'notebookPages':
      return text(row['title']) || 'Untitled';
    case 'monthPicks':
      return `Pick of ${text(row['month']) || 'a month'}`;
    case 'favourites':
      return row['kind'] === 'author' ? text(row['authorName']) || 'An author' : `A favourite ${text(row['kind']) || 'item'}`;
  }
}

import type { Book } from '@shared/sync/schema/collections';

/** Words readers see for each format and status. TBR and DNF are readers' own terms. */
export const FORMAT_LABELS: Record<NonNullable<Book['format']>, string> = {
  print: 'Print',
  ebook: 'Ebook',
  audiobook: 'Audiobook',
};

export const STATUS_LABELS: Record<NonNullable<Book['status']>, string> = {
  tbr: 'TBR',
  reading: 'Reading',
  paused: 'Paused',
  finished: 'Finished',
  dnf: 'DNF',
};

/** Authors as one line: "Nell Ashby and Tomas Reyes", "A, B and C". */
export function authorLine(authors: readonly string[] | undefined): string {
  const names = authors ?? [];
  if (names.length <= 1) return names[0] ?? '';
  return `${names.slice(0, -1).join(', ')} and ${names[names.length - 1]}`;
}

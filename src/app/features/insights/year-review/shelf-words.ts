import type { YearReview } from '@shared/insights/year-review';
import type { ShelfSpine } from '@shared/insights/year-shelf';

import type { ReaderSettings } from '../../../core/settings/reader-settings';
import { goalAmount } from '../../../ui/goal-figures';

const SMALL_NUMBERS = ['No', 'One', 'Two', 'Three', 'Four', 'Five', 'Six', 'Seven', 'Eight', 'Nine', 'Ten', 'Eleven', 'Twelve'];

/** A title with its authors: 'The Quiet Orchard by Ada Okafor', always with the space. */
export function titleAndAuthors(book: { readonly title: string; readonly authors: readonly string[] }): string {
  return book.authors.length > 0 ? `${book.title} by ${book.authors.join(', ')}` : book.title;
}

/**
 * The few sentences beside the year's shelf, in Lamplight's words: what stands on it, the days
 * read, the fullest month, the reader's book of the year and the tallest spine.
 */
export function shelfWords(year: number, review: YearReview, spines: readonly ShelfSpine[], dates: Pick<ReaderSettings, 'format'>): string[] {
  if (spines.length === 0 && review.readingDays === 0) return [`Nothing logged for ${year} yet. Finished books and timed sessions will fill this shelf.`];
  const words: string[] = [];
  const first = spines[0];
  const last = spines[spines.length - 1];
  if (!first || !last) words.push(`No finished books stand on the ${year} shelf yet.`);
  else if (first === last) words.push(`One book stands on your ${year} shelf: ${first.title}, finished ${dates.format(first.finishedOn, 'dayMonth')}.`);
  else {
    const count = SMALL_NUMBERS[spines.length] ?? spines.length.toLocaleString();
    words.push(
      `${count} books stand on your ${year} shelf, from ${first.title} (finished ${dates.format(first.finishedOn, 'dayMonth')}) ` +
        `to ${last.title} (finished ${dates.format(last.finishedOn, 'dayMonth')}).`,
    );
  }
  if (review.readingDays > 0) {
    const run = review.longestStreak > 1 ? `, ${review.longestStreak} of them in a row at best,` : '';
    words.push(`You read on ${review.readingDays === 1 ? 'one day' : `${review.readingDays} days`}${run} for ${goalAmount(review.minutes, 'minutes')} in all.`);
  }
  if (review.busiestMonth) {
    words.push(`${dates.format(review.busiestMonth.month, 'monthName')} was your fullest month, with ${goalAmount(review.busiestMonth.minutes, 'minutes')}.`);
  }
  if (review.bestBook) words.push(`Your book of the year: ${titleAndAuthors(review.bestBook)}.`);
  const tallest = spines.filter((spine) => spine.pages !== null).sort((a, b) => b.pages! - a.pages!)[0];
  if (tallest && spines.length > 1) words.push(`The tallest spine is ${tallest.title}, at ${goalAmount(tallest.pages!, 'pages')}.`);
  return words;
}

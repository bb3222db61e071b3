import type { MonthPace } from '@shared/insights/monthly-pace';
import { ratingSpread } from '@shared/insights/rating-spread';
import { topTerms } from '@shared/insights/top-terms';

import { formatsChart, monthlyChart, paceChart, ratingsChart, termsChart } from './insights-figures';

const month = (books: number, pages = 0, minutes = 0) => ({ books, pages, minutes });
const empty = (m: string): MonthPace => ({ month: m, pages: 0, minutes: 0, pagesPerHour: null });

describe('insights figures', () => {
  it('sums the months and names the fullest one (worked by hand)', () => {
    const months = [month(1, 120, 90), month(0), month(2, 300, 45), ...Array.from({ length: 9 }, () => month(0))];
    const books = monthlyChart(months, 'books', 2026);
    expect(books.summary).toBe('3 books in 2026; the most in March: 2 books.');
    expect(books.labels.length).toBe(12);
    expect(monthlyChart(months, 'minutes', 2026).summary).toBe('135 minutes in 2026; the most in January: 90 minutes.');
    expect(
      monthlyChart(
        Array.from({ length: 12 }, () => month(0)),
        'pages',
        2026,
      ).summary,
    ).toBe('No pages logged in 2026 yet.');
  });

  it('says the formats, ratings and terms in words', () => {
    expect(formatsChart({ print: 1, ebook: 0, audiobook: 2 }, 2026).summary).toBe('3 books finished in 2026: 1 print, 2 audiobook.');
    expect(formatsChart({ print: 0, ebook: 0, audiobook: 0 }, 2026).summary).toBe('No books finished in 2026 yet.');
    // (3 + 4 + 4.5 + 5) / 4 = 4.125 → 4.1; middle of 3, 4, 4.5, 5 = (4 + 4.5) / 2 = 4.25 → 4.3.
    expect(ratingsChart(ratingSpread([3, 4, 4.5, 5]), 2026).summary).toBe('4 books rated, 4.1 stars on average (the middle rating: 4.3).');
    expect(termsChart(topTerms([['Sea'], ['Sea', 'Myth'], ['Essays'], ['Poetry']], 2), 'genres', 2026).summary).toBe(
      'Most read genre: Sea (2 books), then Essays (1); 2 more genres.',
    );
    expect(termsChart(topTerms([], 2), 'tags', 2026).summary).toBe('No tags on the books of 2026 yet.');
  });

  it('gives the year’s pace from its pages and minutes, not an average of months', () => {
    const months = Array.from({ length: 12 }, (_, i) => empty(`2026-${String(i + 1).padStart(2, '0')}`));
    months[0] = { month: '2026-01', pages: 60, minutes: 90, pagesPerHour: 40 };
    months[2] = { month: '2026-03', pages: 45, minutes: 45, pagesPerHour: 60 };
    // 105 pages in 135 minutes = 46.67 an hour (an average of months would say 50).
    const chart = paceChart(months, 2026);
    expect(chart.summary).toBe('47 pages an hour across 2026, from 40 in January to 60 in March.');
    expect(chart.series[0].values[1]).toBeNull();
  });

  it('names months in the reader’s locale, in sentences and on the axis (Unicode CLDR names: mars, März)', () => {
    const months = [month(1), month(0), month(2), ...Array.from({ length: 9 }, () => month(0))];
    const french = monthlyChart(months, 'books', 2026, 'fr-FR');
    expect(french.summary).toContain('the most in mars');
    expect(french.labels[2]).toBe('mars');
    expect(french.labels[0]).toBe('janv.');
    const paced = Array.from({ length: 12 }, (_, i) => empty(`2026-${String(i + 1).padStart(2, '0')}`));
    paced[2] = { month: '2026-03', pages: 45, minutes: 45, pagesPerHour: 60 };
    const german = paceChart(paced, 2026, 'de-DE');
    expect(german.summary).toBe('60 pages an hour across 2026, all in März.');
    expect(german.labels[2]).toBe('Mär');
  });
});

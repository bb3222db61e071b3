import { monthNames } from '@shared/calendar/month-names';
import type { Amounts } from '@shared/goals/amounts-in';
import type { GoalUnit } from '@shared/goals/goal-unit';
import type { FormatSplit } from '@shared/insights/format-split';
import type { MonthPace } from '@shared/insights/monthly-pace';
import type { RatingSpread } from '@shared/insights/rating-spread';
import type { TopTerms } from '@shared/insights/top-terms';

import { goalAmount, UNIT_LABELS } from '../../ui/goal-figures';
import type { ChartModel } from './chart-model';

const FORMAT_LABELS = { print: 'Print', ebook: 'Ebook', audiobook: 'Audiobook' } as const;

const whole = (value: number) => value.toLocaleString('en', { maximumFractionDigits: 0 });
const oneDecimal = (value: number) => value.toLocaleString('en', { maximumFractionDigits: 1 });

/**
 * Books, pages or minutes in each month of a year; month names in the reader's locale (`Intl`).
 *
 * @example
 * monthlyChart(amounts, 'books', 2026).summary // '14 books in 2026; the most in March: 3 books.'
 */
export function monthlyChart(months: readonly Amounts[], unit: GoalUnit, year: number, locale = 'en-GB'): ChartModel {
  const values = months.map((month) => month[unit]);
  const total = values.reduce((sum, value) => sum + value, 0);
  const most = values.indexOf(Math.max(...values));
  const summary =
    total === 0
      ? `No ${unit} logged in ${year} yet.`
      : `${goalAmount(total, unit)} in ${year}; the most in ${monthNames(locale)[most]}: ${goalAmount(values[most], unit)}.`;
  return { kind: 'bar', labels: monthNames(locale, 'short'), series: [{ label: UNIT_LABELS[unit], values }], summary };
}

/** Finished books by format, as a ring. */
export function formatsChart(split: FormatSplit, year: number): ChartModel {
  const total = split.print + split.ebook + split.audiobook;
  const parts = (['print', 'ebook', 'audiobook'] as const).filter((format) => split[format] > 0).map((format) => `${split[format]} ${format}`);
  return {
    kind: 'doughnut',
    labels: Object.values(FORMAT_LABELS),
    series: [{ label: 'Books', values: [split.print, split.ebook, split.audiobook] }],
    summary: total === 0 ? `No books finished in ${year} yet.` : `${goalAmount(total, 'books')} finished in ${year}: ${parts.join(', ')}.`,
  };
}

/** How many finished books got each rating. */
export function ratingsChart(spread: RatingSpread, year: number): ChartModel {
  const summary =
    spread.rated === 0 || spread.mean === null
      ? `No ratings on the books of ${year} yet.`
      : `${goalAmount(spread.rated, 'books')} rated, ${oneDecimal(spread.mean)} stars on average (the middle rating: ${oneDecimal(spread.median ?? 0)}).`;
  return {
    kind: 'bar',
    labels: spread.bins.map((bin) => `${oneDecimal(bin.rating)} ★`),
    series: [{ label: 'Books', values: spread.bins.map((bin) => bin.count) }],
    summary,
  };
}

/** The genres or tags used most on the year's finished books. */
export function termsChart(terms: TopTerms, what: 'genres' | 'tags', year: number): ChartModel {
  const [first, ...rest] = terms.top;
  const singular = what === 'genres' ? 'genre' : 'tag';
  let summary = `No ${what} on the books of ${year} yet.`;
  if (first) {
    summary = `Most read ${singular}: ${first.term} (${goalAmount(first.count, 'books')})`;
    if (rest.length > 0) summary += `, then ${rest.map((term) => `${term.term} (${term.count})`).join(', ')}`;
    summary += terms.otherTerms > 0 ? `; ${terms.otherTerms} more ${terms.otherTerms === 1 ? singular : what}.` : '.';
  }
  return {
    kind: 'horizontal-bar',
    labels: terms.top.map((term) => term.term),
    series: [{ label: 'Books', values: terms.top.map((term) => term.count) }],
    summary,
  };
}

/** Print pages per hour, month by month, from timed sessions; month names in the reader's locale. */
export function paceChart(months: readonly MonthPace[], year: number, locale = 'en-GB'): ChartModel {
  const names = monthNames(locale);
  const pages = months.reduce((sum, month) => sum + month.pages, 0);
  const minutes = months.reduce((sum, month) => sum + month.minutes, 0);
  const paced = months.map((month, index) => ({ index, pace: month.pagesPerHour })).filter((month) => month.pace !== null) as { index: number; pace: number }[];
  let summary = `No timed print sessions with page numbers in ${year} yet.`;
  if (minutes > 0 && paced.length > 0) {
    const slowest = paced.reduce((a, b) => (b.pace < a.pace ? b : a));
    const fastest = paced.reduce((a, b) => (b.pace > a.pace ? b : a));
    summary = `${whole((pages / minutes) * 60)} pages an hour across ${year}`;
    summary +=
      paced.length > 1
        ? `, from ${whole(slowest.pace)} in ${names[slowest.index]} to ${whole(fastest.pace)} in ${names[fastest.index]}.`
        : `, all in ${names[fastest.index]}.`;
  }
  return {
    kind: 'line',
    labels: monthNames(locale, 'short'),
    series: [{ label: 'Pages per hour', values: months.map((month) => month.pagesPerHour) }],
    summary,
    format: whole,
  };
}

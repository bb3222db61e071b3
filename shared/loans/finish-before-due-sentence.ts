import { dayMonthText } from '../calendar/month-names';
import { dayIndex } from '../reading-log/day-index';
import type { Pace } from '../reading/pace';
import { willFinishBeforeDue } from '../reading/will-finish-before-due';

/** What the sentence needs: what is left of the book, the reader's pace and usual minutes a day. */
export interface FinishBeforeDueInput {
  /** Left to read, in the pace's unit: pages (print), percent (ebook), listened minutes (audiobook). */
  readonly remaining: number;
  readonly pace: Pace;
  readonly minutesPerDay: number;
  readonly today: string;
  readonly timeZone: string;
  readonly dueOn: string;
  /** The reader's date locale for the finish day ('14 March', 'March 14'); en-GB when absent. */
  readonly locale?: string;
}

const UNIT = { print: ['page', 'pages'], ebook: ['percent', 'percent'], audiobook: ['minute', 'minutes'] } as const;

function amount(value: number, format: Pace['format']): string {
  const rounded = Math.max(1, Math.ceil(value - 1e-9));
  const [one, many] = UNIT[format];
  return `${rounded} ${rounded === 1 ? one : many}`;
}

/**
 * The book page's line under an open loan of a book being read, from `willFinishBeforeDue`:
 * "At your pace you finish around 12 March — 2 days before it is due.", or
 * "About 90 pages short by the due date: 45 pages a day would make it." Audiobooks count
 * listened minutes (the pace is already at the reader's listening speed). Without usual minutes
 * yet it gives only what a day would take; null once the due date has passed.
 */
export function finishBeforeDueSentence(input: FinishBeforeDueInput): string | null {
  const forecast = willFinishBeforeDue({ ...input, dueDate: input.dueOn });
  if (forecast.likely && forecast.finishDate && forecast.marginDays !== null) {
    const margin = forecast.marginDays;
    const when = margin === 0 ? 'on the day it is due' : `${margin} ${margin === 1 ? 'day' : 'days'} before it is due`;
    return `At your pace you finish around ${dayMonthText(forecast.finishDate, input.locale ?? 'en-GB')} — ${when}.`;
  }
  if (forecast.minutesPerDayNeeded === null) return null;
  const daysAvailable = dayIndex(input.dueOn) - dayIndex(input.today) + 1;
  const perDay = `${amount(input.remaining / daysAvailable, input.pace.format)} a day would make it.`;
  if (!(input.minutesPerDay > 0)) return `By the due date: ${perDay}`;
  // Units per real minute at this pace: pages and percent are per hour, audiobook minutes per minute.
  const perMinute = input.pace.format === 'audiobook' ? input.pace.rate : input.pace.rate / 60;
  const short = input.remaining - perMinute * input.minutesPerDay * daysAvailable;
  return `About ${amount(short, input.pace.format)} short by the due date: ${perDay}`;
}

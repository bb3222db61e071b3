import { Pace } from './pace';

/**
 * Real minutes needed to cover `remaining` (pages, percent or listened minutes, in the pace's
 * format) at `pace`. Nothing left takes 0 minutes. Throws RangeError for a pace that is not
 * positive, which could never finish.
 *
 * @example
 * minutesToCover(300, { format: 'print', rate: 30 })      // 600 (300 pages at 30 pages/hour)
 * minutesToCover(90, { format: 'audiobook', rate: 1.5 })  // 60
 */
export function minutesToCover(remaining: number, pace: Pace): number {
  if (!(pace.rate > 0) || !Number.isFinite(pace.rate)) throw new RangeError(`Pace must be positive, not ${pace.rate}`);
  if (!(remaining > 0)) return 0;
  // Print and ebook paces are per hour; audiobook paces are per real minute.
  return pace.format === 'audiobook' ? remaining / pace.rate : (remaining / pace.rate) * 60;
}

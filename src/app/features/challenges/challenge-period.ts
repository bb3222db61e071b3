import type { Challenge } from '@shared/sync/schema/collections';
import type { ReaderSettings } from '../../core/settings/reader-settings';

/**
 * A challenge's dates in words: '1 January – 31 December 2026', or for a weekly challenge its
 * ISO weeks, '29 December 2025 – 3 January 2027'.
 */
export function periodLine(challenge: Pick<Challenge, 'periodStart' | 'periodEnd'>, dates: Pick<ReaderSettings, 'format'>): string {
  const { periodStart: start, periodEnd: end } = challenge;
  if (!start || !end) return '';
  const sameYear = start.slice(0, 4) === end.slice(0, 4);
  return `${dates.format(start, sameYear ? 'dayMonth' : 'longDay')} – ${dates.format(end, 'longDay')}`;
}

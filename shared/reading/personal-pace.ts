import { Pace } from './pace';
import { PaceSession, ReadingFormat } from './pace-session';

/** Tuning for `personalPace`. */
export interface PersonalPaceOptions {
  /** How many of the most recent usable sessions to use (default 10). */
  readonly recent?: number;
  /** Fewer usable sessions than this gives null (default 3). */
  readonly minimum?: number;
}

/**
 * The reader's own pace in one format: the median of the per-session rates of their most
 * recent usable sessions (by end time). The median, not the mean, so one session left running
 * overnight or one skimmed chapter does not drag the forecast. A session is unusable when it
 * has no active minutes, made no forward progress (a position left unchanged is more likely a
 * forgotten update than real reading), or has a bad timestamp. Null when fewer than `minimum`
 * sessions are usable: then use `fallbackPace`.
 *
 * @example
 * const evening = (day: string, minutes: number, from: number, to: number) => ({
 *   format: 'print' as const, startedAt: `${day}T20:00:00Z`, endedAt: `${day}T21:00:00Z`,
 *   activeMinutes: minutes, fromPosition: from, toPosition: to,
 * });
 * personalPace([evening('2026-03-01', 60, 0, 30), evening('2026-03-02', 30, 30, 50),
 *               evening('2026-03-03', 60, 50, 75)], 'print')
 * // { format: 'print', rate: 30 } (median of 30, 40 and 25 pages per hour)
 */
export function personalPace(sessions: readonly PaceSession[], format: ReadingFormat, options: PersonalPaceOptions = {}): Pace | null {
  const recent = options.recent ?? 10;
  const minimum = options.minimum ?? 3;
  if (!(recent >= 1) || !(minimum >= 1)) throw new RangeError('recent and minimum must be at least 1');

  const usable = sessions
    .filter((s) => s.format === format)
    .map((s) => ({ ended: Date.parse(s.endedAt), started: Date.parse(s.startedAt), rate: sessionRate(s) }))
    .filter((s) => Number.isFinite(s.ended) && Number.isFinite(s.started) && s.rate !== null) as {
    ended: number;
    started: number;
    rate: number;
  }[];
  if (usable.length < minimum) return null;

  // A total order (end, start, rate), so the sessions kept do not depend on input order.
  usable.sort((a, b) => b.ended - a.ended || b.started - a.started || b.rate - a.rate);
  const rates = usable
    .slice(0, recent)
    .map((s) => s.rate)
    .sort((a, b) => a - b);
  const middle = Math.floor(rates.length / 2);
  const median = rates.length % 2 === 1 ? rates[middle] : (rates[middle - 1] + rates[middle]) / 2;
  return { format, rate: median };
}

/** Pages or percent per hour, or listened minutes per real minute; null when unusable. */
function sessionRate(session: PaceSession): number | null {
  const progress = session.toPosition - session.fromPosition;
  if (!(session.activeMinutes > 0) || !(progress > 0) || !Number.isFinite(progress)) return null;
  return session.format === 'audiobook' ? progress / session.activeMinutes : (progress * 60) / session.activeMinutes;
}

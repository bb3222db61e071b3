import type { Session } from '../sync/schema/collections';

/** A session longer than this is not a reading session but a timer left running. */
export const MAX_SESSION_HOURS = 20;
/** Clocks of two devices differ a little; an end this far ahead of "now" still counts as now. */
const FUTURE_TOLERANCE_MS = 2 * 60_000;

type SessionTimes = Pick<Session, 'id' | 'startedAt' | 'endedAt' | 'activeMinutes' | 'fromPosition' | 'toPosition' | 'deleted'>;

/**
 * What is impossible about a session, by field: it ends before it starts, lies in the future,
 * lasts more than 20 hours, has more active minutes than it lasted, goes backwards in the book,
 * or overlaps another session (one can read one thing at a time). Empty when it is fine.
 *
 * @example
 * sessionProblems({ startedAt: '2026-03-08T10:00:00Z', endedAt: '2026-03-08T09:00:00Z', … }, [], now)
 * // { endedAt: 'The session ends before it starts' }
 */
export function sessionProblems(session: SessionTimes, others: readonly SessionTimes[], nowMs: number): Record<string, string> {
  const problems: Record<string, string> = {};
  const start = Date.parse(session.startedAt ?? '');
  const end = Date.parse(session.endedAt ?? '');
  if (!Number.isFinite(start)) problems['startedAt'] = 'Say when the session started';
  if (!Number.isFinite(end)) problems['endedAt'] = 'Say when the session ended';
  if (Object.keys(problems).length > 0) return problems;

  const lasted = end - start;
  if (lasted < 0) problems['endedAt'] = 'The session ends before it starts';
  else if (lasted > MAX_SESSION_HOURS * 3600_000) problems['endedAt'] = `A session cannot last more than ${MAX_SESSION_HOURS} hours`;
  if (end > nowMs + FUTURE_TOLERANCE_MS) problems['endedAt'] = 'The session ends in the future';

  const active = session.activeMinutes;
  if (active != null && active < 0) problems['activeMinutes'] = 'Minutes cannot be negative';
  else if (active != null && lasted >= 0 && active * 60_000 > lasted + 60_000) {
    problems['activeMinutes'] = 'More minutes than the session lasted';
  }
  if (session.fromPosition != null && session.toPosition != null && session.toPosition < session.fromPosition) {
    problems['toPosition'] = 'It ends before where it started in the book';
  }

  const overlap = others.find((other) => {
    if (other.id === session.id || other.deleted) return false;
    const [a, b] = [Date.parse(other.startedAt ?? ''), Date.parse(other.endedAt ?? '')];
    return Number.isFinite(a) && Number.isFinite(b) && a < end && start < b;
  });
  if (overlap && !problems['startedAt']) {
    const hhmm = (t: string | null | undefined) => new Date(t ?? '').toISOString().slice(11, 16);
    problems['startedAt'] = `It overlaps another session (${hhmm(overlap.startedAt)}–${hhmm(overlap.endedAt)} UTC)`;
  }
  return problems;
}

import type { Session, Timer } from '../sync/schema/collections';

const iso = (ms: number) => new Date(ms).toISOString();
const ms = (timestamp: string | null | undefined) => (timestamp ? Date.parse(timestamp) : NaN);

/**
 * Milliseconds a stored timer has run, pauses left out, computed from its timestamps alone — so
 * a reload, a killed app, a sleeping device or a day offline loses nothing.
 *
 * @example
 * // started 20:00, paused 20:10, resumed 20:15 (pausedMs = 5 min), now 20:30 → 25 min
 */
export function timerElapsedMs(timer: Pick<Timer, 'state' | 'startedAt' | 'pausedAt' | 'pausedMs'>, nowMs: number): number {
  if (timer.state !== 'running' && timer.state !== 'paused') return 0;
  const start = ms(timer.startedAt);
  if (!Number.isFinite(start)) return 0;
  const until = timer.state === 'paused' && timer.pausedAt ? ms(timer.pausedAt) : nowMs;
  return Math.max(0, until - start - (timer.pausedMs ?? 0));
}

/** The timer's fields when it starts now. */
export function startTimer(
  nowMs: number,
  options: { bookId: string; deviceId: string; deviceName: string; targetMinutes?: number | null; startPosition?: number | null },
): Timer extends infer T ? Omit<T, 'id'> : never {
  return {
    state: 'running',
    bookId: options.bookId,
    startedAt: iso(nowMs),
    pausedAt: null,
    pausedMs: 0,
    deviceId: options.deviceId,
    deviceName: options.deviceName,
    targetMinutes: options.targetMinutes ?? null,
    startPosition: options.startPosition ?? null,
    deleted: false,
  };
}

/** Pausing only records when; a paused timer does not count. */
export function pauseTimer(timer: Timer, nowMs: number): Partial<Timer> {
  return timer.state === 'running' ? { state: 'paused', pausedAt: iso(nowMs) } : {};
}

/** Resuming adds the pause to the paused total. */
export function resumeTimer(timer: Timer, nowMs: number): Partial<Timer> {
  if (timer.state !== 'paused' || !timer.pausedAt) return {};
  return { state: 'running', pausedAt: null, pausedMs: (timer.pausedMs ?? 0) + Math.max(0, nowMs - ms(timer.pausedAt)) };
}

/**
 * The session a stopped timer leaves behind: from its start to now (or to the moment it was
 * paused), with the active minutes counted from timestamps.
 */
export function sessionFromTimer(timer: Timer, nowMs: number): Partial<Session> {
  const end = timer.state === 'paused' && timer.pausedAt ? ms(timer.pausedAt) : nowMs;
  return {
    bookId: timer.bookId ?? null,
    startedAt: timer.startedAt ?? iso(nowMs),
    endedAt: iso(end),
    activeMinutes: Math.round((timerElapsedMs(timer, nowMs) / 60_000) * 100) / 100,
    fromPosition: timer.startPosition ?? null,
    source: 'timer',
  };
}

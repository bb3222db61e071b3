import { HlcClock, parseHlc } from './hlc';

/** Below this, a difference from the server's time is network noise, not a wrong date. */
export const CLOCK_NOISE_MS = 60_000;

/**
 * How far to move this device's clock to agree with the server: the server's time against the
 * middle of the request (Cristian 1989, "Probabilistic clock synchronization"). Differences
 * under a minute count as none.
 */
export function clockOffsetMs(serverTimeMs: number, sentAtMs: number, receivedAtMs: number): number {
  if (!Number.isFinite(serverTimeMs)) return 0;
  const offset = serverTimeMs - (sentAtMs + receivedAtMs) / 2;
  return Math.abs(offset) < CLOCK_NOISE_MS ? 0 : Math.round(offset);
}

/** Whether an offset means the device's date is wrong enough to tell the reader (over a day). */
export const dateLooksWrong = (offsetMs: number) => Math.abs(offsetMs) > 24 * 60 * 60 * 1000;

/**
 * New clocks for changes the server refused as ahead of it, from the corrected time. They keep
 * their order (one new clock per old one, in outbox order, so fields written together stay
 * together) and still come after everything the device had seen from others (`seen`).
 *
 * @returns old clock → new clock
 */
export function restampClocks(oldClocks: readonly string[], node: string, correctedNow: () => number, seen?: string | null): Map<string, string> {
  const clock = new HlcClock(node, correctedNow, seen && parseHlc(seen) ? seen : null);
  const renamed = new Map<string, string>();
  for (const old of oldClocks) if (!renamed.has(old)) renamed.set(old, clock.tick());
  return renamed;
}

/**
 * The clock a re-stamp must come after: the greatest clock seen from others, and every clock this
 * device keeps below the first refused one (`from`) — its own earlier writes, the adds a pending
 * remove names, the last re-stamp. Else a remove could precede the add it removes, or a new write
 * an older one. A clock at or above `from` is itself being re-stamped (or was refused again after
 * an offset learnt across a jump) and is no floor.
 */
export function restampFloor(from: string, seen: string | null | undefined, kept: Iterable<string | null | undefined>): string | null {
  let floor = seen ?? null;
  for (const clock of kept) if (clock && clock < from && (!floor || clock > floor)) floor = clock;
  return floor;
}

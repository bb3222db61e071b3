import { parseHlc } from '../../../shared/sync/hlc';

/** Clocks from before this instant (2025-12-01) do not occur: loans came later. */
const SEQUENCE_EPOCH_MS = Date.UTC(2025, 11, 1);

/**
 * A SEQUENCE and DTSTAMP from the field clocks an event is made of: the greatest clock is the
 * last change, and its seconds since 2025-12-01 only grow (an HLC never goes back), so the
 * SEQUENCE grows on every change without being stored. It fits RFC 5545's INTEGER (§3.3.8,
 * signed 32 bits) until 2093.
 */
export function clockSequence(clocks: readonly (string | undefined)[]): { sequence: number; changedAt: Date } {
  const wall = Math.max(SEQUENCE_EPOCH_MS, ...clocks.map((clock) => (clock ? (parseHlc(clock)?.wall ?? 0) : 0)));
  return { sequence: Math.floor((wall - SEQUENCE_EPOCH_MS) / 1000), changedAt: new Date(wall) };
}

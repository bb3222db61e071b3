import { formatHlc, parseHlc } from '../sync/hlc';

/** How long a deleted item stays in Trash; after that the server purges its content. */
export const TRASH_DAYS = 30;
const DAY_MS = 86_400_000;

/** What these rules read of a row: its tombstone and its field clocks (a device's LocalRow fits). */
export interface TombstonedRow {
  readonly deleted?: unknown;
  readonly _hlc: Readonly<Record<string, string>>;
}

/**
 * The key path devices index every synced collection by: the clock of the `deleted` field. Rows
 * deleted within the Trash window are exactly those with `deleted` true and this clock at or
 * above {@link purgeCutoffClock}, so Trash reads a range of it, never a whole table.
 */
export const DELETE_CLOCK_INDEX = '_hlc.deleted';

/** The clock of the delete, or `null` when the row is not deleted. */
export function deletionClock(row: TombstonedRow): string | null {
  return row.deleted === true ? (row._hlc['deleted'] ?? null) : null;
}

/** When the row was deleted (ms since 1970, the wall time of the delete's clock), or `null`. */
export function deletedAtMs(row: TombstonedRow): number | null {
  const clock = deletionClock(row);
  return clock === null ? null : (parseHlc(clock)?.wall ?? null);
}

/**
 * Whether some field of a deleted row was written after the delete: a device that had not seen
 * the delete edited it. The delete still stands (its own field's clock decides), but Trash says
 * so instead of dropping the edit silently.
 */
export function editedAfterDelete(row: TombstonedRow): boolean {
  const clock = deletionClock(row);
  if (clock === null) return false;
  return Object.entries(row._hlc).some(([field, hlc]) => field !== 'deleted' && hlc > clock);
}

/** Whether a row belongs in Trash at `nowMs`: deleted within the last {@link TRASH_DAYS} days. */
export function inTrash(row: TombstonedRow, nowMs: number): boolean {
  const at = deletedAtMs(row);
  return at !== null && nowMs - at <= TRASH_DAYS * DAY_MS;
}

/**
 * The clock below which a delete is older than {@link TRASH_DAYS} days. Clocks compare as plain
 * strings (`<wall, 15 digits>:…`), so `clock < cutoff` exactly when the clock's wall time is
 * earlier than `nowMs` less the window. An empty node sorts before every real one.
 */
export function purgeCutoffClock(nowMs: number): string {
  return formatHlc({ wall: nowMs - TRASH_DAYS * DAY_MS, counter: 0, node: '' });
}

/** Whether `row` went in the same delete as a row deleted at `clock` (one write, one clock). */
export function deletedWith(row: TombstonedRow, clock: string): boolean {
  return deletionClock(row) === clock;
}

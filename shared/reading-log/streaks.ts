import { dayIndex } from './day-index';

/** Runs of consecutive local days with reading. */
export interface Streaks {
  /** Length of the run ending today or yesterday; 0 when the last reading day is older. */
  readonly current: number;
  /** Longest run ever, the current one included. */
  readonly longest: number;
}

/**
 * The current and longest reading streaks, from the local days ('YYYY-MM-DD') with reading.
 *
 * The current streak is still alive when the last reading day is today or yesterday: the
 * reader has until the end of today to keep it going, so it should not drop to 0 in the
 * morning. Duplicates and order do not matter; days after `today` (a device with its clock
 * ahead) are ignored.
 *
 * @example
 * streaks(['2026-03-05', '2026-03-06', '2026-03-07', '2026-03-01'], '2026-03-08')
 * // { current: 3, longest: 3 } (alive: the last reading day is yesterday)
 */
export function streaks(days: readonly string[], today: string): Streaks {
  const todayIndex = dayIndex(today);
  const indices = [...new Set(days.map(dayIndex))].filter((i) => i <= todayIndex).sort((a, b) => a - b);

  let longest = 0;
  let run = 0;
  for (let i = 0; i < indices.length; i++) {
    run = i > 0 && indices[i] === indices[i - 1] + 1 ? run + 1 : 1;
    longest = Math.max(longest, run);
  }
  const last = indices[indices.length - 1];
  const current = last !== undefined && last >= todayIndex - 1 ? run : 0;
  return { current, longest };
}

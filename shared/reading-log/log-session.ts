/**
 * What the daily log needs from a reading session. Structural, so any session record with
 * these fields fits.
 */
export interface LogSession {
  /** ISO 8601 UTC timestamp. */
  readonly startedAt: string;
  /** ISO 8601 UTC timestamp. */
  readonly endedAt: string;
  /** Minutes actually spent reading or listening (pauses left out), so at most the wall span. */
  readonly activeMinutes: number;
  /** Pages read in the session; absent for formats without pages. */
  readonly pages?: number;
}

/** One local calendar day of the log. */
export interface DailyLogEntry {
  /** 'YYYY-MM-DD' in the reader's time zone. */
  readonly day: string;
  readonly minutes: number;
  readonly pages: number;
}

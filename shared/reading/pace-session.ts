/** How a book is read. Positions and paces are counted in a different unit for each. */
export type ReadingFormat = 'print' | 'ebook' | 'audiobook';

/**
 * What pace calculations need from a reading session. Structural, so the real session record
 * fits as long as it has these fields.
 */
export interface PaceSession {
  readonly format: ReadingFormat;
  /** ISO 8601 UTC timestamp. */
  readonly startedAt: string;
  /** ISO 8601 UTC timestamp. */
  readonly endedAt: string;
  /** Real minutes spent reading or listening, pauses left out. */
  readonly activeMinutes: number;
  /** Page (print), percent 0–100 (ebook) or listened minutes into the book (audiobook). */
  readonly fromPosition: number;
  readonly toPosition: number;
  /** Audiobook playback speed (1 = normal); already reflected in the listened minutes. */
  readonly playbackSpeed?: number;
}
